/**
 * The option tables solvers report: the counts either side of a staffing answer, the cost of
 * each count, and the count per interval of a day profile (which can run to many rows and breaks
 * across pages with its header repeated).
 */
import type { Content } from 'pdfmake/interfaces';
import type { TimeUnit } from '../../shared/units/units';
import { sans } from './inline-text';
import { formatFixed, formatRow, type MeasureKind } from './measure-format';
import { numberTable } from './number-table';
import { COLOURS } from './pdf-theme';

type Row = Record<string, unknown>;
const arr = (v: unknown): Row[] => (Array.isArray(v) ? (v as Row[]) : []);
const n = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

function achievedKind(criterion: unknown): MeasureKind {
  if (criterion === 'meanWait') return 'duration';
  if (criterion === 'utilization') return 'percent-ratio';
  return 'probability';
}

const CRITERION_LABEL: Record<string, string> = {
  serviceLevel: 'Service level',
  meanWait: 'Mean wait',
  blocking: 'Blocking',
  utilization: 'Utilisation',
  abandonment: 'Abandonment',
};

const caption = (text: string): Content => sans(text, { fontSize: 8, bold: true, color: COLOURS.muted, margin: [0, 4, 0, 0] });

/** A caption and its table; short ones stay on one page so a caption never ends a page alone. */
const captioned = (text: string, table: Content, rows: number): Content => ({ stack: [caption(text), table], unbreakable: rows <= 20 }) as Content;

/** Column of values formatted together, so one column shares unit and precision. */
function column(kind: MeasureKind, values: (number | null)[], timeUnit: TimeUnit) {
  return formatRow(kind, values, timeUnit);
}

export function blockOptionTables(result: Row | null, timeUnit: TimeUnit): Content[] {
  if (!result) return [];
  const out: Content[] = [];
  const label = CRITERION_LABEL[String(result.criterion)] ?? 'Achieved';
  const kind = achievedKind(result.criterion);
  if (result.model === 'staffing') {
    const opts = arr(result.options);
    const achieved = column(kind, opts.map((o) => n(o.achieved)), timeUnit);
    const rho = column('percent-ratio', opts.map((o) => n(o.rho)), timeUnit);
    out.push(
      captioned(
        'Neighbouring server counts',
        numberTable(
        [{ header: 'Servers', kind: 'number' }, { header: `${label}${achieved.unit ? ` (${achieved.unit})` : ''}`, kind: 'number' }, { header: 'Utilisation ρ (%)', kind: 'number' }, { header: 'Meets target', kind: 'text' }],
        opts.map((o, i) => [formatFixed(Number(o.servers), 0), achieved.cells[i], rho.cells[i], o.meetsTarget ? 'yes' : 'no']),
        ),
        opts.length,
      ),
    );
  }
  if (result.model === 'cost-optimum') {
    const opts = arr(result.options);
    const money = (key: string) => column('cost', opts.map((o) => n(o[key])), timeUnit);
    const [server, waiting, total] = [money('serverCost'), money('waitingCost'), money('totalCost')];
    out.push(
      captioned(
        `Cost of each server count (per ${timeUnit})`,
        numberTable(
        [{ header: 'Servers', kind: 'number' }, { header: 'Servers cost', kind: 'number' }, { header: 'Waiting cost', kind: 'number' }, { header: 'Total', kind: 'number' }],
        opts.map((o, i) => [formatFixed(Number(o.servers), 0), server.cells[i], waiting.cells[i], total.cells[i]]),
        ),
        opts.length,
      ),
    );
  }
  if (result.model === 'interval-staffing') {
    const rows = arr(result.intervals);
    const rate = column('rate', rows.map((r) => n(r.arrivalRate)), timeUnit);
    const achieved = column(kind, rows.map((r) => n(r.achieved)), timeUnit);
    const rho = column('percent-ratio', rows.map((r) => n(r.rho)), timeUnit);
    out.push(
      captioned(
        'Servers per interval',
        numberTable(
        [
          { header: 'Interval', kind: 'number' },
          { header: `Arrival rate (${rate.unit})`, kind: 'number' },
          { header: 'Servers', kind: 'number' },
          { header: `${label}${achieved.unit ? ` (${achieved.unit})` : ''}`, kind: 'number' },
          { header: 'Utilisation ρ (%)', kind: 'number' },
        ],
        rows.map((r, i) => [formatFixed(Number(r.index) + 1, 0), rate.cells[i], formatFixed(Number(r.servers), 0), achieved.cells[i], rho.cells[i]]),
        ),
        rows.length,
      ),
    );
  }
  return out;
}
