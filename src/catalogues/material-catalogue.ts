/**
 * The registry of material grades: built from lists of entries (the embedded catalogue and any
 * company files), looked up by grade or alias in any common spelling, searched for near misses, and
 * resolved to the strengths of a given element thickness. No grade or alias may be held twice.
 */

import { EngineError } from '../engine/engine-error.js';
import type { Material } from '../engine/materials/material.js';
import type { MaterialEntry, ThicknessBand } from './material-entry.js';
import { damerauLevenshteinDistance } from './string-distance.js';

export const DEFAULT_NEAREST_GRADE_COUNT = 5;

/**
 * Standard names people put before a grade; the longest that fits is dropped (once), so
 * "EN 10025-2 S355" finds "S355" and "EN AW-6061-T6" is held as "6061t6".
 */
const STANDARD_PREFIXES = ['en100252', 'en10025', 'en10088', 'enaw', 'en573', 'astm', 'aisi', 'sae', 'uns', 'en', 'aw'];

/**
 * The key a grade is looked up by: lower case, letters and digits only (no spaces, hyphens, dots or
 * brackets), less a leading standard name. Example: normaliseGrade("EN 10025-2 S 355") === "s355",
 * normaliseGrade("ASTM A992") === "a992", normaliseGrade("AISI 304") === "304".
 */
export function normaliseGrade(grade: string): string {
  const compact = grade
    .normalize('NFKC')
    .toLowerCase()
    .replace(/[^a-z0-9]/g, '');
  const prefix = STANDARD_PREFIXES.find((name) => compact.startsWith(name) && compact.length > name.length);
  return prefix === undefined ? compact : compact.slice(prefix.length);
}

/** Two entries whose grades or aliases normalise to the same key. */
export class DuplicateGradeError extends Error {
  override readonly name = 'DuplicateGradeError';

  constructor(
    readonly spelling: string,
    readonly grade: string,
    readonly sourceName: string,
    readonly existingGrade: string,
    readonly existingSourceName: string,
    readonly key: string,
  ) {
    super(
      `Material "${spelling}" (grade ${grade}) from ${sourceName} duplicates grade ${existingGrade} from ` +
        `${existingSourceName} (both read as "${key}"); a catalogue may not replace a material.`,
    );
  }
}

interface Registered {
  readonly entry: MaterialEntry;
  readonly sourceName: string;
  /** The normalised grade and aliases, without repeats. */
  readonly keys: readonly string[];
}

function entryKeys(entry: MaterialEntry, sourceName: string): string[] {
  const keys = [entry.grade, ...entry.aliases].map(normaliseGrade);
  if (keys.some((key) => key === '')) {
    throw new RangeError(`Material "${entry.grade}" from ${sourceName} has a grade or alias with no letters or digits`);
  }
  return [...new Set(keys)];
}

/**
 * The band lookup relies on ascending limits and scales compression by the entry's own strengths; a
 * company file could break either, so both are checked.
 */
function requireUsableBands(entry: MaterialEntry, sourceName: string): void {
  if (entry.thicknessBands.length > 0 && !(entry.yieldStrength > 0 && entry.ultimateStrength > 0)) {
    throw new RangeError(`Material "${entry.grade}" from ${sourceName} has thickness bands but no positive strengths`);
  }
  let previous = 0;
  for (const band of entry.thicknessBands) {
    if (!(Number.isFinite(band.maxThickness) && band.maxThickness > previous)) {
      throw new RangeError(
        `Material "${entry.grade}" from ${sourceName}: thickness bands must rise strictly from 0, ` +
          `got maxThickness ${band.maxThickness} m after ${previous} m`,
      );
    }
    previous = band.maxThickness;
  }
}

const millimetres = (metres: number): string => String(Number((metres * 1000).toPrecision(6)));

function compareText(a: string, b: string): number {
  if (a === b) return 0;
  return a < b ? -1 : 1;
}

export class MaterialCatalogue {
  readonly #byKey = new Map<string, Registered>();
  readonly #registered: Registered[] = [];

  /** Example: new MaterialCatalogue(embeddedMaterials(), 'the embedded material catalogue'). */
  constructor(entries: readonly MaterialEntry[] = [], sourceName = 'the initial entries') {
    this.add(entries, sourceName);
  }

  /** Number of grades held. */
  get size(): number {
    return this.#registered.length;
  }

