import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { NotFoundScreen } from './not-found-screen';

/** Last line of defence when a screen throws while rendering. */
export function RouteErrorScreen() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundScreen />;
  // A new deployment replaces chunk files; an old tab then fails to load a screen.
  const staleChunk = error instanceof Error && /dynamically imported module|Importing a module script failed/i.test(error.message);
  return (
    <main className="mx-auto max-w-xl px-6 py-20 text-center">
      <title>Something went wrong · Sojourn</title>
      <h1 className="text-2xl font-bold">{staleChunk ? 'Sojourn has been updated' : 'Something went wrong on this page'}</h1>
      <p className="mt-3 text-ink-soft">
        {staleChunk ? 'Reload the page to get the new version.' : 'Reloading usually helps. If it keeps happening, tell your administrator what you were doing.'}
      </p>
      <button type="button" onClick={() => window.location.reload()} className="mt-8 rounded-md bg-accent px-4 py-2 text-sm font-medium text-white hover:bg-accent-strong">
        Reload the page
      </button>
    </main>
  );
}
