import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { datasetsQuery } from '../api/dataset-queries';

/** The engagement overview's way to its datasets, with how many there are. */
export function DatasetsLink({ engagementId }: { engagementId: number }) {
  const list = useQuery(datasetsQuery(engagementId));
  const count = list.data?.length;
  return (
    <section aria-labelledby="datasets-link-title" className="flex flex-wrap items-baseline justify-between gap-3 rounded-lg border border-rule bg-sheet px-5 py-4">
      <div>
        <h2 id="datasets-link-title" className="text-lg font-semibold">
          Datasets
        </h2>
        <p className="text-sm text-ink-soft">{count === undefined ? 'Observation files and their fits.' : count === 0 ? 'No observation files yet.' : `${count} observation file${count === 1 ? '' : 's'} with their fits.`}</p>
      </div>
      <Link to={paths.datasets(engagementId)} className="text-sm font-medium text-accent underline-offset-4 hover:underline">
        Open datasets →
      </Link>
    </section>
  );
}
