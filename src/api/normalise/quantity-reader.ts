/**
 * Converts the quantities of one request to SI, collecting every bad field with its pointer so the
 * caller sees all of them in one 400 rather than one at a time.
 */

import { jsonPointer, ProblemError, type FieldError } from '../problems.js';
import { quantityToSI, type QuantityKind } from '../quantities.js';
import type { QuantityInput } from '../schemas/quantity.js';

export type Path = readonly (string | number)[];

export class QuantityReader {
  private readonly errors: FieldError[] = [];

  /** The SI value; NaN (never returned to a caller: see `finish`) when the field is bad. */
  read(input: QuantityInput, kind: QuantityKind, path: Path): number {
    const result = quantityToSI(input, kind);
    if (result.ok) return result.value;
    this.fail(path, result.message);
    return Number.NaN;
  }

  optional(input: QuantityInput | undefined, kind: QuantityKind, path: Path, fallback: number): number {
    return input === undefined ? fallback : this.read(input, kind, path);
  }

  positive(input: QuantityInput, kind: QuantityKind, path: Path): number {
    const value = this.read(input, kind, path);
    if (Number.isFinite(value) && !(value > 0)) this.fail(path, 'must be greater than zero');
    return value;
  }

  nonNegative(input: QuantityInput, kind: QuantityKind, path: Path): number {
    const value = this.read(input, kind, path);
    if (Number.isFinite(value) && value < 0) this.fail(path, 'must not be negative');
    return value;
  }

  fail(path: Path, message: string): void {
    this.errors.push({ pointer: jsonPointer(path), message });
  }

  /** Throws the collected errors as one invalid-input problem. */
  finish(): void {
    if (this.errors.length === 0) return;
    const first = this.errors[0] as FieldError;
    const detail = this.errors.length === 1 ? `${first.pointer}: ${first.message}` : `${this.errors.length} fields are not valid; see errors.`;
    throw new ProblemError('invalidInput', detail, this.errors.slice(0, 50));
  }
}
