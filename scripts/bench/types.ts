/** One printed line of `npm run bench`: a measured figure beside its target. */
export interface BenchRow {
  area: string;
  what: string;
  measured: number;
  unit: string;
  /** The target as printed, e.g. "< 1 ms" or ">= 5e6". */
  target: string;
  /** Whether the measured figure meets the target. */
  ok: boolean;
}

export type BenchSuite = () => Promise<BenchRow[]>;
