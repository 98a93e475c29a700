import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from './paths';

interface StatusMessageProps {
  /** A short code shown above the title: 403, 404, … */
  code?: string;
  title: string;
  children: ReactNode;
  /** Changes the page title; off when the message is a panel inside another page. */
  ownsPage?: boolean;
}

/** Full-width "you cannot see this" and "nothing here" messages with a way back. */
export function StatusMessage({ code, title, children, ownsPage = true }: StatusMessageProps) {
  return (
    <section aria-labelledby="status-title" className="mx-auto max-w-xl py-16 text-center">
      {ownsPage && <title>{`${title} · Sojourn`}</title>}
      {code && <p className="font-serif text-5xl text-ink-faint">{code}</p>}
      <h1 id="status-title" className="mt-3 text-2xl font-bold">
        {title}
      </h1>
      <div className="mt-3 text-ink-soft">{children}</div>
      <p className="mt-8">
        <Link to={paths.engagements} className="font-medium underline-offset-4 hover:underline">
          Go to your engagements
        </Link>
      </p>
    </section>
  );
}
