/**
 * Decimals to show one row of a simulation check: two significant figures of the interval's
 * half-width, since digits below the noise mean nothing (never more than six). A zero-width
 * interval (a measure the run cannot vary, such as P(wait) with no queue) falls back to three
 * significant figures of the value.
 */
export function intervalDecimals(halfWidth: number, value: number): number {
  const clamp = (d: number): number => Math.min(6, Math.max(0, d));
  if (halfWidth > 0 && Number.isFinite(halfWidth)) return clamp(1 - Math.floor(Math.log10(halfWidth)));
  const v = Math.abs(value);
  if (v === 0 || !Number.isFinite(v)) return 0;
  return clamp(2 - Math.floor(Math.log10(v)));
}
