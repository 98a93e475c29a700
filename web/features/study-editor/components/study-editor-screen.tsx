import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { NotFoundScreen } from '../../../app/not-found-screen';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Loading } from '../../../components/ui/loading';
import { studyQuery } from '../api/study-queries';
import { StudyWorkspace } from './study-workspace';

/** Route /studies/:id — loads the study once; the workspace owns the text from then on. */
export function StudyEditorScreen() {
  const id = Number(useParams().id);
  if (!Number.isInteger(id) || id <= 0) return <NotFoundScreen />;
  return <StudyEditorLoader id={id} />;
}

function StudyEditorLoader({ id }: { id: number }) {
  const qc = useQueryClient();
  const study = useQuery(studyQuery(id));
  // Bumped by "Load the latest version" so the editor starts over from the server's text.
  const [generation, setGeneration] = useState(0);

  if (study.isPending) return <Loading label="Opening the study…" />;
  if (study.isError) return <QueryErrorNotice error={study.error} what="study" onRetry={() => study.refetch()} />;

  const reload = async () => {
    await qc.fetchQuery({ ...studyQuery(id), staleTime: 0 });
    setGeneration((g) => g + 1);
  };
  return <StudyWorkspace key={`${id}-${generation}`} study={study.data} onReload={reload} />;
}
