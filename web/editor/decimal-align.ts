/** U+2007 FIGURE SPACE: as wide as a digit in tabular figures, so padding keeps columns straight. */
export const FIGURE_SPACE = '\u2007';

/**
 * Pads formatted numbers on the right so their decimal points line up when the column is
 * right-aligned with tabular figures: "12.5", "3", "0.125" → "12.5␣␣", "3␣␣␣␣", "0.125".
 * A number without a point gets a figure space for it too. Non-numbers ("—") pass through.
 */
export function alignDecimals(texts: readonly string[]): string[] {
  const fractionWidth = (t: string): number | null => {
    const m = /^[^\d]*[\d,\u202f ]*\d(\.(\d*))?/.exec(t);
    if (!m) return null;
    return m[1] === undefined ? -1 : m[2].length;
  };
  const widths = texts.map(fractionWidth);
  const max = Math.max(-1, ...widths.filter((w): w is number => w !== null));
  return texts.map((t, i) => {
    const w = widths[i];
    if (w === null || max < 0) return t;
    // A missing point is padded by one figure space for the point itself.
    const pad = w === -1 ? max + 1 : max - w;
    // The number may carry a trailing unit-less suffix (e.g. " %"): pad after the digits only.
    const m = /^([^\d]*[\d,\u202f ]*\d(?:\.\d*)?)(.*)$/.exec(t);
    if (!m) return t;
    return m[1] + FIGURE_SPACE.repeat(pad) + m[2];
  });
}
