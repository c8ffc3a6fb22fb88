/** A request's material, resolved from the catalogue (with its thickness band) or converted to SI. */

import type { MaterialEntry } from '../../catalogues/material-entry.js';
import { EngineError } from '../../engine/engine-error.js';
import { DISTORTION_ENERGY_SHEAR_RATIO, type Material } from '../../engine/materials/material.js';
import { jsonPointer, ProblemError } from '../problems.js';
import type { MaterialInput } from '../schemas/material-input.js';
import type { MaterialLookup } from './catalogue-lookup.js';
import type { Path, QuantityReader } from './quantity-reader.js';

/** Common practice for structural steel when a request gives no density or Poisson's ratio. */
const DEFAULT_DENSITY = 7850;
const DEFAULT_POISSON_RATIO = 0.3;

export interface ResolvedMaterial {
  readonly material: Material;
  readonly entry?: MaterialEntry;
}

export function unknownGrade(grade: string, materials: MaterialLookup, path: Path): ProblemError {
  const nearest = materials.nearest(grade, 5);
  const pointer = jsonPointer(path);
  const hint = nearest.length > 0 ? ` Nearest: ${nearest.join(', ')}.` : '';
  return new ProblemError('unknownGrade', `No catalogue material has the grade "${grade}".${hint}`, [{ pointer, message: 'unknown grade' }], { nearest });
}

/**
 * The material once the section is known: catalogue grades take the strengths of the band that holds
 * the section's thickest element. The density does not depend on the band.
 */
export interface MaterialResolver {
  readonly density: number;
  forThickness(thickestElement: number): ResolvedMaterial;
}

export function resolveMaterial(input: MaterialInput, materials: MaterialLookup, reader: QuantityReader, base: Path): MaterialResolver {
  if ('grade' in input) {
    const entry = materials.find(input.grade);
    if (entry === undefined) throw unknownGrade(input.grade, materials, [...base, 'grade']);
    const forThickness = (thickness: number): ResolvedMaterial => {
      try {
        return { material: materials.forThickness(entry, thickness), entry };
      } catch (error) {
        if (error instanceof EngineError) {
          const pointer = jsonPointer([...base, 'grade']);
          throw new ProblemError('notApplicable', error.message, [{ pointer, message: error.message }]);
        }
        throw error;
      }
    };
    return { density: entry.density, forThickness };
  }
  const at = (key: string) => [...base, key];
  const elasticModulus = reader.positive(input.elasticModulus, 'stress', at('elasticModulus'));
  const poissonRatio = input.poissonRatio ?? DEFAULT_POISSON_RATIO;
  const shearModulus =
    input.shearModulus === undefined
      ? elasticModulus / (2 * (1 + poissonRatio))
      : reader.positive(input.shearModulus, 'stress', at('shearModulus'));
  const yieldStrength = reader.positive(input.yieldStrength, 'stress', at('yieldStrength'));
  const ultimateStrength = reader.positive(input.ultimateStrength, 'stress', at('ultimateStrength'));
  const material: Material = {
    grade: input.name ?? 'user-defined',
    standard: 'given in the request',
    elasticModulus,
    shearModulus,
    poissonRatio: input.poissonRatio ?? (input.shearModulus === undefined ? poissonRatio : elasticModulus / (2 * shearModulus) - 1),
    yieldStrength,
    compressiveYieldStrength:
      input.compressiveYieldStrength === undefined ? yieldStrength : reader.positive(input.compressiveYieldStrength, 'stress', at('compressiveYieldStrength')),
    ultimateStrength,
    compressiveUltimateStrength:
      input.compressiveUltimateStrength === undefined
        ? ultimateStrength
        : reader.positive(input.compressiveUltimateStrength, 'stress', at('compressiveUltimateStrength')),
    shearYieldRatio: input.shearYieldRatio ?? DISTORTION_ENERGY_SHEAR_RATIO,
    density: input.density === undefined ? DEFAULT_DENSITY : reader.positive(input.density, 'density', at('density')),
    behaviour: input.behaviour ?? 'ductile',
    source: 'user',
  };
  if (Number.isFinite(yieldStrength) && Number.isFinite(ultimateStrength) && ultimateStrength < yieldStrength) {
    reader.fail(at('ultimateStrength'), 'must not be less than yieldStrength');
  }
  return { density: material.density, forThickness: () => ({ material }) };
}
