import { Suspense } from 'react';
import { Outlet } from 'react-router-dom';
import { Loading } from '../components/ui/loading';

/** Signed-out screens: the product name and one sheet, nothing else to distract. */
export function PublicLayout() {
  return (
    <div className="flex min-h-screen flex-col items-center px-6 py-12 sm:py-20">
      <header className="mb-10 text-center">
        <p className="font-serif text-3xl font-bold text-ink">Sojourn</p>
        <p className="mt-1 text-sm text-ink-faint">Capacity studies for consulting practices</p>
      </header>
      <main id="main" className="flex w-full justify-center">
        <Suspense fallback={<Loading />}>
          <Outlet />
        </Suspense>
      </main>
    </div>
  );
}
