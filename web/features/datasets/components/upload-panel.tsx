import { useRef, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { DATASET_MAX_BYTES } from '#shared/schemas/datasets';
import { paths } from '../../../app/paths';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-error';
import { useUploadDataset } from '../api/dataset-mutations';
import { formatBytes } from '../lib/format-bytes';
import { ProgressBar } from './progress-bar';

/** Choose a CSV/TSV, send it with a progress bar, then go to its column mapping. */
export function UploadPanel({ engagementId }: { engagementId: number }) {
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [share, setShare] = useState(0);
  const [error, setError] = useState<string | null>(null);
  const upload = useUploadDataset(engagementId);
  const navigate = useNavigate();

  const send = () => {
    if (!file) return setError('Choose a file first.');
    if (file.size > DATASET_MAX_BYTES) return setError(`${file.name} is ${formatBytes(file.size)}; the limit is ${formatBytes(DATASET_MAX_BYTES)}.`);
    setError(null);
    setShare(0);
    upload.mutate(
      { file, onProgress: setShare },
      {
        onSuccess: (d) => navigate(paths.dataset(d.id)),
        onError: (err) => setError(isApiError(err) ? err.message : 'The upload failed.'),
      },
    );
  };

  return (
    <section aria-labelledby="upload-title" className="rounded-lg border border-rule bg-sheet px-5 py-4">
      <h2 id="upload-title" className="text-lg font-semibold">
        Upload observations
      </h2>
      <p className="mt-1 max-w-prose text-sm text-ink-soft">
        A CSV or TSV with a header row, up to {formatBytes(DATASET_MAX_BYTES)}: either an event log (one row per arrival, with optional service start and end) or counts per interval.
      </p>
      <div className="mt-4 flex flex-wrap items-center gap-3">
        <label className="text-sm font-medium" htmlFor="dataset-file">
          File
        </label>
        <input
          ref={input}
          id="dataset-file"
          type="file"
          accept=".csv,.tsv,.txt,text/csv,text/tab-separated-values"
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
          className="text-sm file:mr-3 file:rounded-md file:border file:border-rule-strong file:bg-sheet file:px-3 file:py-1.5"
        />
        <Button variant="primary" onClick={send} busy={upload.isPending}>
          Upload
        </Button>
      </div>
      {upload.isPending && (
        <div className="mt-4">
          <ProgressBar value={share} label={`Uploading ${file?.name ?? ''}`} />
        </div>
      )}
      {error && (
        <div className="mt-4">
          <Banner tone="danger" title="The file was not stored">
            {error}
          </Banner>
        </div>
      )}
    </section>
  );
}
