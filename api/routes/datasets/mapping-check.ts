import { createLocalClock } from '../../../shared/queue/fit/local-clock';
import type { DatasetMapping } from '../../../shared/schemas/datasets';
import { HttpError } from '../../http-error';
import { DatasetInputError } from './dataset-problem';
import type { DatasetRow } from './dataset-access';
import { createRowReader } from './row-reader';
import { sniffHead } from './sniff-head';

const FIELD_OF: [keyof DatasetMapping, string][] = [
  ['timeColumn', 'timeColumn'],
  ['serviceStartColumn', 'serviceStartColumn'],
  ['serviceEndColumn', 'serviceEndColumn'],
  ['channelColumn', 'channelColumn'],
  ['countColumn', 'countColumn'],
  ['handlingTimeColumn', 'handlingTimeColumn'],
];

/** The mapping field a located problem belongs to, so the form can show it beside that select. */
function fieldFor(mapping: DatasetMapping, column: string | null): string {
  const hit = FIELD_OF.find(([key]) => mapping[key] === column);
  return hit ? hit[1] : 'mapping';
}

/**
 * Checks a mapping before it is saved, against the header and the preview rows (re-read with the
 * chosen delimiter): unknown zone, missing or duplicated columns, unreadable first rows. The full
 * file is checked by the fit, which reports the first bad row the same way.
 */
export function checkMapping(dataset: DatasetRow, mapping: DatasetMapping, head: { head: Buffer; complete: boolean } | null): { header: string[]; preview: string[][] } {
  let toLocal: (ms: number) => number;
  try {
    toLocal = createLocalClock(mapping.timeZone);
  } catch {
    throw new HttpError(400, 'validation_failed', `Unknown time zone "${mapping.timeZone}".`, [{ path: 'timeZone', message: 'Use an IANA name such as Europe/Paris' }]);
  }
  let header = dataset.header;
  let rows = dataset.preview;
  try {
    if (mapping.delimiter !== dataset.detectedDelimiter && head) ({ header, preview: rows } = sniffHead(head.head, head.complete, mapping.delimiter));
    const read = createRowReader(header, mapping, toLocal);
    rows.forEach((cells, i) => read(cells, i + 2));
    return { header, preview: rows };
  } catch (err) {
    if (err instanceof DatasetInputError) {
      throw new HttpError(400, 'validation_failed', err.message, [{ path: fieldFor(mapping, err.column), message: err.message }]);
    }
    throw err;
  }
}
