import { Suspense, useEffect, useRef } from 'react';
import { Outlet, useLocation } from 'react-router-dom';
import { Loading } from '../components/ui/loading';
import { TopBar } from './top-bar';

/** The quiet chrome around every signed-in screen. */
export function AppLayout() {
  const main = useRef<HTMLElement>(null);
  const { pathname } = useLocation();
  const firstRender = useRef(true);

  // After in-app navigation, move focus to the new page so keyboard and screen-reader users
  // start at its content rather than on the link they pressed. Not on first load: the
  // browser's own starting point is right there.
  useEffect(() => {
    if (firstRender.current) {
      firstRender.current = false;
      return;
    }
    main.current?.focus({ preventScroll: true });
  }, [pathname]);

  return (
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only rounded-md bg-accent px-3 py-2 text-white focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50">
        Skip to content
      </a>
      <TopBar />
      <main ref={main} id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-6 py-10 focus:outline-none">
        <Suspense fallback={<Loading />}>
          <Outlet />
        </Suspense>
      </main>
    </div>
  );
}
