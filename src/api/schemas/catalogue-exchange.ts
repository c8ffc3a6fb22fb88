/** The catalogue routes: sections and materials, listed and looked up. */

import { presentedQuantity } from './quantity.js';
import { materialOutput } from './material-output.js';
import { notices, unitsEcho } from './member-check-response.js';
import { resolvedSectionOutput } from './section-output.js';
import { z } from './zod.js';

export const DEFAULT_PAGE_SIZE = 50;
export const MAX_PAGE_SIZE = 500;

const queryQuantity = (description: string) =>
  z
    .string()
    .min(1)
    .max(64)
    .optional()
    .openapi({ description: `${description} A number in SI units or a value with a unit ("300 mm", "40 kg/m").` });

export const sectionListQuery = z
  .strictObject({
    family: z.string().max(32).optional().openapi({ description: 'Only this family ("IPE", "HEA", "SHS", "W", "PIPE"...); case is not significant.' }),
    maxDepth: queryQuantity('Only sections no deeper than this (overall depth along y).'),
    maxWidth: queryQuantity('Only sections no wider than this (overall width along z).'),
    maxMassPerLength: queryQuantity('Only sections no heavier than this per length.'),
    offset: z.coerce.number().int().min(0).optional().openapi({ description: 'How many matching sections to skip; default 0.' }),
    limit: z.coerce.number().int().min(1).max(MAX_PAGE_SIZE).optional().openapi({ description: `Page size; default ${DEFAULT_PAGE_SIZE}, at most ${MAX_PAGE_SIZE}.` }),
    units: z.enum(['SI', 'US']).optional().openapi({ description: 'Units of the response; SI by default.' }),
  })
  .openapi('SectionListQuery');

const sectionSummary = z
  .object({
    designation: z.string().openapi({ description: 'As the standard writes it.' }),
    family: z.string().openapi({ description: 'The catalogue family.' }),
    standard: z.string().openapi({ description: 'The standard of the entry.' }),
    shape: z.string().openapi({ description: 'The section shape.' }),
    depth: presentedQuantity('length', 'Overall depth along y (absent when unknown).').optional(),
    width: presentedQuantity('length', 'Overall width along z (absent when unknown).').optional(),
    massPerLength: presentedQuantity('massPerLength', 'Nominal mass per length.'),
  })
  .openapi('SectionSummary');

export const sectionListResponse = z
  .object({
    units: unitsEcho,
    items: z.array(sectionSummary).openapi({ description: 'This page of matching sections.' }),
    total: z.number().int().openapi({ description: 'Sections matching the filters, before paging.' }),
    offset: z.number().int().openapi({ description: 'Matching sections skipped.' }),
    limit: z.number().int().openapi({ description: 'Page size.' }),
    families: z.record(z.string(), z.number().int()).openapi({ description: 'Every family in the catalogues, with its number of sections.' }),
    notices,
  })
  .openapi('SectionList', { description: 'Sections sorted by family, then by mass per length.' });

export const designationParams = z.strictObject({
  designation: z.string().min(1).max(64).openapi({ description: 'The designation, URL-encoded ("IPE%20200"); case and spacing are not significant.', example: 'IPE 200' }),
});

export const unitsQuery = z.strictObject({ units: z.enum(['SI', 'US']).optional().openapi({ description: 'Units of the response; SI by default.' }) });

export const sectionDetailResponse = z
  .object({
    units: unitsEcho,
    section: resolvedSectionOutput,
    tabulated: z
      .record(z.string(), z.number())
      .openapi({ description: "The standard's tabulated values where it publishes them (area, second moments, moduli...), in the response's units, beside the computed ones for comparison." }),
    notices,
  })
  .openapi('SectionDetail');

const thicknessBand = z.object({
  maxThickness: presentedQuantity('length', 'The band holds elements up to this thickness.'),
  yieldStrength: presentedQuantity('stress', 'Yield strength in the band.'),
  ultimateStrength: presentedQuantity('stress', 'Ultimate strength in the band.'),
});

export const materialEntryOutput = materialOutput
  .extend({
    aliases: z.array(z.string()).openapi({ description: 'Other spellings that resolve to this grade.' }),
    thicknessBands: z.array(thicknessBand).openapi({ description: "The standard's strengths by element thickness; the values above are those of the thinnest band." }),
  })
  .openapi('MaterialEntry');

export const materialListResponse = z
  .object({
    units: unitsEcho,
    items: z.array(materialEntryOutput).openapi({ description: 'Every grade.' }),
    total: z.number().int().openapi({ description: 'Number of grades.' }),
    notices,
  })
  .openapi('MaterialList');

export const gradeParams = z.strictObject({
  grade: z.string().min(1).max(64).openapi({ description: 'The grade, URL-encoded; case, spacing and the standard prefix are not significant.', example: 'S355' }),
});

export const materialDetailResponse = z.object({ units: unitsEcho, material: materialEntryOutput, notices }).openapi('MaterialDetail');
