/** The plain-words notices that go with every check outcome: what the checks assume and leave out. */

import type { KnownSectionProperties } from '../sections/section-properties.js';
import { SCREENING_CAUTION } from '../caution.js';
import type { CheckContext } from './check-context.js';
import type { FailureCheck } from './check-outcome.js';
import { largestMagnitudeOn } from './critical-positions.js';
import { eulerLoad } from './column-buckling.js';
import { productMomentOf, transverseShearPerForce } from './section-stresses.js';

/** The caution every result opens with. */
export const CAUTION_NOTICE = SCREENING_CAUTION;
export const EXCLUSIONS_NOTICE =
  'Stress concentrations, fatigue under repeated loads, and connections other than the declared pins are not included.';
export const COLUMN_NOTICE =
  'The column formulas assume a straight, concentrically loaded column equivalent to a pin-ended one of length K L.';
export const LOCAL_BUCKLING_NOTICE =
  'The plates are classed by their width-to-thickness ratios (EN 1993-1-1 Table 5.2, from memory): a slender (class 4) plate is listed as unchecked; within the class 3 limits local buckling is taken not to come before yield. No plastic reserve is counted on (elastic section moduli).';
export const BRITTLE_NOTICE =
  'Brittle material: the strength checks use the ultimate strengths (no yield), and modified Mohr for combined stresses.';
export const ELEMENTARY_SHEAR_NOTICE = 'The transverse shear stress V Q / (I b) is the elementary beam-theory value.';
export const AVERAGE_SHEAR_NOTICE =
  'The section gives no first moment of area for shear: the transverse shear stress is the average V / A, which understates the peak.';
export const UNSYMMETRIC_NOTICE =
  'The principal axes are not y and z (product moment Iyz is not zero): stresses use the unsymmetric-bending formula, but the deflections treat bending about y and z as uncoupled and can understate the true deflection (for an unequal angle, up to about twice).';
export const SHEAR_CENTRE_NOTICE =
  'Loads are taken to act through the shear centre: a load through the web or the centroid of a channel, tee or angle also twists it, and that torsion is not included.';
export const WARPING_NOTICE =
  'An open section under torque warps wherever the torque or the restraint changes along it (at a point torque, a support, a fixed end): its warping normal and shear stresses, from the exact non-uniform torsion solution with forks at supports that hold twist (fixed supports also holding warping), are added in a combined check at the flange tips, as an upper bound. Twist and the torsional shear elsewhere are still from uniform (Saint-Venant) torsion, which overstates them.';
export const WEB_TOE_NOTICE =
  'The combined stress is evaluated at the extreme fibres and at the neutral axis, not at the web at the root of the fillets, where bending and shear of a short, heavily loaded I-section or channel can combine to about 10 % more.';
export const BIAXIAL_SHEAR_NOTICE =
  'Shear acts along both y and z: the larger direction is checked; on a solid section the two can meet at the centroid, where their resultant can reach up to sqrt(2) times the larger.';
export const RUNWAY_DEFLECTION_NOTICE =
  'The default deflection limits (L/250 for spans, L/180 for overhangs) are general ones (common practice); crane and gantry runway girders and monorail beams are usually held to far stricter limits, of the order of L/600 to L/1000 vertically and L/500 sideways (common practice, set by the crane maker and the governing code): give deflectionLimitRatio.';
export const LATERAL_TORSIONAL_NOTICE =
  'Lateral-torsional buckling: a support that holds the member laterally is taken as a fork that also prevents twist; the load acts on the top flange unless lateralTorsional.loadHeight says otherwise, and destabilises when it acts towards the shear centre (gravity on the top flange); the resistance is reduced for the inelastic range by EN 1993-1-1 6.3.2.2 (from memory).';
export const CUSTOM_LATERAL_TORSIONAL_NOTICE =
  'A custom section is taken as doubly symmetric in lateral-torsional buckling (shear centre at mid-depth), with the torsion constant, warping constant (0 when not given, the low side) and minor-axis second moment given; its plates are not known, so local buckling is left unchecked: give the section as a shape where one fits.';
export const AMPLIFICATION_NOTICE =
  'The beam-column check takes the largest compressive force and the largest moments together, wherever they occur.';

/** What each stand-in of a section given by its properties means for the checks (see KnownSectionProperties). */
export const STAND_IN_NOTICES: Readonly<Partial<Record<keyof KnownSectionProperties, string>>> = {
  bendingStressZ:
    'No depth or sectionModulusZ was given: bending stresses about z take the radius of gyration as the fibre distance, which understates them.',
  bendingStressY:
    'No width or sectionModulusY was given: bending stresses about y take the radius of gyration as the fibre distance, which understates them.',
  shearStressY: "No shear area along y was given: the transverse shear stress is a solid rectangle's 1.5 V / A, which understates a thin web's.",
  shearStressZ: "No shear area along z was given: the transverse shear stress is a solid rectangle's 1.5 V / A, which understates thin flanges'.",
  torsionalShearStress: 'No torsional modulus was given: the torsional shear stress is T R / J with R the half diagonal, an upper bound.',
  productMoment: 'The given axes are taken as the principal axes (no product moment).',
};

