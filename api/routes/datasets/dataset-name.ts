import { DATASET_NAME_MAX } from '../../../shared/schemas/datasets';

/**
 * Control characters (C0, DEL, C1) and the invisible marks that reorder or hide text: a name like
 * "invoice\u202Efdp.csv" reads "invoicevsc.pdf" on screen. They have no place in a file name shown
 * to colleagues and clients, so they are removed.
 */
// eslint-disable-next-line no-control-regex -- removing control characters is the point
const INVISIBLE = /[\u0000-\u001f\u007f-\u009f\u200b-\u200f\u202a-\u202e\u2060\u2066-\u2069\ufeff]/g;

/**
 * The name a dataset is shown under, from the file name the browser sent: its last path segment
 * (busboy already drops directories; this also covers "..", drive letters and mixed separators),
 * without invisible characters, at most DATASET_NAME_MAX characters (whole code points). The
 * name is only ever shown: the object key is random and never derived from it.
 */
export function datasetName(original: string | undefined): string {
  const last = (original ?? '').split(/[\\/]/).pop() ?? '';
  const clean = last.replace(INVISIBLE, '').trim();
  const name = clean === '' || /^\.+$/.test(clean) ? 'dataset.csv' : clean;
  return Array.from(name).slice(0, DATASET_NAME_MAX).join('');
}
