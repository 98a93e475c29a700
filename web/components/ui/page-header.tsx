import type { ReactNode } from 'react';

interface PageHeaderProps {
  title: string;
  /** A small line above the title, e.g. the section of the app. */
  eyebrow?: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
}

/** The page's one h1 and, via React 19's hoisting, the browser tab's title. */
export function PageHeader({ title, eyebrow, description, actions }: PageHeaderProps) {
  return (
    <header className="mb-8 flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-6">
      <title>{`${title} · Sojourn`}</title>
      <div className="min-w-0">
        {eyebrow && <p className="mb-1 text-xs font-semibold tracking-widest text-ink-faint uppercase">{eyebrow}</p>}
        <h1 className="text-2xl leading-tight font-bold sm:text-3xl">{title}</h1>
        {description && <div className="mt-2 max-w-prose text-ink-soft">{description}</div>}
      </div>
      {actions && <div className="flex shrink-0 flex-wrap gap-2">{actions}</div>}
    </header>
  );
}