const STAND_IN_NOTICE_ENTRIES = Object.entries(STAND_IN_NOTICES) as [keyof KnownSectionProperties, string][];

export const NO_DEMAND_NOTICE = 'No load effect anywhere on the member: every utilization is zero.';

const THIN_WALLED_SHAPES = new Set(['i-section', 'channel', 'tee', 'angle', 'box', 'tube']);
/** Open shapes whose shear centre is away from the centroid. */
const UNSYMMETRIC_OPEN_SHAPES = new Set(['channel', 'tee', 'angle']);
/** Open shapes with flanges, where warping and the web-to-flange junction matter. */
const WARPING_SHAPES = new Set(['i-section', 'channel']);
/** Non-circular sections whose two transverse shear peaks can meet at one point. */
const SOLID_SHAPES = new Set(['rectangle', 'custom']);

/** The notice of the shared, frozen list of the criteria that are filled in by default (criteria.ts), written once. */
let frozenDefaulted: readonly string[] | null = null;
let frozenDefaultedNotice = '';

export function defaultsNotice(defaulted: readonly string[]): string {
  if (defaulted === frozenDefaulted) return frozenDefaultedNotice;
  const notice = `Default criteria (common practice) stand in for the governing code: ${defaulted.join(', ')}.`;
  if (Object.isFrozen(defaulted)) {
    frozenDefaulted = defaulted;
    frozenDefaultedNotice = notice;
  }
  return notice;
}

function wasChecked(checks: readonly FailureCheck[], mode: FailureCheck['mode']): boolean {
  return checks.some((check) => check.mode === mode);
}

export function memberNotices(context: CheckContext, checks: readonly FailureCheck[]): string[] {
  const { input, criteria, peaks } = context;
  const { section } = input;
  const notices = [CAUTION_NOTICE, EXCLUSIONS_NOTICE];
  if (criteria.defaulted.length > 0) notices.push(defaultsNotice(criteria.defaulted));
  if (wasChecked(checks, 'deflection') && criteria.defaulted.includes('deflectionLimitRatio')) notices.push(RUNWAY_DEFLECTION_NOTICE);
  if (criteria.keptDefaults !== undefined) {
    const kept = criteria.keptDefaults.map((key) => `${key} ${criteria.requiredSafetyFactor[key]}`).join(', ');
    notices.push(`A single requiredSafetyFactor never lowers a mode below its default (common practice): ${kept} kept. Give factors by mode to set them lower.`);
  }
  if (input.material.behaviour === 'brittle') notices.push(BRITTLE_NOTICE);
  if (THIN_WALLED_SHAPES.has(section.shape)) notices.push(LOCAL_BUCKLING_NOTICE);
  for (const [property, notice] of STAND_IN_NOTICE_ENTRIES) {
    if (section.known?.[property] === false) notices.push(notice);
  }
  if (productMomentOf(section) !== 0) notices.push(UNSYMMETRIC_NOTICE);
  if (UNSYMMETRIC_OPEN_SHAPES.has(section.shape)) notices.push(SHEAR_CENTRE_NOTICE);
  if (WARPING_SHAPES.has(section.shape) && peaks.torsionalShear.value > 0) notices.push(WARPING_NOTICE);
  if (WARPING_SHAPES.has(section.shape) && peaks.transverseShear.value > 0 && peaks.bendingTension.value > 0) notices.push(WEB_TOE_NOTICE);
  if (peaks.transverseShear.value > 0) {
    notices.push(transverseShearPerForce(section).elementary ? ELEMENTARY_SHEAR_NOTICE : AVERAGE_SHEAR_NOTICE);
  }
  if (SOLID_SHAPES.has(section.shape) && hasShearInBothDirections(context)) notices.push(BIAXIAL_SHEAR_NOTICE);
  if (wasChecked(checks, 'buckling')) {
    notices.push(COLUMN_NOTICE);
    const force = peaks.axialCompression.value * section.area;
    for (const axis of context.columnAxes) {
      notices.push(`Effective-length factor about the ${axis.axis} axis: K = ${axis.effectiveLengthFactor.factor}, ${axis.effectiveLengthFactor.basis}.`);
      if (force >= eulerLoad(context, axis)) {
        notices.push(`The compressive force reaches the Euler load about the ${axis.axis} axis: the member buckles.`);
      }
    }
  }
  if (wasChecked(checks, 'lateral-torsional-buckling')) {
    notices.push(LATERAL_TORSIONAL_NOTICE);
    if (section.shape === 'custom') notices.push(CUSTOM_LATERAL_TORSIONAL_NOTICE);
  }
  if (wasChecked(checks, 'beam-column')) notices.push(AMPLIFICATION_NOTICE);
  if (checks.every((check) => check.utilization === 0)) {
    notices.push(NO_DEMAND_NOTICE);
  }
  return notices;
}

function hasShearInBothDirections(context: CheckContext): boolean {
  const { analysis } = context.input;
  return (
    largestMagnitudeOn(analysis, 'shearY', 0, analysis.length).value > 0 &&
    largestMagnitudeOn(analysis, 'shearZ', 0, analysis.length).value > 0
  );
}
