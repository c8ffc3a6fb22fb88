/**
 * Numbers written into the bases of the checks, each text made once per number: toPrecision and
 * toFixed cost more than the rest of a check's wording, and the same few numbers (a material's shear
 * yield ratio, a moment-gradient factor) come back request after request.
 */

const TEXTS_KEPT = 1024;

function cachedText(texts: Map<number, string>, x: number, make: (x: number) => string): string {
  const known = texts.get(x);
  if (known !== undefined) return known;
  const text = make(x);
  if (texts.size >= TEXTS_KEPT) texts.clear();
  texts.set(x, text);
  return text;
}

const fourSignificantTexts = new Map<number, string>();
const fourDecimalTexts = new Map<number, string>();

function fourSignificant(x: number): string {
  return `${Number(x.toPrecision(4))}`;
}

function fourDecimals(x: number): string {
  return x.toFixed(4);
}

/** x to four significant digits, without trailing zeros: `${Number(x.toPrecision(4))}`. */
export function fourSignificantText(x: number): string {
  return cachedText(fourSignificantTexts, x, fourSignificant);
}

/** x with four decimals: x.toFixed(4). */
export function fourDecimalText(x: number): string {
  return cachedText(fourDecimalTexts, x, fourDecimals);
}
