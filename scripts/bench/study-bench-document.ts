/**
 * A realistic 200-block study for the studies bench: a regional service network of our own
 * invention (help desks, repair counters, call lines), each block a different mix of models,
 * linked assumptions, scenarios and charts, as a consultant's long report would hold.
 */
import type { RegisterEntry } from '../../api/routes/studies/resolve-spec';

export const BENCH_REGISTER: RegisterEntry[] = [
  { id: 1, name: 'Peak calls', value: 180, unit: 'per_hour', version: 1 },
  { id: 2, name: 'Handling time', value: 4.5, unit: 'minutes', version: 1 },
  { id: 3, name: 'Patience', value: 3, unit: 'minutes', version: 1 },
  { id: 4, name: 'Counter visits', value: 2.2, unit: 'per_minute', version: 1 },
];

function spec(i: number): Record<string, unknown> {
  switch (i % 5) {
    case 0:
      return { model: 'M/M/c', arrivalRate: { assumption: 1 }, serviceRate: { assumption: 2 }, servers: 16 + (i % 7), t: 1 / 3, percentile: 0.9 };
    case 1:
      return { model: 'M/M/c+M', arrivalRate: { assumption: 1 }, serviceRate: { assumption: 2 }, patienceRate: { assumption: 3 }, servers: 14 + (i % 5), t: 1 / 3 };
    case 2:
      return { model: 'M/M/c/K', arrivalRate: { assumption: 4 }, serviceRate: 0.25, servers: 10 + (i % 4), capacity: 40, t: 2 };
    case 3:
      return { model: 'staffing', arrivalRate: { assumption: 1 }, serviceRate: { assumption: 2 }, criterion: 'serviceLevel', target: 0.8, t: 1 / 3 };
    default:
      return { model: 'G/G/c', arrivalRate: 100 + i, serviceRate: 12, servers: 10, arrivalScv: 1.3, serviceScv: 0.7 };
  }
}

export function benchDocument(blocks = 200): Record<string, unknown> {
  const content: unknown[] = [];
  for (let i = 0; i < blocks; i++) {
    if (i % 10 === 0) content.push({ type: 'heading', attrs: { level: 2, sectionId: `section-${i}` }, content: [{ type: 'text', text: `Site ${i / 10 + 1}` }] });
    content.push({ type: 'paragraph', content: [{ type: 'text', text: 'At the busiest hour the line is staffed as follows, with the service level it gives.' }] });
    const s = spec(i);
    const timeUnit = s.model === 'M/M/c/K' ? 'minute' : 'hour';
    content.push({
      type: 'modelBlock',
      attrs: {
        blockId: `block-${String(i).padStart(4, '0')}`,
        config: {
          title: `Line ${i + 1}`,
          timeUnit,
          spec: s,
          scenarios: i % 3 === 0 && s.model !== 'staffing' ? [{ label: 'Growth 10%', overrides: { arrivalRate: 200 } }, { label: 'One more', overrides: { servers: 25 } }] : [],
          chart: i % 4 === 0 && s.model === 'M/M/c' ? { parameter: 'servers', from: 12, to: 31, steps: 20, measures: ['serviceLevel', 'Wq'] } : null,
        },
      },
    });
  }
  return { type: 'doc', content };
}
