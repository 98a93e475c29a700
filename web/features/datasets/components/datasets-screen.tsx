import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import { NotFoundScreen } from '../../../app/not-found-screen';
import { paths } from '../../../app/paths';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { formatDate } from '../../../lib/format-date';
import { useCurrentUser } from '../../auth/api/use-current-user';
import { engagementQuery } from '../../engagements/api/engagement-queries';
import { datasetsQuery } from '../api/dataset-queries';
import { formatBytes } from '../lib/format-bytes';
import { DatasetStatus } from './dataset-status';
import { UploadPanel } from './upload-panel';

export function DatasetsScreen() {
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id <= 0) return <NotFoundScreen />;
  return <Datasets engagementId={id} />;
}

function Datasets({ engagementId }: { engagementId: number }) {
  const user = useCurrentUser();
  const engagement = useQuery(engagementQuery(engagementId));
  const list = useQuery(datasetsQuery(engagementId));
  if (list.isPending) return <Loading label="Loading the datasets…" />;
  if (list.isError) return <QueryErrorNotice error={list.error} what="engagement" onRetry={() => list.refetch()} />;
  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-4 text-sm">
        <Link to={paths.engagement(engagementId)} className="underline-offset-4 hover:underline">
          ← {engagement.data?.name ?? 'Engagement'}
        </Link>
      </nav>
      <PageHeader eyebrow={engagement.data?.clientName} title="Datasets" description="Observation files and what was fitted from them." />
      <div className="flex flex-col gap-8">
        {user.role !== 'admin' && <UploadPanel engagementId={engagementId} />}
        {list.data.length === 0 ? (
          <p className="text-ink-faint">No datasets yet.</p>
        ) : (
          <table className="w-full text-sm">
            <thead className="border-b border-rule text-left text-ink-faint">
              <tr>
                <th className="py-2 font-medium">File</th>
                <th className="py-2 font-medium">State</th>
                <th className="py-2 text-right font-medium">Size</th>
                <th className="py-2 font-medium">Uploaded</th>
              </tr>
            </thead>
            <tbody>
              {list.data.map((d) => (
                <tr key={d.id} className="border-b border-rule">
                  <td className="py-2">
                    <Link to={paths.dataset(d.id)} className="font-medium text-accent underline-offset-4 hover:underline">
                      {d.name}
                    </Link>
                  </td>
                  <td className="py-2">
                    <DatasetStatus dataset={d} />
                  </td>
                  <td className="py-2 text-right tabular-nums">{formatBytes(d.byteSize)}</td>
                  <td className="py-2 text-ink-soft">
                    {formatDate(d.createdAt)} {d.uploadedByName ? `· ${d.uploadedByName}` : ''}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </div>
    </>
  );
}