  /**
   * Adds a list of entries as a whole or not at all: a grade or alias already held, or given twice in
   * the list, raises DuplicateGradeError naming both entries and both sources.
   */
  add(entries: readonly MaterialEntry[], sourceName: string): void {
    const incoming = new Map<string, Registered>();
    const added: Registered[] = [];
    for (const entry of entries) {
      requireUsableBands(entry, sourceName);
      const registered: Registered = { entry, sourceName, keys: entryKeys(entry, sourceName) };
      for (const key of registered.keys) {
        const existing = this.#byKey.get(key) ?? incoming.get(key);
        if (existing) {
          const spelling = [entry.grade, ...entry.aliases].find((name) => normaliseGrade(name) === key) ?? entry.grade;
          throw new DuplicateGradeError(spelling, entry.grade, sourceName, existing.entry.grade, existing.sourceName, key);
        }
        incoming.set(key, registered);
      }
      added.push(registered);
    }
    for (const [key, registered] of incoming) this.#byKey.set(key, registered);
    this.#registered.push(...added);
  }

  /** The entry a grade or alias names in any common spelling ("s355", "ASTM A992", "1.4301"), or undefined. */
  find(grade: string): MaterialEntry | undefined {
    return this.#byKey.get(normaliseGrade(grade))?.entry;
  }

  /**
   * Grades closest to the spelling given, best first: those with a grade or alias that begins with it
   * ("A500" -> the four A500 entries) before the others, then by the Damerau–Levenshtein distance of
   * the normalised forms to the nearest of each entry's grade and aliases, then by grade.
   * Example: nearest('S356', 1) -> ['S355'].
   */
  nearest(grade: string, count: number = DEFAULT_NEAREST_GRADE_COUNT): string[] {
    if (!Number.isInteger(count) || count < 0) throw new RangeError(`count must be an integer of at least 0, got ${count}`);
    const key = normaliseGrade(grade);
    return this.#registered
      .map((registered) => ({
        grade: registered.entry.grade,
        notExtending: registered.keys.some((candidate) => key !== '' && candidate.startsWith(key)) ? 0 : 1,
        distance: Math.min(...registered.keys.map((candidate) => damerauLevenshteinDistance(key, candidate))),
      }))
      .sort((a, b) => a.notExtending - b.notExtending || a.distance - b.distance || compareText(a.grade, b.grade))
      .slice(0, count)
      .map((ranked) => ranked.grade);
  }

  /** Every entry, in the order the lists were added. */
  list(): readonly MaterialEntry[] {
    return this.#registered.map((registered) => registered.entry);
  }

  /**
   * The material with the strengths of the first band whose maxThickness >= thickness (m), the
   * thickest element of the section; an entry without bands applies at any thickness. Compression
   * strengths follow the band in the entry's own ratio of compression to tension.
   * Example: forThickness(find('S355'), 0.020).yieldStrength === 345e6 (EN 10025-2 Table 7).
   */
  forThickness(entry: MaterialEntry, thickness: number): Material {
    if (!(Number.isFinite(thickness) && thickness > 0)) {
      throw new EngineError('impossible-geometry', `An element thickness must be a positive length, got ${thickness} m`, [], {
        grade: entry.grade,
        thickness: String(thickness),
      });
    }
    const { aliases: _aliases, thicknessBands, ...material } = entry;
    if (thicknessBands.length === 0) return material;
    const index = thicknessBands.findIndex((band) => thickness <= band.maxThickness);
    const band: ThicknessBand | undefined = thicknessBands[index];
    if (band === undefined) {
      const thickest = thicknessBands[thicknessBands.length - 1]?.maxThickness ?? 0;
      throw new EngineError(
        'not-applicable',
        `${entry.grade} (${entry.standard}) has strengths for elements up to ${millimetres(thickest)} mm thick; ` +
          `the thickest element here is ${millimetres(thickness)} mm`,
        [],
        { grade: entry.grade, thickness, maxThickness: thickest },
      );
    }
    return {
      ...material,
      yieldStrength: band.yieldStrength,
      compressiveYieldStrength: band.yieldStrength * (entry.compressiveYieldStrength / entry.yieldStrength),
      ultimateStrength: band.ultimateStrength,
      compressiveUltimateStrength: band.ultimateStrength * (entry.compressiveUltimateStrength / entry.ultimateStrength),
      source: `${entry.source}; strengths for t = ${millimetres(thickness)} mm (thickness band up to ${millimetres(band.maxThickness)} mm)`,
    };
  }
}
