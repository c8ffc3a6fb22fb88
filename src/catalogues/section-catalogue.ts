/**
 * The registry of stock sections: built from named lists of entries (the embedded catalogues and any
 * company files), looked up by designation in any common spelling, searched for near misses, and
 * listed with filters and pages. No designation may appear twice, and a later list replaces nothing.
 */

import type { SectionEntry } from './section-entry.js';
import { designationNumbers, designationPrefix, normaliseDesignation } from './designation.js';
import { overallDepth, overallWidth } from './overall-size.js';
import { damerauLevenshteinDistance } from './string-distance.js';

/** A list of entries and the name to give it in messages ("EN 10365 embedded", "acme-sections.json"). */
export interface SectionCatalogueSource {
  readonly name: string;
  readonly entries: readonly SectionEntry[];
}

export interface SectionListQuery {
  /** Case-insensitive family name, e.g. "IPE". */
  readonly family?: string;
  /** Upper bounds, SI (m, kg/m). A section whose size is unknown is left out when a size bound is set. */
  readonly maxDepth?: number;
  readonly maxWidth?: number;
  readonly maxMassPerLength?: number;
  /** Paging: how many matching entries to skip (default 0) and return at most (default 50). */
  readonly offset?: number;
  readonly limit?: number;
}

export interface SectionListPage {
  readonly items: readonly SectionEntry[];
  /** Entries matching the filters, before paging. */
  readonly total: number;
  readonly offset: number;
  readonly limit: number;
}

export interface SectionFamilyCount {
  readonly family: string;
  readonly count: number;
}

export const DEFAULT_LIST_LIMIT = 50;
export const DEFAULT_NEAREST_COUNT = 5;

/** Two entries whose designations normalise to the same key. */
export class DuplicateDesignationError extends Error {
  override readonly name = 'DuplicateDesignationError';

  constructor(
    readonly designation: string,
    readonly sourceName: string,
    readonly existingDesignation: string,
    readonly existingSourceName: string,
    readonly normalised: string,
  ) {
    super(
      `Section "${designation}" from ${sourceName} duplicates "${existingDesignation}" from ` +
        `${existingSourceName} (both read as "${normalised}"); a catalogue may not replace a section.`,
    );
  }
}

interface Registered {
  readonly entry: SectionEntry;
  readonly key: string;
  readonly sourceName: string;
}

const byFamilyThenMass = (a: Registered, b: Registered): number =>
  compareText(a.entry.family, b.entry.family) ||
  a.entry.massPerLength - b.entry.massPerLength ||
  compareText(a.key, b.key);

function compareText(a: string, b: string): number {
  if (a === b) return 0;
  return a < b ? -1 : 1;
}

function requireCount(value: number, name: string, least: number): number {
  if (!Number.isInteger(value) || value < least) {
    throw new RangeError(`${name} must be an integer of at least ${least}, got ${value}`);
  }
  return value;
}

function requireBound(value: number | undefined, name: string): void {
  if (value !== undefined && !(Number.isFinite(value) && value >= 0)) {
    throw new RangeError(`${name} must be a finite number of at least 0, got ${value}`);
  }
}

/** True when the size is known and within the bound, or when there is no bound. */
function fits(size: number | undefined, bound: number | undefined): boolean {
  return bound === undefined || (size !== undefined && size <= bound);
}

/**
 * How far a candidate's numbers lie from the query's, to rank equally distant spellings
 * ("IPE 250": IPE 240 before IPE 200): relative gaps of paired numbers, 1 for each unpaired one.
 */
function numericGap(query: readonly number[], candidate: readonly number[]): number {
  let gap = Math.abs(query.length - candidate.length);
  for (let i = 0; i < Math.min(query.length, candidate.length); i += 1) {
    const q = query[i] ?? 0;
    const c = candidate[i] ?? 0;
    const scale = Math.max(Math.abs(q), Math.abs(c));
    if (scale > 0) gap += Math.abs(q - c) / scale;
  }
  return gap;
}

