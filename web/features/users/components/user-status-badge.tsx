import type { User } from '#shared/schemas/users';
import { StatusBadge } from '../../../components/ui/status-badge';

const labels = {
  active: { tone: 'ok', text: 'Active' },
  invited: { tone: 'accent', text: 'Invited' },
  deactivated: { tone: 'quiet', text: 'Deactivated' },
} as const;

export function UserStatusBadge({ status }: { status: User['status'] }) {
  const { tone, text } = labels[status];
  return <StatusBadge tone={tone}>{text}</StatusBadge>;
}
