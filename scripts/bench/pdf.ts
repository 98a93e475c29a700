/**
 * PDF rendering: a 40-page study with 20 charts, rendered in a child process so that process's
 * peak RSS is the renderer's alone (the bench process holds other suites' memory). Prints the
 * pages produced. Targets: < 3 s for the PDF, peak RSS < 400 MB.
 *
 * The same file is the child: `node --import tsx scripts/bench/pdf.ts --child` renders once cold
 * (fonts parsed, vega loaded) and once warm (as in a long-running server) and prints JSON.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import type { BenchRow, BenchSuite } from './types';

const TIME_TARGET_MS = 3000;
const RSS_TARGET_MB = 400;
const SECTIONS = 20;
const CHARTS = 20;

interface ChildReport {
  coldMs: number;
  warmMs: number;
  /** CPU time of the warm render: wall time is inflated when other processes share the cores. */
  warmCpuMs: number;
  pages: number;
  bytes: number;
  maxRssMb: number;
}

async function child(): Promise<void> {
  const { renderStudyPdf } = await import('../../api/pdf/render-study-pdf');
  const { largeStudySnapshot, SIGN_OFF } = await import('../../api/pdf/fixtures/large-study');
  const snapshot = largeStudySnapshot(SECTIONS, CHARTS);
  let t = performance.now();
  const pdf = await renderStudyPdf(snapshot, SIGN_OFF);
  const coldMs = performance.now() - t;
  t = performance.now();
  const cpu = process.cpuUsage();
  await renderStudyPdf(snapshot, SIGN_OFF);
  const warmMs = performance.now() - t;
  const used = process.cpuUsage(cpu);
  const warmCpuMs = (used.user + used.system) / 1000;
  const pages = (pdf.toString('latin1').match(/\/Type\s*\/Page(?![s\w])/g) ?? []).length;
  const report: ChildReport = { coldMs, warmMs, warmCpuMs, pages, bytes: pdf.length, maxRssMb: process.resourceUsage().maxRSS / 1024 };
  console.log(JSON.stringify(report));
}

const suite: BenchSuite = async () => {
  const self = fileURLToPath(import.meta.url);
  const out = spawnSync(process.execPath, ['--import', 'tsx', self, '--child'], { encoding: 'utf8', cwd: fileURLToPath(new URL('../..', import.meta.url)) });
  const line = out.stdout.trim().split('\n').pop() ?? '';
  if (out.status !== 0 || !line.startsWith('{')) throw new Error(`PDF child failed: ${out.stderr.slice(-500)}`);
  const r = JSON.parse(line) as ChildReport;
  console.log(`pdf: ${r.pages} pages, ${(r.bytes / 1024).toFixed(0)} kB, ${CHARTS} charts`);
  const what = `${r.pages}-page study, ${CHARTS} charts`;
  const rows: BenchRow[] = [
    { area: 'pdf', what: `${what}, warm process`, measured: r.warmMs, unit: 'ms', target: `< ${TIME_TARGET_MS}`, ok: r.warmMs < TIME_TARGET_MS },
    { area: 'pdf', what: `${what}, warm, CPU time (informative)`, measured: r.warmCpuMs, unit: 'ms', target: 'n/a', ok: true },
    { area: 'pdf', what: `${what}, first render in a fresh process (informative)`, measured: r.coldMs, unit: 'ms', target: 'n/a', ok: true },
    { area: 'pdf', what: 'peak RSS of the rendering process', measured: r.maxRssMb, unit: 'MB', target: `< ${RSS_TARGET_MB}`, ok: r.maxRssMb < RSS_TARGET_MB },
    { area: 'pdf', what: 'pages produced (target about 40)', measured: r.pages, unit: 'pages', target: '>= 40', ok: r.pages >= 40 },
  ];
  return rows;
};

export default suite;

if (process.argv.includes('--child') && process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) await child();