export class SectionCatalogue {
  readonly #byKey = new Map<string, Registered>();
  #sorted: readonly Registered[] = [];

  /** Example: new SectionCatalogue([{ name: 'embedded', entries: embeddedSections() }]). */
  constructor(sources: readonly SectionCatalogueSource[] = []) {
    for (const source of sources) this.add(source.entries, source.name);
  }

  /** Number of sections held. */
  get size(): number {
    return this.#byKey.size;
  }

  /**
   * Adds a list of entries (a company file, say) as a whole or not at all: any designation already
   * held, or given twice in the list, raises DuplicateDesignationError naming both entries and sources.
   */
  add(entries: readonly SectionEntry[], sourceName: string): void {
    const incoming = new Map<string, Registered>();
    for (const entry of entries) {
      const key = normaliseDesignation(entry.designation);
      const existing = this.#byKey.get(key) ?? incoming.get(key);
      if (existing) {
        throw new DuplicateDesignationError(
          entry.designation,
          sourceName,
          existing.entry.designation,
          existing.sourceName,
          key,
        );
      }
      incoming.set(key, { entry, key, sourceName });
    }
    for (const [key, registered] of incoming) this.#byKey.set(key, registered);
    this.#sorted = [...this.#byKey.values()].sort(byFamilyThenMass);
  }

  /** The entry a designation names in any common spelling ("ipe200", "W 8 x 31"), or undefined. */
  find(designation: string): SectionEntry | undefined {
    return this.#byKey.get(normaliseDesignation(designation))?.entry;
  }

  /**
   * Designations closest to the one given, best first: those of the same family (same leading
   * letters) before the others, then by Damerau–Levenshtein distance of the normalised forms, then by
   * how near their numbers are. Example: nearest('IPE 250', 2) -> ['IPE 240', 'IPE 270'].
   */
  nearest(designation: string, count: number = DEFAULT_NEAREST_COUNT): string[] {
    requireCount(count, 'count', 0);
    const key = normaliseDesignation(designation);
    const prefix = designationPrefix(key);
    const numbers = designationNumbers(key);
    return this.#sorted
      .map((registered) => ({
        registered,
        otherFamily: designationPrefix(registered.key) === prefix ? 0 : 1,
        distance: damerauLevenshteinDistance(key, registered.key),
        gap: numericGap(numbers, designationNumbers(registered.key)),
      }))
      .sort(
        (a, b) =>
          a.otherFamily - b.otherFamily ||
          a.distance - b.distance ||
          a.gap - b.gap ||
          compareText(a.registered.key, b.registered.key),
      )
      .slice(0, count)
      .map((ranked) => ranked.registered.entry.designation);
  }

  /** Entries matching the filters, sorted by family then mass per length, one page of them. */
  list(query: SectionListQuery = {}): SectionListPage {
    const offset = requireCount(query.offset ?? 0, 'offset', 0);
    const limit = requireCount(query.limit ?? DEFAULT_LIST_LIMIT, 'limit', 0);
    requireBound(query.maxDepth, 'maxDepth');
    requireBound(query.maxWidth, 'maxWidth');
    requireBound(query.maxMassPerLength, 'maxMassPerLength');
    const family = query.family?.toUpperCase();
    const matching = this.#sorted
      .map((registered) => registered.entry)
      .filter(
        (entry) =>
          (family === undefined || entry.family.toUpperCase() === family) &&
          fits(overallDepth(entry.dimensions), query.maxDepth) &&
          fits(overallWidth(entry.dimensions), query.maxWidth) &&
          fits(entry.massPerLength, query.maxMassPerLength),
      );
    return { items: matching.slice(offset, offset + limit), total: matching.length, offset, limit };
  }

  /** Each family held and how many sections it has, by family name. */
  families(): SectionFamilyCount[] {
    const counts = new Map<string, number>();
    for (const { entry } of this.#sorted) counts.set(entry.family, (counts.get(entry.family) ?? 0) + 1);
    return [...counts].map(([family, count]) => ({ family, count }));
  }
}
