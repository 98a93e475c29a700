import type { Dataset, DatasetMapping } from '#shared/schemas/datasets';

const find = (header: string[], ...words: RegExp[]): string | null => {
  for (const w of words) {
    const hit = header.find((h) => w.test(h));
    if (hit) return hit;
  }
  return null;
};

/** The timestamp format the first data cell of a column looks like. */
export function guessFormat(sample: string | undefined): DatasetMapping['timestampFormat'] {
  const s = (sample ?? '').trim();
  if (/^\d{12,}$/.test(s)) return 'epoch_milliseconds';
  if (/^\d{9,11}(\.\d+)?$/.test(s)) return 'epoch_seconds';
  return 'iso8601';
}

/** A first mapping from the header words, so the usual file needs no changes; the user checks it. */
export function guessMapping(d: Dataset): DatasetMapping {
  if (d.mapping) return d.mapping as unknown as DatasetMapping;
  const h = d.header;
  const count = find(h, /^(count|arrivals|calls|volume|offered)$/i, /count|volume|arrivals/i);
  const kind = count ? 'interval_counts' : 'event_log';
  const time = (kind === 'interval_counts' ? find(h, /interval|start|period|time/i) : find(h, /arriv/i, /time|date|created/i)) ?? h[0];
  const col = h.indexOf(time);
  const tz = Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
  return {
    kind,
    delimiter: d.detectedDelimiter,
    timestampFormat: guessFormat(d.preview[0]?.[col]),
    timeZone: tz,
    intervalMinutes: 30,
    timeColumn: time,
    serviceStartColumn: kind === 'event_log' ? find(h, /(service|serv).*(start|begin)/i, /^start/i) : null,
    serviceEndColumn: kind === 'event_log' ? find(h, /(service|serv).*(end|finish)/i, /^(end|finish)/i) : null,
    channelColumn: find(h, /channel|queue|desk|type/i),
    countColumn: count,
    handlingTimeColumn: kind === 'interval_counts' ? find(h, /handl|aht|duration/i) : null,
    handlingTimeUnit: 'seconds',
  };
}
