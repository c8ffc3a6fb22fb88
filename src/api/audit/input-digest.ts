/**
 * The audit of an answer: the engine version and a digest of the input as the engine received it.
 *
 * The digest is the SHA-256 (hex) of the canonical JSON (canonical-json.ts) of the normalised request:
 * every quantity in SI, the section and material as resolved (catalogue values included, so a changed
 * catalogue changes the digest), defaults not filled in, and the output options. Requests that differ
 * only in how they write a value ("3.6 m", 3.6, "3600 mm"), in key order or in spacing have one digest;
 * the same input gives the same digest on every run and machine.
 */

import { createHash } from 'node:crypto';
import type { Material } from '../../engine/materials/material.js';
import type { SectionDimensions } from '../../engine/sections/dimensions.js';
import type { NormalisedCheck } from '../member-check.js';
import type { ResolvedSection } from '../normalise/section.js';
import { SERVICE_VERSION } from '../service-version.js';
import { canonicalJson } from './canonical-json.js';

/** Name the layout of each canonical form; a change of layout changes its name. */
export const INPUT_FORM = 'memberproof-member-check/1';
const SIZING_FORM = 'memberproof-member-sizing/1';
const SECTION_FORM = 'memberproof-section-properties/1';

export interface Audit {
  readonly engineVersion: string;
  readonly inputDigest: string;
}

export function sha256Hex(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

/** What a check says apart from its section and material: shared by every candidate of a sizing. */
function checkForm(check: NormalisedCheck) {
  const combinations = check.combinations;
  return {
    member: check.member,
    selfWeight: check.selfWeight,
    loads: check.loads,
    loadCombinations:
      combinations === null
        ? undefined
        : { cases: combinations.cases, movingLoads: combinations.movingLoads, combinations: combinations.combinations, set: combinations.set },
    criteria: check.criteria,
    buckling: check.buckling,
    lateralTorsional: check.lateralTorsional,
    pins: check.pins,
    loadsThroughShearCentre: check.loadsThroughShearCentre ? true : undefined,
    // Defaults are left out, as everywhere in the form: a request that names them has the default's digest.
    output: { samples: check.samples, units: check.units.names, detail: check.detail === 'summary' ? 'summary' : undefined, significantDigits: check.units.significantDigits },
  };
}

function auditOf(form: unknown): Audit {
  return { engineVersion: SERVICE_VERSION, inputDigest: sha256Hex(canonicalJson(form)) };
}

/** The canonical form of one member check: what its digest is taken of (labels and descriptions of loads and supports are left out: they change no number). */
export function memberCheckInputForm(check: NormalisedCheck, section: ResolvedSection, material: Material): unknown {
  return {
    form: INPUT_FORM,
    ...checkForm(check),
    section: { designation: section.entry?.designation, dimensions: section.dimensions, properties: section.properties },
    material,
  };
}

export function memberCheckAudit(check: NormalisedCheck, section: ResolvedSection, material: Material): Audit {
  return auditOf(memberCheckInputForm(check, section, material));
}

/** A sizing: the check without its section, the material as the request names it, every candidate's shape, the limits (SI) and the objective. */
export function sizingAudit(
  check: NormalisedCheck,
  material: unknown,
  candidates: readonly { designation: string; dimensions: SectionDimensions }[],
  limits: Readonly<Record<string, number | undefined>>,
  objective: string,
): Audit {
  return auditOf({ form: SIZING_FORM, ...checkForm(check), material, candidates: candidates.map(({ designation, dimensions }) => ({ designation, dimensions })), limits, objective });
}

/** A section's properties: its designation and shape, the material's density when one is given, the output units. */
export function sectionPropertiesAudit(section: ResolvedSection, density: number | undefined, units: Readonly<Record<string, string>>): Audit {
  return auditOf({ form: SECTION_FORM, designation: section.entry?.designation, dimensions: section.dimensions, properties: section.properties, density, units });
}
