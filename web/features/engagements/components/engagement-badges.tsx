import type { Engagement } from '#shared/schemas/engagements';
import { StatusBadge } from '../../../components/ui/status-badge';

/** Status and the safety flag, the two facts people scan a list for. */
export function EngagementBadges({ engagement }: { engagement: Pick<Engagement, 'status' | 'safetyCritical'> }) {
  return (
    <span className="inline-flex flex-wrap gap-2">
      {engagement.status === 'archived' ? <StatusBadge tone="quiet">Archived</StatusBadge> : <StatusBadge tone="ok">Active</StatusBadge>}
      {engagement.safetyCritical && <StatusBadge tone="warn">Safety-related</StatusBadge>}
    </span>
  );
}
