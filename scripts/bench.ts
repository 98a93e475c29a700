/**
 * `npm run bench`: runs every benchmark suite and prints one table of figures against their
 * targets. Figures are measured here, never asserted in timed unit tests. Exits 0 even when a
 * target is missed (the table says so): a benchmark informs, CI does not gate on wall-clock time.
 * Suites that need the running app get one from bench-stack.ts (a throwaway stack unless given).
 */
import { cpus } from 'node:os';
import { provideRunningApp, type BenchTarget } from './bench/bench-stack';
import type { BenchRow, BenchSuite } from './bench/types';

const suites: Record<string, () => Promise<{ default: BenchSuite }>> = {
  engine: () => import('./bench/engine'),
  simulation: () => import('./bench/simulation-fit'),
  pdf: () => import('./bench/pdf'),
  studies: () => import('./bench/studies'),
  datasets: () => import('./bench/datasets'),
  api: () => import('./bench/api-load'),
};
/** Suites that measure through the running app and its database. */
const NEED_APP = new Set(['studies', 'api']);

const only = process.argv.slice(2);
const chosen = Object.keys(suites).filter((name) => only.length === 0 || only.includes(name));
const rows: BenchRow[] = [];
let target: BenchTarget | null = null;
try {
  if (chosen.some((name) => NEED_APP.has(name))) target = await provideRunningApp((s) => console.error(`[bench] ${s}`));
} catch (err) {
  rows.push({ area: 'stack', what: `could not start the app: ${(err as Error).message}`, measured: NaN, unit: '', target: '', ok: false });
}
try {
  for (const name of chosen) {
    try {
      const suite = (await suites[name]()).default;
      rows.push(...(await suite()));
    } catch (err) {
      rows.push({ area: name, what: `suite failed: ${(err as Error).message}`, measured: NaN, unit: '', target: '', ok: false });
    }
  }
} finally {
  await target?.stop();
}

const fmt = (n: number): string =>
  !Number.isFinite(n) ? 'n/a' : Math.abs(n) >= 1e6 ? n.toExponential(3) : Math.abs(n) >= 1000 || Number.isInteger(n) ? String(Math.round(n)) : n.toPrecision(4);
const table = rows.map((r) => [r.area, r.what, `${fmt(r.measured)} ${r.unit}`.trim(), r.target, r.ok ? 'ok' : 'MISSED']);
const head = ['area', 'measure', 'measured', 'target', ''];
const widths = head.map((h, i) => Math.max(h.length, ...table.map((row) => row[i].length)));
const line = (cells: string[]): string => cells.map((c, i) => c.padEnd(widths[i])).join('  ');
console.log(line(head));
console.log(widths.map((w) => '-'.repeat(w)).join('  '));
for (const row of table) console.log(line(row));
console.log(`\nnode ${process.version}, ${cpus().length} cores, ${cpus()[0]?.model ?? ''}${target ? `; app: ${target.describe}` : ''}`);
process.exit(0);
