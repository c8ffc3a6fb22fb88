/** A resolved section in a response: where it came from, its dimensions and its properties. */

import type { SectionProperties } from '../../engine/sections/section-properties.js';
import { fieldTableShape, type FieldTable } from './field-table.js';
import { presentedQuantity } from './quantity.js';
import { z } from './zod.js';

type NumericProperty = { [K in keyof SectionProperties]-?: SectionProperties[K] extends number ? K : never }[keyof SectionProperties];

/** Each numeric property, its kind of quantity and what it is: the schema and the presenter both read this. */
export const SECTION_PROPERTY_FIELDS: FieldTable<NumericProperty> = {
  depth: { kind: 'length', description: 'Overall depth along y.' },
  width: { kind: 'length', description: 'Overall width along z.' },
  area: { kind: 'area', description: 'Cross-section area.' },
  centroidY: { kind: 'length', description: 'Centroid height above the bottom of the bounding box.' },
  centroidZ: { kind: 'length', description: 'Centroid distance from the -z side of the bounding box.' },
  secondMomentZ: { kind: 'secondMoment', description: 'Second moment of area about the centroidal z axis (horizontal; the strong axis of an upright I).' },
  secondMomentY: { kind: 'secondMoment', description: 'Second moment of area about the centroidal y axis (vertical).' },
  productMoment: { kind: 'secondMoment', description: 'Product moment of area, integral of y z dA about the centroid; 0 for a section symmetric about y or z.' },
  secondMomentMajor: { kind: 'secondMoment', description: 'Major principal second moment of area.' },
  secondMomentMinor: { kind: 'secondMoment', description: 'Minor principal second moment of area.' },
  principalAngle: { kind: 'angle', description: 'Angle from +z to the major principal axis, counterclockwise seen from +x.' },
  fibreDistanceTop: { kind: 'length', description: 'Distance from the centroid to the top (+y) fibre.' },
  fibreDistanceBottom: { kind: 'length', description: 'Distance from the centroid to the bottom (-y) fibre.' },
  fibreDistancePositiveZ: { kind: 'length', description: 'Distance from the centroid to the +z fibre.' },
  fibreDistanceNegativeZ: { kind: 'length', description: 'Distance from the centroid to the -z fibre.' },
  sectionModulusZ: { kind: 'sectionModulus', description: 'Least elastic section modulus about z: secondMomentZ / largest y fibre distance.' },
  sectionModulusY: { kind: 'sectionModulus', description: 'Least elastic section modulus about y.' },
  plasticModulusZ: { kind: 'sectionModulus', description: 'Plastic section modulus about z.' },
  plasticModulusY: { kind: 'sectionModulus', description: 'Plastic section modulus about y.' },
  radiusOfGyrationZ: { kind: 'length', description: 'Radius of gyration about z, sqrt(secondMomentZ / area).' },
  radiusOfGyrationY: { kind: 'length', description: 'Radius of gyration about y.' },
  radiusOfGyrationMinor: { kind: 'length', description: 'Radius of gyration about the minor principal axis.' },
  torsionConstant: { kind: 'secondMoment', description: 'Saint-Venant torsion constant J.' },
  torsionalShearPerTorque: { kind: 'torsionalShearPerTorque', description: 'Largest torsional shear stress per unit torque.' },
  shearFirstMomentY: { kind: 'sectionModulus', description: 'First moment of area Q at the cut where V Q / (I b) peaks (the neutral axis for most shapes), for shear along y.' },
  shearWidthY: { kind: 'length', description: 'Width b at that cut, for shear along y: largest tau = Vy Q / (Iz b).' },
  shearFirstMomentZ: { kind: 'sectionModulus', description: 'First moment of area Q at the cut where V Q / (I b) peaks, for shear along z.' },
  shearWidthZ: { kind: 'length', description: 'Width at that cut, for shear along z.' },
  warpingConstant: { kind: 'warpingConstant', description: 'Warping constant Iw; 0 where negligible.' },
  thickestElement: { kind: 'length', description: 'Thickest plate element; it selects the yield strength band of a graded steel.' },
};

const propertyShape = fieldTableShape(SECTION_PROPERTY_FIELDS);

export const sectionPropertiesOutput = z
  .object({
    shape: z.enum(['rectangle', 'round', 'tube', 'box', 'i-section', 'channel', 'tee', 'angle', 'custom']),
    ...propertyShape,
    closed: z.boolean().openapi({ description: 'A closed section (round, tube, box): lateral-torsional buckling does not apply. A rectangle is not closed: a deep flat bar can buckle laterally.' }),
    bendingCombination: z.enum(['resultant', 'points']).openapi({ description: "'resultant': bending stresses of circles combine as sqrt(My^2 + Mz^2) c / I; 'points': evaluated at each stress point." }),
    stressPoints: z
      .array(
        z.object({
          y: presentedQuantity('length', 'Height of the point above the centroid.'),
          z: presentedQuantity('length', 'Offset of the point along z from the centroid.'),
          label: z.string(),
        }),
      )
      .openapi({ description: 'Outline points, relative to the centroid (length unit), where the stresses are evaluated.' }),
    massPerLength: presentedQuantity('massPerLength', 'Mass per length from the area and the material density (absent without a density).').optional(),
  })
  .openapi('SectionProperties', { description: 'Section properties about centroidal axes; y up, z horizontal.' });

export const resolvedSectionOutput = z
  .object({
    designation: z.string().optional().openapi({ description: 'The catalogue designation, when the section came from a catalogue.' }),
    family: z.string().optional().openapi({ description: 'The catalogue family ("IPE", "SHS", "W"...).' }),
    standard: z.string().optional().openapi({ description: 'The standard the catalogue entry follows.' }),
    source: z.string().optional().openapi({ description: 'Where the catalogue data come from.' }),
    nominalMassPerLength: presentedQuantity('massPerLength', 'The catalogue\'s nominal mass per length.').optional(),
    dimensions: z.record(z.string(), z.union([z.string(), z.number(), z.boolean()])).openapi({ description: 'The shape and its dimensions in the response\'s units.' }),
    properties: sectionPropertiesOutput,
  })
  .openapi('ResolvedSection');
