import { Link } from 'react-router-dom';
import type { Engagement } from '#shared/schemas/engagements';
import { paths } from '../../../app/paths';
import { formatDate } from '../../../lib/format-date';
import { EngagementBadges } from './engagement-badges';

/** One engagement in the index: reads like an entry in a table of contents. */
export function EngagementCard({ engagement }: { engagement: Engagement }) {
  return (
    <li className="group relative rounded-lg border border-rule bg-sheet px-6 py-5 transition-colors hover:border-accent/60">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <p className="text-xs font-semibold tracking-widest text-ink-faint uppercase">{engagement.clientName}</p>
        <EngagementBadges engagement={engagement} />
      </div>
      <h2 className="mt-1 text-lg font-bold">
        {/* The link covers the card (after:inset-0) while staying a single focusable element. */}
        <Link to={paths.engagement(engagement.id)} className="text-ink no-underline after:absolute after:inset-0 group-hover:text-accent">
          {engagement.name}
        </Link>
      </h2>
      {engagement.description && <p className="mt-2 line-clamp-2 max-w-prose font-serif text-sm leading-relaxed text-ink-soft">{engagement.description}</p>}
      <p className="mt-3 text-xs text-ink-faint">
        {engagement.memberCount} {engagement.memberCount === 1 ? 'member' : 'members'} · updated {formatDate(engagement.updatedAt, false)}
      </p>
    </li>
  );
}
