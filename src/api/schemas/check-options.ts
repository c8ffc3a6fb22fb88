/** What a request may say about the checks: criteria, column buckling, lateral-torsional buckling, pins. */

import { FAILURE_MODES } from '../../engine/checks/failure-mode.js';
import { materialInput } from './material-input.js';
import { quantity } from './quantity.js';
import { z } from './zod.js';

const factor = (description: string) => z.number().gt(0).max(1000).openapi({ description });

const safetyFactorByMode = z
  .strictObject(
    Object.fromEntries(
      [...FAILURE_MODES, 'ultimate'].map((mode) => [
        mode,
        factor(mode === 'ultimate' ? 'Factor for the checks against an ultimate strength (tension-ultimate; every strength check of a brittle material).' : `Required safety factor for the ${mode} check.`).optional(),
      ]),
    ) as Record<string, z.ZodOptional<z.ZodNumber>>,
  )
  .openapi('SafetyFactorsByMode', { description: 'Required safety factors by failure mode; modes not named keep their defaults.' });

export const criteriaInput = z
  .strictObject({
    requiredSafetyFactor: z
      .union([factor('One factor for every strength and stability check.'), safetyFactorByMode])
      .optional()
      .openapi({ description: 'Required safety factor: one number for every strength and stability check, or by mode. Defaults (common practice): 1.5 against yield, 2.0 against ultimate, 2.5 against buckling. One number is a floor: it raises the modes whose default is lower and never lowers a mode below its default (a notice names those kept); give factors by mode to set a mode lower.' }),
    deflectionLimitRatio: factor('Span / allowed deflection for spans between supports (250 means L/250); default 250 (common practice).').optional(),
    cantileverDeflectionLimitRatio: factor('Length / allowed deflection for cantilevers and overhangs; default 180 (common practice).').optional(),
    allowedTwist: quantity('angle', 'Largest allowed angle of twist; default 1 degree (common practice).').optional(),
    shearYieldRatio: z.number().gt(0).max(1).optional().openapi({ description: "Shear yield strength / tensile yield strength; default the material's (1/sqrt(3), distortion energy)." }),
  })
  .openapi('Criteria', { description: 'What counts as passing. The defaults are common practice standing in for the governing code.' });

export const bucklingInput = z
  .strictObject({
    effectiveLengthFactor: factor('Effective-length factor K for both axes. Required for a member in compression whose K cannot be read from its supports (internal hinges, a translational spring, an end nothing holds): the answer is then a 422 naming this field.').optional(),
    effectiveLengthFactorY: factor('K for buckling about y (deflecting along z); overrides effectiveLengthFactor.').optional(),
    effectiveLengthFactorZ: factor('K for buckling about z (deflecting along y); overrides effectiveLengthFactor.').optional(),
    endConditions: z
      .enum(['fixed-fixed', 'fixed-pinned', 'pinned-pinned', 'fixed-free'])
      .optional()
      .openapi({ description: 'Idealised column ends when no K is given: theoretical K = 0.5, 0.7, 1.0, 2.0; without it the ends are read from the supports.' }),
    recommendedDesignValues: z.boolean().optional().openapi({ description: 'Use the recommended design K values 0.65, 0.80, 1.0, 2.1 (AISC Specification commentary, Table C-A-7.1) for endConditions.' }),
    unbracedLength: quantity('length', 'Length between points that restrain lateral translation; default the member length.').optional(),
    amplification: z.boolean().optional().openapi({ description: 'Check axial compression plus bending with the moments amplified by 1 / (1 - P / P_cr) (the beam-column check); on by default, false switches it off.' }),
    eccentricity: quantity('length', 'Eccentricity of the axial load: adds the secant-formula check (Shigley).').optional(),
  })
  .openapi('BucklingOptions', { description: 'Column buckling: effective length and beam-column options.' });

export const lateralTorsionalInput = z
  .strictObject({
    unbracedLength: quantity('length', 'Length between points braced against lateral movement and twist; default: cut at every support that holds the member laterally.').optional(),
    braced: z.boolean().optional().openapi({ description: 'The compression flange is braced continuously: no lateral-torsional buckling.' }),
    momentGradientFactor: factor('Moment-gradient factor C1 (Cb); default from the moment diagram (AISC 360-16, eq. F1-1).').optional(),
    loadHeight: z
      .union([
        z.enum(['shear-centre', 'top-flange', 'bottom-flange']),
        z.strictObject({ aboveShearCentre: quantity('length', "The load's distance from the shear centre.") }),
      ])
      .optional()
      .openapi({ description: 'Where the transverse loads act on the section: shear-centre, top-flange (default: the safe side for gravity loads), bottom-flange, or a distance above the shear centre (negative below). A load acting towards the shear centre from where it is applied destabilises (gravity on the top flange), one acting away from it stabilises; the direction is read from the net load on each span, and taken as destabilising where the loads cancel.' }),
  })
  .openapi('LateralTorsionalOptions', { description: 'Lateral-torsional buckling of open sections bent about z (I-sections, channels, tees, custom sections, narrow rectangles).' });

export const pinInput = z
  .strictObject({
    diameter: quantity('length', 'Pin diameter.'),
    material: materialInput.openapi({ description: 'The pin material, by grade or properties.' }),
    shearPlanes: z.union([z.literal(1), z.literal(2)]).openapi({ description: '1: single shear (F / A); 2: double shear, a clevis (F / 2A).' }),
    plateThickness: quantity('length', 'Thickness of the plate bearing on the pin (bearing stress F / (d t)): in double shear the eye between the clevis plates.'),
    clevisPlateThickness: quantity('length', 'Thickness of each clevis plate (double shear), or of the other plate (single shear), for pin bending. Default: half the plate thickness in double shear (two clevis plates together as thick as the eye, the thinnest that bear as much), the plate thickness in single shear.').optional(),
    gap: quantity('length', 'Clear gap between the plate and each clevis plate, for pin bending. Default 0, the published no-gap case.').optional(),
  })
  .openapi('Pin', { description: "The pin of a support's connection, checked in shear, bearing and bending under the support's resultant reaction." });

export type CriteriaRequest = z.infer<typeof criteriaInput>;
export type BucklingRequest = z.infer<typeof bucklingInput>;
export type LateralTorsionalRequest = z.infer<typeof lateralTorsionalInput>;
export type PinRequest = z.infer<typeof pinInput>;
