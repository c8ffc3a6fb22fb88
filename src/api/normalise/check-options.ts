/** The check options of a request, in SI, as the engine's check input. */

import type { BucklingInput, LateralTorsionalInput, PinInput } from '../../engine/checks/check-input.js';
import type { CriteriaInput } from '../../engine/checks/criteria.js';
import type { BucklingRequest, CriteriaRequest, LateralTorsionalRequest } from '../schemas/check-options.js';
import type { SupportInput } from '../schemas/member-input.js';
import type { MaterialLookup } from './catalogue-lookup.js';
import { resolveMaterial } from './material.js';
import type { Path, QuantityReader } from './quantity-reader.js';

export function normaliseCriteria(criteria: CriteriaRequest | undefined, reader: QuantityReader, base: Path): CriteriaInput {
  if (criteria === undefined) return {};
  const { allowedTwist, ...rest } = criteria;
  return {
    ...rest,
    ...(allowedTwist === undefined ? {} : { allowedTwist: reader.positive(allowedTwist, 'angle', [...base, 'allowedTwist']) }),
  } as CriteriaInput;
}

export function normaliseBuckling(buckling: BucklingRequest | undefined, reader: QuantityReader, base: Path): BucklingInput {
  if (buckling === undefined) return {};
  const { unbracedLength, eccentricity, ...rest } = buckling;
  return {
    ...rest,
    ...(unbracedLength === undefined ? {} : { unbracedLength: reader.positive(unbracedLength, 'length', [...base, 'unbracedLength']) }),
    ...(eccentricity === undefined ? {} : { eccentricity: reader.nonNegative(eccentricity, 'length', [...base, 'eccentricity']) }),
  };
}

export function normaliseLateralTorsional(options: LateralTorsionalRequest | undefined, reader: QuantityReader, base: Path): LateralTorsionalInput {
  if (options === undefined) return {};
  const { unbracedLength, loadHeight, ...rest } = options;
  return {
    ...rest,
    ...(unbracedLength === undefined ? {} : { unbracedLength: reader.positive(unbracedLength, 'length', [...base, 'unbracedLength']) }),
    ...(loadHeight === undefined
      ? {}
      : { loadHeight: typeof loadHeight === 'string' ? loadHeight : { aboveShearCentre: reader.read(loadHeight.aboveShearCentre, 'length', [...base, 'loadHeight', 'aboveShearCentre']) } }),
  };
}

/** The declared pins, each tied to its support's index. */
export function normalisePins(supports: readonly SupportInput[], materials: MaterialLookup, reader: QuantityReader, base: Path): PinInput[] {
  const pins: PinInput[] = [];
  supports.forEach((support, index) => {
    const pin = support.pin;
    if (pin === undefined) return;
    const path = [...base, index, 'pin'];
    const diameter = reader.positive(pin.diameter, 'length', [...path, 'diameter']);
    const plateThickness = reader.positive(pin.plateThickness, 'length', [...path, 'plateThickness']);
    const clevisPlateThickness =
      pin.clevisPlateThickness === undefined
        ? plateThickness / pin.shearPlanes
        : reader.positive(pin.clevisPlateThickness, 'length', [...path, 'clevisPlateThickness']);
    const gap = pin.gap === undefined ? 0 : reader.read(pin.gap, 'length', [...path, 'gap']);
    if (Number.isFinite(gap) && gap < 0) reader.fail([...path, 'gap'], 'a gap cannot be negative');
    const material = resolveMaterial(pin.material, materials, reader, [...path, 'material']);
    // A bad diameter is already reported; the material waits for a usable one.
    if (!(diameter > 0)) return;
    // A pin's thickness band is its diameter (a round bar).
    pins.push({ support: index, diameter, plateThickness, clevisPlateThickness, gap, shearPlanes: pin.shearPlanes, material: material.forThickness(diameter).material });
  });
  return pins;
}
