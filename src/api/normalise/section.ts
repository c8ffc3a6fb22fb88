/** A request's section, resolved from the catalogue or converted to SI, with its properties. */

import type { SectionEntry } from '../../catalogues/section-entry.js';
import { EngineError } from '../../engine/engine-error.js';
import type { SectionDimensions } from '../../engine/sections/dimensions.js';
import { sectionProperties } from '../../engine/sections/section-from-dimensions.js';
import type { SectionProperties } from '../../engine/sections/section-properties.js';
import { jsonPointer, ProblemError } from '../problems.js';
import type { QuantityKind } from '../quantities.js';
import type { QuantityInput } from '../schemas/quantity.js';
import { CUSTOM_DIMENSION_KINDS, type SectionInput, type ShapeInput } from '../schemas/section-input.js';
import type { SectionLookup } from './catalogue-lookup.js';
import type { Path, QuantityReader } from './quantity-reader.js';

export interface ResolvedSection {
  readonly dimensions: SectionDimensions;
  readonly properties: SectionProperties;
  /** Present when the section came from a catalogue. */
  readonly entry?: SectionEntry;
}

/** Radii may be zero; every other dimension must be positive. */
const MAY_BE_ZERO = new Set(['rootRadius', 'outerCornerRadius']);

/** The shape's dimensions in SI; quantity errors go to the reader. */
export function shapeDimensions(shape: ShapeInput, reader: QuantityReader, base: Path): SectionDimensions {
  if (shape.shape === 'custom') {
    // Without a fibre distance the bending stress is unknown, and no stand-in is safe.
    if (shape.depth === undefined && shape.sectionModulusZ === undefined) {
      reader.fail([...base, 'depth'], 'give depth or sectionModulusZ: without a fibre distance the bending stress about z is unknown');
    }
    if (shape.width === undefined && shape.sectionModulusY === undefined) {
      reader.fail([...base, 'width'], 'give width or sectionModulusY: without a fibre distance the bending stress about y is unknown');
    }
  }
  const converted: Record<string, unknown> = { shape: shape.shape };
  for (const [key, value] of Object.entries(shape)) {
    if (key === 'shape' || value === undefined) continue;
    if (typeof value === 'boolean') {
      converted[key] = value;
      continue;
    }
    const kind = shape.shape === 'custom' ? (CUSTOM_DIMENSION_KINDS[key] as QuantityKind) : 'length';
    const path = [...base, key];
    const input = value as QuantityInput;
    converted[key] = MAY_BE_ZERO.has(key) || (shape.shape === 'custom' && key === 'warpingConstant')
      ? reader.nonNegative(input, kind, path)
      : reader.positive(input, kind, path);
  }
  return converted as unknown as SectionDimensions;
}

/**
 * Catalogue entries keep their dimensions object for the life of the process, so their properties are
 * computed once: sizing checks the same entries again and again.
 */
const propertiesByDimensions = new WeakMap<SectionDimensions, SectionProperties>();

/** Properties from dimensions; impossible geometry becomes a 422 naming the field. */
export function propertiesOf(dimensions: SectionDimensions, base: Path): SectionProperties {
  const known = propertiesByDimensions.get(dimensions);
  if (known) return known;
  try {
    const properties = sectionProperties(dimensions);
    propertiesByDimensions.set(dimensions, properties);
    return properties;
  } catch (error) {
    if (error instanceof EngineError && error.kind === 'impossible-geometry') {
      // The engine names the field as ['section', field]; re-root it where this section sits.
      const field = error.path.slice(1);
      const pointer = jsonPointer([...base, ...field]);
      throw new ProblemError('impossibleGeometry', `${pointer}: ${error.message}`, [{ pointer, message: error.message }]);
    }
    throw error;
  }
}

export function unknownDesignation(designation: string, sections: SectionLookup, path: Path): ProblemError {
  const nearest = sections.nearest(designation, 5);
  const pointer = jsonPointer(path);
  const hint = nearest.length > 0 ? ` Nearest: ${nearest.join(', ')}.` : '';
  return new ProblemError('unknownDesignation', `No catalogue section is designated "${designation}".${hint}`, [{ pointer, message: 'unknown designation' }], { nearest });
}

/**
 * Resolves a designation or converts a shape. Quantity errors are collected by the reader; the
 * caller finishes the reader before using the result, so `undefined` is returned when they occurred.
 */
export function resolveSection(input: SectionInput, sections: SectionLookup, reader: QuantityReader, base: Path): () => ResolvedSection {
  if ('designation' in input) {
    const entry = sections.find(input.designation);
    if (entry === undefined) throw unknownDesignation(input.designation, sections, [...base, 'designation']);
    return () => ({ dimensions: entry.dimensions, properties: propertiesOf(entry.dimensions, base), entry });
  }
  const dimensions = shapeDimensions(input, reader, base);
  return () => ({ dimensions, properties: propertiesOf(dimensions, base) });
}
