import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { NotFoundScreen } from '../../../app/not-found-screen';
import { paths } from '../../../app/paths';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Button } from '../../../components/ui/button';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { useCurrentUser } from '../../auth/api/use-current-user';
import { datasetFitQuery, datasetQuery } from '../api/dataset-queries';
import { formatBytes } from '../lib/format-bytes';
import { DatasetStatus } from './dataset-status';
import { FitView } from './fit-view';
import { MakeAssumptionsForm } from './make-assumptions-form';
import { MappingForm } from './mapping-form';
import { ProgressBar } from './progress-bar';
import { StaffingBlockForm } from './staffing-block-form';

export function DatasetScreen() {
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id <= 0) return <NotFoundScreen />;
  return <DatasetPage id={id} />;
}

function DatasetPage({ id }: { id: number }) {
  const user = useCurrentUser();
  const dataset = useQuery(datasetQuery(id));
  const fitted = dataset.data?.status === 'fitted';
  const fit = useQuery(datasetFitQuery(id, fitted ? (dataset.data?.fittedAt ?? null) : null));
  const [remapping, setRemapping] = useState(false);
  if (dataset.isPending) return <Loading label="Loading the dataset…" />;
  if (dataset.isError) return <QueryErrorNotice error={dataset.error} what="dataset" onRetry={() => dataset.refetch()} />;
  const d = dataset.data;
  const canWrite = user.role === 'partner' || user.role === 'consultant';
  const mapping = canWrite && (d.status === 'uploaded' || d.status === 'failed' || remapping);

  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-4 text-sm">
        <Link to={paths.datasets(d.engagementId)} className="underline-offset-4 hover:underline">
          ← All datasets
        </Link>
      </nav>
      <PageHeader
        eyebrow="Dataset"
        title={d.name}
        description={
          <span className="flex flex-wrap items-center gap-3 text-sm">
            <DatasetStatus dataset={d} />
            <span>{formatBytes(d.byteSize)}</span>
            <span className="font-mono text-xs text-ink-faint" title="SHA-256 of the stored file">
              {d.sha256.slice(0, 16)}…
            </span>
          </span>
        }
        actions={
          canWrite && fitted && !remapping ? (
            <Button variant="secondary" onClick={() => setRemapping(true)}>
              Change the mapping
            </Button>
          ) : undefined
        }
      />
      {mapping ? (
        <MappingForm dataset={d} onSaved={() => setRemapping(false)} />
      ) : d.status === 'mapped' || d.status === 'fitting' ? (
        <section aria-label="Fitting" className="max-w-xl">
          <p className="mb-2 text-sm">Reading the file and fitting… {d.rowsRead.toLocaleString('en')} rows so far.</p>
          <ProgressBar value={d.progress} label="Fitting progress" />
        </section>
      ) : fit.data?.fit ? (
        <div className="flex flex-col gap-10">
          <FitView fit={fit.data.fit} />
          {canWrite && (
            <>
              <section aria-labelledby="make-title">
                <h2 id="make-title" className="mb-3 text-lg font-semibold">
                  Make assumptions
                </h2>
                <MakeAssumptionsForm datasetId={d.id} engagementId={d.engagementId} suggestions={fit.data.fit.suggestions} />
              </section>
              <section aria-labelledby="block-title">
                <h2 id="block-title" className="mb-3 text-lg font-semibold">
                  Add an interval staffing block to a study
                </h2>
                <StaffingBlockForm datasetId={d.id} engagementId={d.engagementId} />
              </section>
            </>
          )}
        </div>
      ) : (
        <Loading label="Loading the fit…" />
      )}
    </>
  );
}
