/** Plain-words labels for the positions a check names. */

/** Labels already made: a check of many candidates names the same few positions (toPrecision is slow). */
const metreLabels = new Map<number, string>();
const METRE_LABELS_KEPT = 1024;

/** "2.5 m", six significant digits at most. */
export function metres(x: number): string {
  const known = metreLabels.get(x);
  if (known !== undefined) return known;
  const label = `${Number(x.toPrecision(6))} m`;
  if (metreLabels.size >= METRE_LABELS_KEPT) metreLabels.clear();
  metreLabels.set(x, label);
  return label;
}

export function rangeLabel(from: number, to: number): string {
  return `${metres(from)} to ${metres(to)}`;
}
