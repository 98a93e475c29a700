/**
 * Poisson probabilities computed to full relative precision without factorials or powers:
 * Loader's saddle-point form, pmf(k; x) = exp(−stirlerr(k) − bd0(k, x)) / √(2πk).
 * Reference: C. Loader (2000), "Fast and accurate computation of binomial probabilities".
 */

const LN_2PI = 1.8378770664093453;

/** stirlerr(k) = ln k! − (k + ½) ln k + k − ½ ln 2π, rounded to double from 50-digit values, for k = 1…15. */
const STIRLERR_TABLE = [
  0, 0.08106146679532726, 0.0413406959554093, 0.02767792568499834,
  0.020790672103765093, 0.016644691189821193, 0.013876128823070748,
  0.01189670994589177, 0.010411265261972096, 0.009255462182712733,
  0.00833056343336287, 0.007573675487951841, 0.00694284010720953,
  0.006408994188004207, 0.0059513701127588475, 0.005554733551962801,
];

/** Error of Stirling's approximation to ln k! for an integer k ≥ 1 (series beyond 15). */
export function stirlerr(k: number): number {
  if (k <= 15) return STIRLERR_TABLE[k];
  const S0 = 1 / 12;
  const S1 = 1 / 360;
  const S2 = 1 / 1260;
  const S3 = 1 / 1680;
  const S4 = 1 / 1188;
  const kk = k * k;
  if (k > 500) return (S0 - S1 / kk) / k;
  if (k > 80) return (S0 - (S1 - S2 / kk) / kk) / k;
  if (k > 35) return (S0 - (S1 - (S2 - S3 / kk) / kk) / kk) / k;
  return (S0 - (S1 - (S2 - (S3 - S4 / kk) / kk) / kk) / kk) / k;
}

/** Deviance term bd0(k, x) = k ln(k/x) + x − k, computed without cancellation when k ≈ x. */
export function bd0(k: number, x: number): number {
  if (Math.abs(k - x) < 0.1 * (k + x)) {
    let v = (k - x) / (k + x);
    let s = (k - x) * v;
    let ej = 2 * k * v;
    v *= v;
    for (let j = 1; j < 1000; j++) {
      ej *= v;
      const s1 = s + ej / (2 * j + 1);
      if (s1 === s) return s1;
      s = s1;
    }
    return s;
  }
  return k * Math.log(k / x) + x - k;
}

/** ln P(X = k) for X ~ Poisson(x), k a non-negative integer, x ≥ 0. −Infinity when the mass is 0. */
export function logPoissonPmf(k: number, x: number): number {
  if (x === 0) return k === 0 ? 0 : -Infinity;
  if (k === 0) return -x;
  return -stirlerr(k) - bd0(k, x) - 0.5 * (LN_2PI + Math.log(k));
}

/** P(X = k) for X ~ Poisson(x); underflows to 0 below about 1e-308. */
export function poissonPmf(k: number, x: number): number {
  return Math.exp(logPoissonPmf(k, x));
}

/**
 * Poisson probabilities pmf(0…kMax; x) as an array, by recursion outward from an anchor computed
 * with Loader's formula (so no e^{−x} underflow when x is large). Relative error about kMax·ε.
 */
export function poissonPmfArray(kMax: number, x: number): Float64Array {
  const out = new Float64Array(kMax + 1);
  if (x === 0) {
    out[0] = 1;
    return out;
  }
  const anchor = Math.min(Math.floor(x), kMax);
  out[anchor] = poissonPmf(anchor, x);
  for (let k = anchor + 1; k <= kMax; k++) out[k] = (out[k - 1] * x) / k;
  for (let k = anchor - 1; k >= 0; k--) out[k] = (out[k + 1] * (k + 1)) / x;
  return out;
}
