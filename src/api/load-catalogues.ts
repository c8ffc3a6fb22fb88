/**
 * The catalogues the service runs on: the embedded ones, plus a deployment's company files (a JSON
 * file, or a folder of them) validated with the request schemas. A bad company file stops start-up
 * with a message naming the file and the entry.
 */

import { readdir, readFile, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { embeddedMaterialCatalogue } from '../catalogues/embedded-materials.js';
import { embeddedSectionCatalogue } from '../catalogues/embedded-sections.js';
import type { MaterialEntry } from '../catalogues/material-entry.js';
import { MaterialCatalogue } from '../catalogues/material-catalogue.js';
import type { SectionCatalogue } from '../catalogues/section-catalogue.js';
import type { SectionEntry } from '../catalogues/section-entry.js';
import type { Catalogues } from './member-check.js';
import { resolveMaterial } from './normalise/material.js';
import { QuantityReader } from './normalise/quantity-reader.js';
import { propertiesOf, shapeDimensions } from './normalise/section.js';
import { ProblemError } from './problems.js';
import { companyCatalogueFile, type CompanyCatalogueFile } from './schemas/company-catalogue.js';
import { parseBody } from './validation.js';

export interface CatalogueSourceSummary {
  readonly name: string;
  readonly sections: number;
  readonly materials: number;
}

export interface LoadedCatalogues extends Catalogues {
  readonly sections: SectionCatalogue;
  readonly materials: MaterialCatalogue;
  readonly sources: readonly CatalogueSourceSummary[];
  readonly sectionFamilies: Readonly<Record<string, number>>;
}

export class CatalogueFileError extends Error {
  override readonly name = 'CatalogueFileError';
}

export async function loadCatalogues(options: { companyPath?: string | undefined }): Promise<LoadedCatalogues> {
  const sections = embeddedSectionCatalogue();
  const materials = embeddedMaterialCatalogue();
  const sources: CatalogueSourceSummary[] = [{ name: 'embedded', sections: sections.size, materials: materials.size }];
  for (const file of options.companyPath ? await companyFiles(options.companyPath) : []) {
    const company = await readCompanyFile(file);
    try {
      sections.add(company.sections, file);
      materials.add(company.materials, file);
    } catch (error) {
      throw new CatalogueFileError(`company catalogue ${file}: ${(error as Error).message}`);
    }
    sources.push({ name: file, sections: company.sections.length, materials: company.materials.length });
  }
  const sectionFamilies: Record<string, number> = {};
  for (const { family, count } of sections.families()) sectionFamilies[family] = count;
  return { sections, materials, sources, sectionFamilies };
}

async function companyFiles(path: string): Promise<string[]> {
  let info;
  try {
    info = await stat(path);
  } catch {
    throw new CatalogueFileError(`company catalogue ${path}: no such file or folder`);
  }
  if (!info.isDirectory()) return [path];
  const names = (await readdir(path)).filter((name) => name.endsWith('.json')).sort();
  return names.map((name) => join(path, name));
}

async function readCompanyFile(file: string): Promise<{ sections: SectionEntry[]; materials: MaterialEntry[] }> {
  let parsed: CompanyCatalogueFile;
  try {
    parsed = parseBody(companyCatalogueFile, JSON.parse(await readFile(file, 'utf8')));
    return { sections: (parsed.sections ?? []).map((entry, i) => sectionEntry(entry, i)), materials: (parsed.materials ?? []).map((entry, i) => materialEntry(entry, i)) };
  } catch (error) {
    if (error instanceof ProblemError) {
      const where = error.errors.map((e) => `${e.pointer}: ${e.message}`).join('; ') || error.detail;
      throw new CatalogueFileError(`company catalogue ${file}: ${where}`);
    }
    throw new CatalogueFileError(`company catalogue ${file}: ${(error as Error).message}`);
  }
}

type CompanySection = NonNullable<CompanyCatalogueFile['sections']>[number];
type CompanyMaterial = NonNullable<CompanyCatalogueFile['materials']>[number];

function sectionEntry(entry: CompanySection, index: number): SectionEntry {
  const base = ['sections', index];
  const reader = new QuantityReader();
  const dimensions = shapeDimensions(entry.section, reader, [...base, 'section']);
  const massPerLength = reader.positive(entry.massPerLength, 'massPerLength', [...base, 'massPerLength']);
  reader.finish();
  propertiesOf(dimensions, [...base, 'section']);
  return {
    designation: entry.designation,
    family: entry.family,
    standard: entry.standard ?? 'company catalogue',
    dimensions,
    massPerLength,
    tabulated: {},
    source: entry.source ?? 'company catalogue',
  };
}

function materialEntry(entry: CompanyMaterial, index: number): MaterialEntry {
  const base = ['materials', index];
  const { grade, standard, aliases, thicknessBands, source, ...properties } = entry;
  const reader = new QuantityReader();
  const resolved = resolveMaterial({ ...properties, name: grade }, new MaterialCatalogue(), reader, base);
  const bands = (thicknessBands ?? []).map((band, i) => ({
    maxThickness: reader.positive(band.maxThickness, 'length', [...base, 'thicknessBands', i, 'maxThickness']),
    yieldStrength: reader.positive(band.yieldStrength, 'stress', [...base, 'thicknessBands', i, 'yieldStrength']),
    ultimateStrength: reader.positive(band.ultimateStrength, 'stress', [...base, 'thicknessBands', i, 'ultimateStrength']),
  }));
  reader.finish();
  return {
    ...resolved.forThickness(0).material,
    grade,
    standard: standard ?? 'company catalogue',
    source: source ?? 'company catalogue',
    aliases: aliases ?? [],
    thicknessBands: bands.sort((a, b) => a.maxThickness - b.maxThickness),
  };
}
