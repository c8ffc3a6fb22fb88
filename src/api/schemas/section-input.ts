/** A section in a request: a catalogue designation, or a shape with its dimensions. */

import type { QuantityKind } from '../quantities.js';
import { quantity } from './quantity.js';
import { z } from './zod.js';

const positiveLength = (description: string) => quantity('length', description);

export const designationReference = z
  .strictObject({
    designation: z
      .string()
      .min(1)
      .max(64)
      .openapi({ description: 'A catalogue designation as the standard writes it ("IPE 200", "SHS 100x100x5", "NPS 2 SCH 40", "W8X31"); case and spacing are not significant.', example: 'IPE 200' }),
  })
  .openapi('SectionDesignation', { description: 'A section from the catalogues, by designation.' });

const rectangle = z
  .strictObject({
    shape: z.literal('rectangle'),
    width: positiveLength('Width along z.'),
    depth: positiveLength('Depth along y.'),
  })
  .openapi('RectangleSection', { description: 'A solid rectangular bar.' });

const round = z
  .strictObject({ shape: z.literal('round'), diameter: positiveLength('Diameter.') })
  .openapi('RoundSection', { description: 'A solid round bar.' });

const tube = z
  .strictObject({
    shape: z.literal('tube'),
    outerDiameter: positiveLength('Outside diameter.'),
    wallThickness: positiveLength('Wall thickness; less than half the outside diameter.'),
  })
  .openapi('TubeSection', { description: 'A circular hollow section (tube or pipe).' });

const box = z
  .strictObject({
    shape: z.literal('box'),
    width: positiveLength('Outside width along z.'),
    depth: positiveLength('Outside depth along y.'),
    wallThickness: positiveLength('Wall thickness; less than half the smaller outside dimension.'),
    outerCornerRadius: positiveLength('Outside corner radius; 0 for sharp corners. The inside radius is max(outer - wall, 0).').optional(),
  })
  .openapi('BoxSection', { description: 'A rectangular or square hollow section.' });

const iSection = z
  .strictObject({
    shape: z.literal('i-section'),
    depth: positiveLength('Overall depth along y.'),
    flangeWidth: positiveLength('Flange width along z.'),
    webThickness: positiveLength('Web thickness.'),
    flangeThickness: positiveLength('Flange thickness; less than half the depth.'),
    rootRadius: positiveLength('Root fillet radius between web and flanges; 0 for none.'),
  })
  .openapi('ISection', { description: 'A doubly symmetric I or H section with parallel flanges, upright (web along y).' });

const channel = z
  .strictObject({
    shape: z.literal('channel'),
    depth: positiveLength('Overall depth along y.'),
    flangeWidth: positiveLength('Flange width along z, including the web.'),
    webThickness: positiveLength('Web thickness.'),
    flangeThickness: positiveLength('Flange thickness.'),
    rootRadius: positiveLength('Root fillet radius; 0 or absent for none.').optional(),
  })
  .openapi('ChannelSection', { description: 'A parallel-flange channel, web along y at the -z side, flanges towards +z.' });

const tee = z
  .strictObject({
    shape: z.literal('tee'),
    depth: positiveLength('Overall depth along y.'),
    flangeWidth: positiveLength('Flange width along z.'),
    webThickness: positiveLength('Stem thickness.'),
    flangeThickness: positiveLength('Flange thickness.'),
    rootRadius: positiveLength('Root fillet radius; 0 or absent for none.').optional(),
  })
  .openapi('TeeSection', { description: 'A tee with its flange on top (+y) and the stem below.' });

const angle = z
  .strictObject({
    shape: z.literal('angle'),
    legY: positiveLength('Length of the leg along y.'),
    legZ: positiveLength('Length of the leg along z.'),
    thickness: positiveLength('Leg thickness.'),
    rootRadius: positiveLength('Root fillet radius; 0 or absent for none.').optional(),
  })
  .openapi('AngleSection', { description: 'An equal or unequal angle, heel at the bottom -z corner, legs along +y and +z.' });

/** The kind of each numeric field of a custom section; every other shape's fields are lengths. */
export const CUSTOM_DIMENSION_KINDS: Record<string, QuantityKind> = {
  area: 'area',
  secondMomentZ: 'secondMoment',
  secondMomentY: 'secondMoment',
  torsionConstant: 'secondMoment',
  depth: 'length',
  width: 'length',
  sectionModulusZ: 'sectionModulus',
  sectionModulusY: 'sectionModulus',
  plasticModulusZ: 'sectionModulus',
  plasticModulusY: 'sectionModulus',
  warpingConstant: 'warpingConstant',
  shearAreaY: 'area',
  shearAreaZ: 'area',
  torsionalModulus: 'sectionModulus',
  thickestElement: 'length',
};

const custom = z
  .strictObject({
    shape: z.literal('custom'),
    area: quantity('area', 'Cross-section area.'),
    secondMomentZ: quantity('secondMoment', 'Second moment of area about the horizontal z axis (strong axis of an upright I).'),
    secondMomentY: quantity('secondMoment', 'Second moment of area about the vertical y axis.'),
    torsionConstant: quantity('secondMoment', 'Saint-Venant torsion constant J.'),
    depth: positiveLength('Overall depth along y: the fibre distances for bending about z (taken as symmetric). Give depth or sectionModulusZ.').optional(),
    width: positiveLength('Overall width along z: the fibre distances for bending about y. Give width or sectionModulusY.').optional(),
    sectionModulusZ: quantity('sectionModulus', 'Least elastic section modulus about z.').optional(),
    sectionModulusY: quantity('sectionModulus', 'Least elastic section modulus about y.').optional(),
    plasticModulusZ: quantity('sectionModulus', 'Plastic section modulus about z.').optional(),
    plasticModulusY: quantity('sectionModulus', 'Plastic section modulus about y.').optional(),
    warpingConstant: quantity('warpingConstant', 'Warping constant Iw.').optional(),
    shearAreaY: quantity('area', 'Shear area for shear along y.').optional(),
    shearAreaZ: quantity('area', 'Shear area for shear along z.').optional(),
    torsionalModulus: quantity('sectionModulus', 'Torsional modulus Wt: the largest torsional shear stress is T / Wt.').optional(),
    thickestElement: positiveLength('Thickest plate element: it selects the strength band of a graded steel.').optional(),
    closed: z.boolean().optional().openapi({ description: 'True for a closed (hollow or solid compact) section, which does not buckle laterally-torsionally.' }),
  })
  .openapi('CustomSection', { description: 'Section properties given directly.' });

export const shapeInput = z.discriminatedUnion('shape', [rectangle, round, tube, box, iSection, channel, tee, angle, custom]);

export const sectionInput = z
  .union([designationReference, shapeInput])
  .openapi('SectionInput', { description: 'A catalogue designation, or a shape with its dimensions (depth along y, width along z).' });

export type SectionInput = z.infer<typeof sectionInput>;
export type ShapeInput = z.infer<typeof shapeInput>;
