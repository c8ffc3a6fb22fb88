/**
 * Symmetric band matrices and their LDL^T factorization without pivoting (Golub & Van Loan,
 * Matrix Computations 4th ed., sec. 4.3, band LDL^T; from memory). Cost O(n b^2) for size n and
 * half-bandwidth b: linear in the number of nodes of a member.
 */

import { packedZeros, zeroFilledDoubles, type DoubleArray } from './zero-filled.js';
import { PIVOT_TOLERANCE } from './tolerances.js';

export interface SymmetricBandMatrix {
  readonly size: number;
  /** Largest |i - j| of a non-zero entry. */
  readonly halfBandwidth: number;
  /** The lower band by rows: entry (i, j), j <= i <= j + halfBandwidth, at i * (halfBandwidth + 1) + i - j. */
  readonly entries: DoubleArray;
}

export function createSymmetricBandMatrix(size: number, halfBandwidth: number): SymmetricBandMatrix {
  return { size, halfBandwidth, entries: zeroFilledDoubles(size * (halfBandwidth + 1)) };
}

function bandIndex(matrix: SymmetricBandMatrix, row: number, col: number): number {
  const i = Math.max(row, col);
  const offset = i - Math.min(row, col);
  if (offset > matrix.halfBandwidth) throw new RangeError(`entry (${row}, ${col}) lies outside the band`);
  return i * (matrix.halfBandwidth + 1) + offset;
}

/** Adds value to entries (row, col) and (col, row), which are one stored number. */
export function addToBand(matrix: SymmetricBandMatrix, row: number, col: number, value: number): void {
  const index = bandIndex(matrix, row, col);
  matrix.entries[index] = (matrix.entries[index] as number) + value;
}

export function bandEntry(matrix: SymmetricBandMatrix, row: number, col: number): number {
  return Math.abs(row - col) > matrix.halfBandwidth ? 0 : (matrix.entries[bandIndex(matrix, row, col)] as number);
}

/**
 * Holds a degree of freedom at zero: its row and column become those of the identity, which keeps
 * the band and leaves the other equations as if the unknown were removed. Its right-hand side must
 * be set to zero by the caller.
 */
export function restrainInBand(matrix: SymmetricBandMatrix, dof: number): void {
  const { size, halfBandwidth: b, entries } = matrix;
  const width = b + 1;
  for (let offset = 1; offset <= b; offset++) {
    if (dof - offset >= 0) entries[dof * width + offset] = 0;
    if (dof + offset < size) entries[(dof + offset) * width + offset] = 0;
  }
  entries[dof * width] = 1;
}

export interface BandFactors {
  readonly kind: 'factored';
  readonly size: number;
  readonly halfBandwidth: number;
  /** Unit lower factor L below the diagonal and D on it, in the band layout. */
  readonly entries: DoubleArray;
}

/** The factorization stopped at a vanishing pivot: the leading block up to it is singular. */
export interface SingularBand {
  readonly kind: 'singular';
  readonly pivotIndex: number;
  /** z with z[pivotIndex] = 1 and zeros beyond it, solving L^T z = e_pivot, so that A z = d_pivot L e_pivot ~ 0. */
  readonly nullVector: Float64Array;
}

/**
 * LDL^T of a symmetric band matrix. A pivot d_j with d_j <= tolerance x A_jj (or A_jj <= 0) stops the
 * factorization as singular: the stiffness of that direction is spent on what came before it.
 */
export function factorSymmetricBand(
  matrix: SymmetricBandMatrix,
  pivotTolerance: number = PIVOT_TOLERANCE,
): BandFactors | SingularBand {
  const { size: n, halfBandwidth: b } = matrix;
  const width = b + 1;
  const a = matrix.entries.slice();
  const column = packedZeros(width);
  for (let j = 0; j < n; j++) {
    const pivot = a[j * width] as number;
    const original = matrix.entries[j * width] as number;
    if (!(original > 0) || !(pivot > pivotTolerance * original)) {
      return { kind: 'singular', pivotIndex: j, nullVector: leadingNullVector(a, n, b, j) };
    }
    const last = Math.min(n - 1, j + b);
    for (let i = j + 1; i <= last; i++) {
      const index = i * width + (i - j);
      column[i - j] = a[index] as number;
      a[index] = (a[index] as number) / pivot;
    }
    for (let i = j + 1; i <= last; i++) {
      const factor = (column[i - j] as number) / pivot;
      if (factor === 0) continue;
      const rowStart = i * width + i;
      for (let k = j + 1; k <= i; k++) a[rowStart - k] = (a[rowStart - k] as number) - factor * (column[k - j] as number);
    }
  }
  return { kind: 'factored', size: n, halfBandwidth: b, entries: a };
}

/** Back substitution L^T z = e_k over the columns already factored. */
function leadingNullVector(a: ArrayLike<number>, n: number, b: number, k: number): Float64Array {
  const width = b + 1;
  const z = new Float64Array(n);
  z[k] = 1;
  for (let j = k - 1; j >= 0; j--) {
    let sum = 0;
    const last = Math.min(k, j + b);
    for (let i = j + 1; i <= last; i++) sum += (a[i * width + (i - j)] as number) * (z[i] as number);
    z[j] = -sum;
  }
  return z;
}

/** Solves A x = rhs with the factors of A. */
export function solveWithBandFactors(factors: BandFactors, rhs: ArrayLike<number>): Float64Array {
  const { size: n, halfBandwidth: b, entries: a } = factors;
  const width = b + 1;
  const x = Float64Array.from(rhs);
  for (let i = 0; i < n; i++) {
    let sum = x[i] as number;
    const rowStart = i * width + i;
    for (let j = Math.max(0, i - b); j < i; j++) sum -= (a[rowStart - j] as number) * (x[j] as number);
    x[i] = sum;
  }
  for (let i = 0; i < n; i++) x[i] = (x[i] as number) / (a[i * width] as number);
  for (let i = n - 1; i >= 0; i--) {
    let sum = x[i] as number;
    const last = Math.min(n - 1, i + b);
    for (let k = i + 1; k <= last; k++) sum -= (a[k * width + (k - i)] as number) * (x[k] as number);
    x[i] = sum;
  }
  return x;
}
