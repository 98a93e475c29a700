import { Suspense } from 'react';
import { Outlet } from 'react-router-dom';
import { Loading } from '../components/ui/loading';
import { TopBar } from './top-bar';

/** The quiet chrome around every signed-in screen. */
export function AppLayout() {
  return (
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only rounded-md bg-accent px-3 py-2 text-white focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50">
        Skip to content
      </a>
      <TopBar />
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-6 py-10 focus:outline-none">
        <Suspense fallback={<Loading />}>
          <Outlet />
        </Suspense>
      </main>
    </div>
  );
}
