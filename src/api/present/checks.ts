/**
 * Presenting the failure checks in the response's units; null values are left out, never sent as null.
 * Every object is written with all its keys in contract order, an absent value as undefined, which JSON
 * leaves out: one shape per kind of object instead of spreads that make a new one each time.
 */

import type { BucklingAxisResult, CheckQuantity, FailureCheck, GoverningFailure, MemberCheckOutcome, StressExtreme } from '../../engine/checks/check-outcome.js';
import { present, textInUnits, type OutputUnits } from '../output-units.js';

/** The unit kind of each check quantity; it is also the quantity's name in the contract. */
const CHECK_KINDS: Record<CheckQuantity, 'stress' | 'force' | 'moment' | 'deflection' | 'angle'> = {
  stress: 'stress',
  force: 'force',
  moment: 'moment',
  length: 'deflection',
  angle: 'angle',
};

/** A length that may be absent, in the presented unit. */
function optionalLength(units: OutputUnits, value: number | null | undefined): number | undefined {
  return value === null || value === undefined ? undefined : present(units, 'length', value);
}

function presentAxis(axis: BucklingAxisResult, units: OutputUnits) {
  return {
    axis: axis.axis,
    regime: axis.regime,
    slendernessRatio: axis.slendernessRatio,
    transitionSlendernessRatio: axis.transitionSlendernessRatio,
    criticalStress: present(units, 'stress', axis.criticalStress),
    criticalLoad: present(units, 'force', axis.criticalLoad),
    effectiveLength: present(units, 'length', axis.effectiveLength),
    effectiveLengthFactor: axis.effectiveLengthFactor,
    safetyFactor: axis.safetyFactor ?? undefined,
  };
}

function presentStress(extreme: StressExtreme, units: OutputUnits) {
  return {
    value: present(units, 'stress', extreme.value),
    position: optionalLength(units, extreme.position),
    location: extreme.location === null ? undefined : textInUnits(units, extreme.location),
  };
}

/** Which combination and train position a check comes from, when the loads come in combinations. */
export interface CheckOrigin {
  readonly combination: string;
  readonly loadPosition: number | null;
}

export function presentCheckList(checks: readonly FailureCheck[], units: OutputUnits, origins?: readonly CheckOrigin[]) {
  return checks.map((check, i) => {
    const kind = CHECK_KINDS[check.quantity];
    const origin = origins?.[i];
    return {
      mode: check.mode,
      quantity: kind,
      demand: present(units, kind, check.demand),
      capacity: present(units, kind, check.capacity),
      safetyFactor: check.safetyFactor ?? undefined,
      requiredSafetyFactor: check.requiredSafetyFactor,
      utilization: check.utilization,
      passes: check.passes,
      position: optionalLength(units, check.position),
      location: check.location === null ? undefined : textInUnits(units, check.location),
      basis: check.basis,
      combination: origin?.combination,
      loadPosition: optionalLength(units, origin?.loadPosition),
    };
  });
}

export function presentGoverning(governing: GoverningFailure | null, units: OutputUnits) {
  return governing === null
    ? undefined
    : {
        mode: governing.mode,
        utilization: governing.utilization,
        safetyFactor: governing.safetyFactor,
        position: optionalLength(units, governing.position),
        location: governing.location === null ? undefined : textInUnits(units, governing.location),
      };
}

export function presentChecks(outcome: MemberCheckOutcome, units: OutputUnits, origins?: readonly CheckOrigin[]) {
  const ltb = outcome.lateralTorsionalBuckling;
  const { stresses, criteria } = outcome;
  return {
    checks: presentCheckList(outcome.checks, units, origins),
    notApplicable: outcome.notApplicable.map(({ mode, reason }) => ({ mode, reason: textInUnits(units, reason) })),
    unchecked: outcome.unchecked.map(({ mode, reason }) => ({ mode, reason: textInUnits(units, reason) })),
    governing: presentGoverning(outcome.governing, units),
    verdict: outcome.verdict,
    buckling: { governing: presentAxis(outcome.buckling.governing, units), axes: outcome.buckling.axes.map((axis) => presentAxis(axis, units)) },
    lateralTorsionalBuckling:
      ltb === null
        ? undefined
        : {
            from: present(units, 'length', ltb.from),
            to: present(units, 'length', ltb.to),
            unbracedLength: present(units, 'length', ltb.unbracedLength),
            effectiveLength: present(units, 'length', ltb.effectiveLength),
            momentGradientFactor: ltb.momentGradientFactor,
            criticalMoment: present(units, 'moment', ltb.criticalMoment),
            relativeSlenderness: ltb.relativeSlenderness,
            reductionFactor: ltb.reductionFactor,
            resistance: present(units, 'moment', ltb.resistance),
            curve: ltb.curve,
            loadHeight: present(units, 'length', ltb.loadHeight),
          },
    stresses: {
      axialTension: presentStress(stresses.axialTension, units),
      axialCompression: presentStress(stresses.axialCompression, units),
      bendingTension: presentStress(stresses.bendingTension, units),
      bendingCompression: presentStress(stresses.bendingCompression, units),
      transverseShear: presentStress(stresses.transverseShear, units),
      averageShear: presentStress(stresses.averageShear, units),
      torsionalShear: presentStress(stresses.torsionalShear, units),
      equivalent: presentStress(stresses.equivalent, units),
    },
    criteria: {
      requiredSafetyFactor: { ...criteria.requiredSafetyFactor },
      deflectionLimitRatio: criteria.deflectionLimitRatio,
      cantileverDeflectionLimitRatio: criteria.cantileverDeflectionLimitRatio,
      allowedTwist: present(units, 'angle', criteria.allowedTwist),
      shearYieldRatio: criteria.shearYieldRatio,
      defaulted: [...criteria.defaulted],
    },
  };
}
