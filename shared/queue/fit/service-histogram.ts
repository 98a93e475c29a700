/** One histogram bin of service times with the fitted exponential density for overlay. */
export interface HistogramBin {
  fromSeconds: number;
  toSeconds: number;
  count: number;
  /** count / (n · width): comparable with a density. */
  density: number;
  /** Mean density of the fitted exponential over the bin: (e^{−from/m} − e^{−to/m}) / width. */
  exponentialDensity: number;
}

export interface ServiceHistogram {
  bins: HistogramBin[];
  /** Values beyond the last bin (the histogram stops at the 99th percentile to stay readable). */
  overflow: number;
  /** Values the histogram was built from (all, or the retained sample past the buffer limit). */
  basis: number;
}

/**
 * Equal-width bins from 0 to the 99th percentile of the sorted values; the number of bins follows
 * the Rice rule 2·n^(1/3), between 5 and 50.
 */
export function buildHistogram(sorted: Float64Array, mean: number, p99: number): ServiceHistogram {
  const n = sorted.length;
  const top = p99 > 0 ? p99 : sorted[n - 1] > 0 ? sorted[n - 1] : 1;
  const binCount = Math.min(50, Math.max(5, Math.ceil(2 * Math.cbrt(n))));
  const width = top / binCount;
  const counts = new Float64Array(binCount);
  let overflow = 0;
  for (let i = 0; i < n; i++) {
    const b = Math.floor(sorted[i] / width);
    if (b < binCount) counts[b]++;
    else if (sorted[i] <= top) counts[binCount - 1]++; // the top edge belongs to the last bin
    else overflow++;
  }
  const bins: HistogramBin[] = [];
  for (let b = 0; b < binCount; b++) {
    const from = b * width;
    const to = (b + 1) * width;
    bins.push({
      fromSeconds: from,
      toSeconds: to,
      count: counts[b],
      density: counts[b] / (n * width),
      exponentialDensity: (Math.exp(-from / mean) - Math.exp(-to / mean)) / width,
    });
  }
  return { bins, overflow, basis: n };
}
