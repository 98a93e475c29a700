import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { sessionQueryOptions } from '../features/auth/api/session-query';
import { SessionUserContext } from '../features/auth/api/session-user-context';
import { Banner } from '../components/ui/banner';
import { Button } from '../components/ui/button';
import { Loading } from '../components/ui/loading';
import { paths } from './paths';

/** Sends a signed-out person to sign in, remembering where they were going. */
export function RequireSession({ children }: { children: ReactNode }) {
  const session = useQuery(sessionQueryOptions());
  const location = useLocation();

  if (session.isPending) return <Loading label="Checking your session…" />;
  if (session.isError) {
    return (
      <main className="mx-auto max-w-lg px-6 py-20">
        <title>Sojourn is unreachable</title>
        <Banner tone="danger" title="Sojourn could not be reached">
          <p>{session.error.message}</p>
          <Button size="sm" className="mt-3" onClick={() => session.refetch()}>
            Try again
          </Button>
        </Banner>
      </main>
    );
  }
  if (!session.data) {
    const here = location.pathname + location.search;
    const to = here === '/' || here === paths.engagements ? paths.signIn : `${paths.signIn}?next=${encodeURIComponent(here)}`;
    return <Navigate to={to} replace />;
  }
  return <SessionUserContext value={session.data}>{children}</SessionUserContext>;
}
