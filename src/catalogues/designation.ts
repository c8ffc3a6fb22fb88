/**
 * Normalised form of a section designation, so that the spellings people type find the same entry:
 * "IPE200" = "ipe 200" = "IPE  200", "W8X31" = "W 8 x 31" = "w8*31", "NPS 2 SCH 40" = "nps2 sch40",
 * "SHS 100x100x5.0" = "SHS 100×100×5", "NPS 1 1/2" = "NPS 1-1/2", "HE 200 A" = "HEA 200".
 */

/** Multiplication signs people use between sizes; all become the letter X. */
const SIZE_SEPARATORS = /[×✕✖*]/g;
/** A decimal comma between digits ("60,3") is a decimal point. */
const DECIMAL_COMMA = /(\d),(?=\d)/g;
/** A whole number and a fraction ("1 1/2", "1 - 1/2") are one mixed number, written "1-1/2". */
const MIXED_NUMBER = /(\d)(?:\s*-\s*|\s+)(?=\d+\/\d+)/g;
/** A hyphen that does not join a mixed number ("IPE-200") carries no meaning. */
const LOOSE_HYPHEN = /-(?!\d+\/\d+)/g;
const WHITESPACE = /\s+/g;
const DECIMAL_NUMBER = /\d+(?:\.\d+)?/g;
/** The EN 10365 spelling with the series letter last ("HE 200 A", "HE 300 AA", "HE 400 M"). */
const SERIES_LETTER_LAST = /^HE(\d+)(AA|A|B|M)$/;

/**
 * The key a designation is looked up by: upper case, no spaces, "X" between sizes, numbers without
 * trailing zeros ("5.0" -> "5", "273.0" -> "273") and HE sections with the series letter first.
 * Example: normaliseDesignation("hea 200") === normaliseDesignation("HE 200 A") === "HEA200".
 */
export function normaliseDesignation(designation: string): string {
  const compact = designation
    .normalize('NFKC')
    .toUpperCase()
    .replace(SIZE_SEPARATORS, 'X')
    .replace(DECIMAL_COMMA, '$1.')
    .replace(MIXED_NUMBER, '$1-')
    .replace(WHITESPACE, '')
    .replace(LOOSE_HYPHEN, '')
    .replace(DECIMAL_NUMBER, (number) => String(Number(number)));
  return compact.replace(SERIES_LETTER_LAST, 'HE$2$1');
}

/** The leading letters of a normalised designation, which name its family: "IPE", "W", "NPS", "SHS". */
export function designationPrefix(normalised: string): string {
  return /^[A-Z]*/.exec(normalised)?.[0] ?? '';
}

/** The numbers a normalised designation holds, in order: "SHS100X100X5" -> [100, 100, 5]. */
export function designationNumbers(normalised: string): number[] {
  return (normalised.match(DECIMAL_NUMBER) ?? []).map(Number);
}
