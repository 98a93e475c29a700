import type { DistributionSpec } from './distribution-schema';
import type { Rng } from './rng';

/** Draws one positive time; the mean is fixed when the sampler is made. */
export type Sampler = () => number;

/** Standard normal draws by the polar Box–Muller method, keeping the spare value. */
function normalSource(rng: Rng): () => number {
  let spare = 0;
  let hasSpare = false;
  return () => {
    if (hasSpare) {
      hasSpare = false;
      return spare;
    }
    let u: number, v: number, s: number;
    do {
      u = 2 * rng.next() - 1;
      v = 2 * rng.next() - 1;
      s = u * u + v * v;
    } while (s >= 1 || s === 0);
    const f = Math.sqrt((-2 * Math.log(s)) / s);
    spare = v * f;
    hasSpare = true;
    return u * f;
  };
}

/** Gamma(shape, 1) by Marsaglia & Tsang (2000); shape < 1 via the boost X·U^(1/shape). */
function gammaSource(rng: Rng, shape: number): () => number {
  const normal = normalSource(rng);
  const boost = shape < 1;
  const a = boost ? shape + 1 : shape;
  const d = a - 1 / 3;
  const c = 1 / Math.sqrt(9 * d);
  const invShape = 1 / shape;
  return () => {
    let x: number, v: number, u: number;
    for (;;) {
      do {
        x = normal();
        v = 1 + c * x;
      } while (v <= 0);
      v = v * v * v;
      u = rng.next();
      if (u < 1 - 0.0331 * x * x * x * x) break;
      if (Math.log(u) < 0.5 * x * x + d * (1 - v + Math.log(v))) break;
    }
    const g = d * v;
    return boost ? g * Math.pow(rng.next(), invShape) : g;
  };
}

/**
 * Makes a sampler of times with the given mean (> 0, in the caller's time unit) and shape.
 * Lognormal by mean m and SCV s: σ² = ln(1 + s), μ = ln m − σ²/2. Gamma: shape 1/s, scale m·s.
 */
export function createSampler(spec: DistributionSpec, mean: number, rng: Rng): Sampler {
  switch (spec.kind) {
    case 'exponential':
      return () => -Math.log(rng.next()) * mean;
    case 'deterministic':
      return () => mean;
    case 'lognormal': {
      const sigma2 = Math.log1p(spec.scv);
      const sigma = Math.sqrt(sigma2);
      const mu = Math.log(mean) - sigma2 / 2;
      const normal = normalSource(rng);
      return () => Math.exp(mu + sigma * normal());
    }
    case 'gamma': {
      const scale = mean * spec.scv;
      const gamma = gammaSource(rng, 1 / spec.scv);
      return () => gamma() * scale;
    }
    case 'empirical': {
      const values = Float64Array.from(spec.values);
      let sum = 0;
      for (const v of values) sum += v;
      const factor = mean / (sum / values.length);
      for (let i = 0; i < values.length; i++) values[i] *= factor;
      const n = values.length;
      return () => values[Math.min(n - 1, Math.floor(rng.next() * n))];
    }
  }
}
