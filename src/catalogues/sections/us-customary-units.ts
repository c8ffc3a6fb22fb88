/**
 * US customary units of the ASTM, ASME and AISC tables, to SI. Exact by definition: 1 in = 0.0254 m,
 * 1 lb = 0.45359237 kg, 1 ft = 0.3048 m, 1 lbf = 1 lb x 9.80665 m/s^2 (NIST SP 811, Appendix B).
 */

const METRE_PER_INCH = 0.0254;
const KILOGRAM_PER_POUND = 0.45359237;
const METRE_PER_FOOT = 0.3048;

/** Inches to metres. */
export const inch = (value: number): number => value * METRE_PER_INCH;
/** Square inches to m^2. */
export const in2 = (value: number): number => value * METRE_PER_INCH ** 2;
/** Cubic inches (section moduli) to m^3. */
export const in3 = (value: number): number => value * METRE_PER_INCH ** 3;
/** Inches to the fourth (second moments, torsion constants) to m^4. */
export const in4 = (value: number): number => value * METRE_PER_INCH ** 4;
/** Inches to the sixth (warping constants) to m^6. */
export const in6 = (value: number): number => value * METRE_PER_INCH ** 6;
/** Pounds per foot of length to kg/m. */
export const lbPerFt = (value: number): number => (value * KILOGRAM_PER_POUND) / METRE_PER_FOOT;
/** Pounds per cubic foot to kg/m^3. */
export const lbPerFt3 = (value: number): number => (value * KILOGRAM_PER_POUND) / METRE_PER_FOOT ** 3;
/** Pounds per cubic inch to kg/m^3. */
export const lbPerIn3 = (value: number): number => (value * KILOGRAM_PER_POUND) / METRE_PER_INCH ** 3;

/** Newtons in one pound-force. */
const NEWTON_PER_POUND_FORCE = KILOGRAM_PER_POUND * 9.80665;
/** Kips per square inch (ksi) to Pa. */
export const ksi = (value: number): number => (value * 1000 * NEWTON_PER_POUND_FORCE) / METRE_PER_INCH ** 2;
/** Millions of pounds per square inch (Mpsi) to Pa. */
export const mpsi = (value: number): number => ksi(value * 1000);
