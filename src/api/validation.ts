/** Parsing a body against its zod schema, with every failure named by an RFC 6901 pointer. */

import type { z } from 'zod';
import { jsonPointer, ProblemError, type FieldError } from './problems.js';

type Issue = z.core.$ZodIssue;
type Path = readonly PropertyKey[];

const MAX_REPORTED_ERRORS = 50;

/** The schema's output for a valid body; a 400 invalid-input problem listing every field otherwise. */
export function parseBody<S extends z.ZodType>(schema: S, body: unknown, basePath: readonly (string | number)[] = []): z.infer<S> {
  const result = schema.safeParse(body);
  if (result.success) return result.data;
  const errors = flattenIssues(result.error.issues, basePath).slice(0, MAX_REPORTED_ERRORS);
  const first = errors[0];
  const detail =
    errors.length === 1 && first
      ? `${first.pointer || 'The body'}: ${first.message}`
      : `${errors.length} fields are not valid; see errors.`;
  throw new ProblemError('invalidInput', detail, errors);
}

function flattenIssues(issues: readonly Issue[], base: Path): FieldError[] {
  return issues.flatMap((issue) => flattenIssue(issue, base));
}

function flattenIssue(issue: Issue, base: Path): FieldError[] {
  const path = [...base, ...issue.path];
  if (issue.code === 'unrecognized_keys') {
    return issue.keys.map((key) => ({ pointer: pointer([...path, key]), message: 'is not a field of this object' }));
  }
  if (issue.code === 'invalid_union' && issue.errors.length > 0) {
    const branches = issue.errors;
    if (branches.every((branch) => branch.length === 1 && branch[0]?.code === 'invalid_type' && branch[0].path.length === 0)) {
      const expected = branches.map((branch) => (branch[0] as { expected: string }).expected).join(' or ');
      return [{ pointer: pointer(path), message: `expected ${describeExpected(expected)}` }];
    }
    // The branch the caller most likely meant: the one with the fewest complaints, the first on a tie.
    const best = branches.reduce((a, b) => (leafCount(b) < leafCount(a) ? b : a));
    return flattenIssues(best, path);
  }
  return [{ pointer: pointer(path), message: issue.message.replace(/^Invalid input: /, '') }];
}

function leafCount(issues: readonly Issue[]): number {
  return issues.reduce((count, issue) => {
    if (issue.code === 'unrecognized_keys') return count + issue.keys.length;
    if (issue.code === 'invalid_union' && issue.errors.length > 0) return count + Math.min(...issue.errors.map(leafCount));
    return count + 1;
  }, 0);
}

function describeExpected(expected: string): string {
  return expected === 'number or string' ? 'a number in SI units or a string with a unit' : expected;
}

function pointer(path: Path): string {
  return jsonPointer(path.map((key) => (typeof key === 'symbol' ? key.toString() : key)));
}
