import { DATASET_NAME_MAX } from '../../../shared/schemas/datasets';
import { withoutInvisible } from '../../../shared/schemas/shown-name';

/**
 * The name a dataset is shown under, from the file name the browser sent: its last path segment
 * (busboy already drops directories; this also covers "..", drive letters and mixed separators),
 * without invisible characters (shown-name.ts), at most DATASET_NAME_MAX characters (whole code
 * points). The name is only ever shown: the object key is random and never derived from it.
 */
export function datasetName(original: string | undefined): string {
  const last = (original ?? '').split(/[\\/]/).pop() ?? '';
  const clean = withoutInvisible(last).trim();
  const name = clean === '' || /^\.+$/.test(clean) ? 'dataset.csv' : clean;
  return Array.from(name).slice(0, DATASET_NAME_MAX).join('');
}
