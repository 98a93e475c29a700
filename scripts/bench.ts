/**
 * `npm run bench`: runs every benchmark suite and prints one table of figures against their
 * targets. Figures are measured here, never asserted in timed unit tests. Exits 0 even when a
 * target is missed (the table says so): a benchmark informs, CI does not gate on wall-clock time.
 */
import type { BenchRow, BenchSuite } from './bench/types';

const suites: Record<string, () => Promise<{ default: BenchSuite }>> = {
  engine: () => import('./bench/engine'),
  simulation: () => import('./bench/simulation-fit'),
  pdf: () => import('./bench/pdf'),
  studies: () => import('./bench/studies'),
  datasets: () => import('./bench/datasets'),
};

const only = process.argv.slice(2);
const rows: BenchRow[] = [];
for (const [name, load] of Object.entries(suites)) {
  if (only.length > 0 && !only.includes(name)) continue;
  try {
    const suite = (await load()).default;
    rows.push(...(await suite()));
  } catch (err) {
    rows.push({ area: name, what: `suite failed: ${(err as Error).message}`, measured: NaN, unit: '', target: '', ok: false });
  }
}

const fmt = (n: number): string => (Number.isFinite(n) ? (Math.abs(n) >= 1000 ? n.toExponential(3) : n.toPrecision(4)) : 'n/a');
const table = rows.map((r) => [r.area, r.what, `${fmt(r.measured)} ${r.unit}`.trim(), r.target, r.ok ? 'ok' : 'MISSED']);
const head = ['area', 'measure', 'measured', 'target', ''];
const widths = head.map((h, i) => Math.max(h.length, ...table.map((row) => row[i].length)));
const line = (cells: string[]): string => cells.map((c, i) => c.padEnd(widths[i])).join('  ');
console.log(line(head));
console.log(widths.map((w) => '-'.repeat(w)).join('  '));
for (const row of table) console.log(line(row));
console.log(`\nnode ${process.version}, ${(await import('node:os')).cpus().length} cores, ${(await import('node:os')).cpus()[0]?.model ?? ''}`);
