/**
 * Writing SVG (or HTML) text safely: escaped text, elements with quoted attributes, and numbers that
 * are always finite and never "-0". Every string that reaches a figure goes through here.
 */

/**
 * `s` with & < > " ' replaced by entities, safe both as element text and inside a quoted attribute.
 * Example: escapeText('<b a="1">') === '&lt;b a=&quot;1&quot;&gt;'.
 */
export function escapeText(s: string): string {
  let out = '';
  let copiedUpTo = 0;
  for (let i = 0; i < s.length; i++) {
    let entity: string;
    switch (s.charCodeAt(i)) {
      case 38:
        entity = '&amp;';
        break;
      case 60:
        entity = '&lt;';
        break;
      case 62:
        entity = '&gt;';
        break;
      case 34:
        entity = '&quot;';
        break;
      case 39:
        entity = '&#39;';
        break;
      default:
        continue;
    }
    out += s.slice(copiedUpTo, i) + entity;
    copiedUpTo = i + 1;
  }
  // Most labels hold nothing to escape: hand back the same string, no copy.
  return copiedUpTo === 0 ? s : out + s.slice(copiedUpTo);
}

/** Attribute values: strings are escaped, numbers written as coordinates (two decimals). */
export type Attributes = Readonly<Record<string, string | number>>;

/**
 * One element: `<name a="v">children</name>`, or `<name a="v"/>` when `children` is undefined.
 * `children` is markup, not text: pass text through escapeText (or use textElement) first.
 * Example: element('circle', { cx: 1, cy: 2, r: 3 }) === '<circle cx="1.00" cy="2.00" r="3.00"/>'.
 */
export function element(name: string, attributes: Attributes, children?: string): string {
  // Concatenation, not an array join: V8 builds short strings by += faster, and figures write many.
  let out = '<' + name;
  for (const key in attributes) {
    const value = attributes[key] as string | number;
    out += ' ' + key + '="' + (typeof value === 'number' ? formatCoordinate(value) : escapeText(value)) + '"';
  }
  return children === undefined ? out + '/>' : out + '>' + children + '</' + name + '>';
}

/** An element holding plain text, escaped. */
export function textElement(name: string, attributes: Attributes, text: string): string {
  return element(name, attributes, escapeText(text));
}

const POWERS_OF_TEN = [1, 10, 100, 1000, 10000, 100000, 1000000];
const ZERO_BY_DECIMALS = ['0', '0.0', '0.00', '0.000', '0.0000', '0.00000', '0.000000'];
/** Beyond this many units of the last decimal, integer arithmetic would lose digits: toFixed takes over. */
const LARGEST_SCALED = 2 ** 52;

/**
 * A coordinate with a fixed number of decimals (0 to 6; default 2, a hundredth of a user unit),
 * rounded half away from zero: "-0.00" becomes "0.00", and NaN or an infinity throws, since a figure
 * must never draw one. Example: formatCoordinate(-0.001) === '0.00'; formatCoordinate(12.3456) === '12.35'.
 */
export function formatCoordinate(value: number, decimals = 2): string {
  if (!Number.isFinite(value)) throw new RangeError(`cannot write ${value} as a coordinate`);
  const power = POWERS_OF_TEN[decimals];
  const zero = ZERO_BY_DECIMALS[decimals];
  if (power === undefined || zero === undefined) throw new RangeError(`decimals must be an integer from 0 to 6, not ${decimals}`);
  // Integer arithmetic and String of a small integer: about five times faster than toFixed, which a
  // figure calls for every point of every curve.
  const scaled = Math.round(Math.abs(value) * power);
  if (scaled === 0) return zero;
  if (scaled >= LARGEST_SCALED) return value.toFixed(decimals);
  const sign = value < 0 ? '-' : '';
  if (decimals === 0) return sign + scaled;
  const whole = Math.floor(scaled / power);
  const fraction = String(scaled - whole * power);
  return sign + whole + '.' + (fraction.length === decimals ? fraction : '000000'.slice(0, decimals - fraction.length) + fraction);
}

/**
 * A value for a label: four significant digits, trailing zeros dropped, plain notation when the
 * rounded magnitude is from 1e-3 to below 1e6 and an exponent outside it ("1.235e-4", "2.5e+7");
 * never "-0", and NaN or an infinity throws. Example: formatValue(4.8) === '4.8';
 * formatValue(-0.00001) === '-1e-5'; formatValue(123456) === '123500'.
 */
export function formatValue(value: number): string {
  if (!Number.isFinite(value)) throw new RangeError(`cannot write ${value} as a value`);
  // Number(toPrecision) rounds to four digits; String writes it without an exponent in the plain range.
  const rounded = Number(value.toPrecision(4));
  if (rounded === 0) return '0';
  const magnitude = Math.abs(rounded);
  if (magnitude >= 1e-3 && magnitude < 1e6) return String(rounded);
  const [mantissa = '', exponent = ''] = rounded.toExponential(3).split('e');
  return `${trimFraction(mantissa)}e${exponent}`;
}

function trimFraction(digits: string): string {
  if (!digits.includes('.')) return digits;
  let end = digits.length;
  while (digits.charCodeAt(end - 1) === 48) end--;
  if (digits.charCodeAt(end - 1) === 46) end--;
  return digits.slice(0, end);
}
