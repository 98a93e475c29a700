import type { ReactNode } from 'react';

interface AuthCardProps {
  title: string;
  lead?: ReactNode;
  children: ReactNode;
  footer?: ReactNode;
}

/** The sheet every signed-out screen sits on: one heading, a short lead, the form. */
export function AuthCard({ title, lead, children, footer }: AuthCardProps) {
  return (
    <div className="w-full max-w-md">
      <title>{`${title} · Sojourn`}</title>
      <div className="rounded-lg border border-rule bg-sheet px-8 py-9 shadow-sm">
        <h1 className="text-2xl font-bold">{title}</h1>
        {lead && <div className="mt-2 text-sm text-ink-soft">{lead}</div>}
        <div className="mt-7">{children}</div>
      </div>
      {footer && <div className="mt-5 text-center text-sm text-ink-soft">{footer}</div>}
    </div>
  );
}
