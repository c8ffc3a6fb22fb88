/** Presenting a resolved section in the response's units. */

import type { SectionProperties } from '../../engine/sections/section-properties.js';
import type { ResolvedSection } from '../normalise/section.js';
import { present, type OutputUnits } from '../output-units.js';
import { CUSTOM_DIMENSION_KINDS } from '../schemas/section-input.js';
import { presentFieldTable } from '../schemas/field-table.js';
import { SECTION_PROPERTY_FIELDS } from '../schemas/section-output.js';

export function presentSectionProperties(properties: SectionProperties, units: OutputUnits, density?: number) {
  const numeric = presentFieldTable(SECTION_PROPERTY_FIELDS, properties, units);
  return {
    shape: properties.shape,
    ...numeric,
    closed: properties.closed,
    bendingCombination: properties.bendingCombination,
    stressPoints: properties.stressPoints.map((point) => ({
      y: present(units, 'length', point.y),
      z: present(units, 'length', point.z),
      label: point.label,
    })),
    massPerLength: density === undefined ? undefined : present(units, 'massPerLength', properties.area * density),
  };
}

export function presentSection(section: ResolvedSection, units: OutputUnits, density?: number) {
  const dimensions: Record<string, string | number | boolean> = {};
  for (const [key, value] of Object.entries(section.dimensions)) {
    if (typeof value !== 'number') dimensions[key] = value as string | boolean;
    else dimensions[key] = present(units, section.dimensions.shape === 'custom' ? (CUSTOM_DIMENSION_KINDS[key] ?? 'length') : 'length', value);
  }
  const entry = section.entry;
  // Absent values are undefined, which JSON leaves out.
  return {
    designation: entry?.designation,
    family: entry?.family,
    standard: entry?.standard,
    source: entry?.source,
    nominalMassPerLength: entry === undefined ? undefined : present(units, 'massPerLength', entry.massPerLength),
    dimensions,
    properties: presentSectionProperties(section.properties, units, density),
  };
}
