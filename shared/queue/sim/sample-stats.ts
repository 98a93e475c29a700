/**
 * Per-sample tallies (one row per replication or batch) in a flat Float64Array: customer counts
 * and sums by arrival in the sample, time integrals over the sample's stretch of time.
 */
export const F = {
  arrivals: 0,
  blocked: 1,
  admitted: 2,
  abandoned: 3,
  waited: 4,
  withinT: 5,
  sumWq: 6,
  sumW: 7,
  areaQ: 8,
  areaL: 9,
  areaBusy: 10,
  duration: 11,
  served: 12,
} as const;
export const FIELD_COUNT = 13;

export function createSampleStats(samples: number): Float64Array {
  return new Float64Array(samples * FIELD_COUNT);
}
