/** Plain-words labels for the positions a check names. */

/** "2.5 m", six significant digits at most. */
export function metres(x: number): string {
  return `${Number(x.toPrecision(6))} m`;
}

export function rangeLabel(from: number, to: number): string {
  return `${metres(from)} to ${metres(to)}`;
}
