/**
 * The last line of defence for "never NaN or Infinity in a response": JSON would turn them into
 * null without a word, so a non-finite number anywhere in a result is treated as a defect (500).
 */

export class NonFiniteResultError extends Error {
  override readonly name = 'NonFiniteResultError';
}

export function assertFinite(value: unknown, path = ''): void {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new NonFiniteResultError(`non-finite number at ${path || '/'}`);
    return;
  }
  if (value === null || typeof value !== 'object') return;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const item: unknown = value[i];
      if (typeof item === 'number') {
        if (!Number.isFinite(item)) throw new NonFiniteResultError(`non-finite number at ${path}/${i}`);
      } else if (item !== null && typeof item === 'object') assertFinite(item, `${path}/${i}`);
    }
    return;
  }
  for (const [key, item] of Object.entries(value)) assertFinite(item, `${path}/${key}`);
}
