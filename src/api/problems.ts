/**
 * Every problem the service can answer with, declared once (RFC 9457 problem details).
 * Routes and the error handler raise problems by name; the body is built in one place.
 */

export interface ProblemType {
  readonly status: number;
  readonly title: string;
  /** A stable URI reference that identifies the problem type. */
  readonly type: string;
}

const TYPE_BASE = 'https://memberproof.dev/problems/';

function problemType(slug: string, status: number, title: string): ProblemType {
  return { status, title, type: `${TYPE_BASE}${slug}` };
}

export const PROBLEMS = {
  invalidInput: problemType('invalid-input', 400, 'The request is not valid'),
  malformedJson: problemType('malformed-json', 400, 'The request body is not valid JSON'),
  unknownDesignation: problemType('unknown-designation', 400, 'No catalogue section has that designation'),
  unknownGrade: problemType('unknown-grade', 400, 'No catalogue material has that grade'),
  notFound: problemType('not-found', 404, 'No such resource'),
  methodNotAllowed: problemType('method-not-allowed', 405, 'The resource does not accept that method'),
  bodyTooLarge: problemType('body-too-large', 413, 'The request body is larger than the service accepts'),
  unsupportedMediaType: problemType('unsupported-media-type', 415, 'The request body must be application/json'),
  unstableMember: problemType('unstable-member', 422, 'The member can move without deforming'),
  outsideMember: problemType('outside-member', 422, 'A position lies outside the member'),
  impossibleGeometry: problemType('impossible-geometry', 422, 'No real section has that geometry'),
  notApplicable: problemType('not-applicable', 422, 'The request cannot be answered for this member'),
  noPassingCandidate: problemType('no-passing-candidate', 422, 'No candidate section passes'),
  tooManyItems: problemType('too-many-items', 413, 'The batch holds more items than the service accepts'),
  tooMuchWork: problemType('too-much-work', 422, 'The request asks for more calculation than one request may'),
  overloaded: problemType('overloaded', 503, 'The service is overloaded; retry after the time given'),
  internal: problemType('internal-error', 500, 'The service failed to answer'),
} as const satisfies Record<string, ProblemType>;

export type ProblemName = keyof typeof PROBLEMS;

/** One invalid field: an RFC 6901 JSON pointer into the request body and what is wrong there. */
export interface FieldError {
  readonly pointer: string;
  readonly message: string;
}

export interface ProblemBody {
  readonly type: string;
  readonly title: string;
  readonly status: number;
  readonly detail: string;
  readonly instance?: string;
  readonly errors?: readonly FieldError[];
  readonly [extension: string]: unknown;
}

export class ProblemError extends Error {
  override readonly name = 'ProblemError';

  constructor(
    readonly problem: ProblemName,
    readonly detail: string,
    readonly errors: readonly FieldError[] = [],
    readonly extensions: Readonly<Record<string, unknown>> = {},
  ) {
    super(detail);
  }

  body(instance?: string): ProblemBody {
    const { type, title, status } = PROBLEMS[this.problem];
    return {
      type,
      title,
      status,
      detail: this.detail,
      ...(instance === undefined ? {} : { instance }),
      ...(this.errors.length > 0 ? { errors: this.errors } : {}),
      ...this.extensions,
    };
  }
}

/** RFC 6901: a JSON pointer from a path of keys and indices ("~" and "/" escaped). */
export function jsonPointer(path: readonly (string | number)[]): string {
  return path.map((key) => `/${String(key).replace(/~/g, '~0').replace(/\//g, '~1')}`).join('');
}

/** The invalid-input problem for one field. */
export function invalidField(path: readonly (string | number)[], message: string): ProblemError {
  const pointer = jsonPointer(path);
  return new ProblemError('invalidInput', `${pointer || 'The body'}: ${message}`, [{ pointer, message }]);
}

/** The too-much-work problem: a limit of the service, named with its value, at the field that exceeds it. */
export function tooMuchWork(path: readonly (string | number)[], message: string): ProblemError {
  const pointer = jsonPointer(path);
  return new ProblemError('tooMuchWork', `${pointer || 'The body'}: ${message}`, [{ pointer, message }]);
}
