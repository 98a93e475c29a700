import { ROLES, ROLE_LABELS, type Role } from '#shared/schemas/roles';
import type { User } from '#shared/schemas/users';
import { Button } from '../../../components/ui/button';
import { ConfirmButton } from '../../../components/ui/confirm-button';
import { Td } from '../../../components/ui/table';
import { useToast } from '../../../components/ui/use-toast';
import { formatDate } from '../../../lib/format-date';
import { useSendAccessEmail, useUpdateUser } from '../api/user-mutations';
import { UserStatusBadge } from './user-status-badge';

/** One person: role can be changed in place; access can be re-sent, removed or given back. */
export function UserRow({ user, isSelf }: { user: User; isSelf: boolean }) {
  const update = useUpdateUser();
  const resend = useSendAccessEmail();
  const toast = useToast();

  function change(changes: { role?: Role; active?: boolean }, done: string) {
    update.mutate({ id: user.id, changes }, { onSuccess: () => toast.show(done, 'ok'), onError: (err) => toast.show(err.message, 'danger') });
  }

  function sendAccess() {
    resend.mutate(user.id, {
      onSuccess: () => toast.show(user.status === 'invited' ? `Invitation sent again to ${user.email}.` : `A new access link was sent to ${user.email}.`, 'ok'),
      onError: (err) => toast.show(err.message, 'danger'),
    });
  }

  return (
    <tr className={user.status === 'deactivated' ? 'text-ink-faint' : undefined}>
      <Td className="font-medium">
        {user.name}
        {isSelf && <span className="ml-2 text-xs font-normal text-ink-faint">(you)</span>}
      </Td>
      <Td className="text-ink-soft">{user.email}</Td>
      <Td>
        <label className="sr-only" htmlFor={`role-${user.id}`}>
          Role of {user.name}
        </label>
        <select
          id={`role-${user.id}`}
          className="rounded-md border border-rule-strong bg-sheet px-2 py-1 text-sm disabled:opacity-70"
          value={user.role}
          // Changing your own role could lock the practice out of administration.
          disabled={isSelf || update.isPending || user.status === 'deactivated'}
          onChange={(e) => change({ role: e.target.value as Role }, `${user.name} is now ${ROLE_LABELS[e.target.value as Role]}.`)}
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </select>
      </Td>
      <Td>
        <UserStatusBadge status={user.status} />
      </Td>
      <Td className="whitespace-nowrap text-ink-soft">{user.lastSignInAt ? formatDate(user.lastSignInAt) : '—'}</Td>
      <Td className="text-right whitespace-nowrap">
        <span className="inline-flex flex-wrap justify-end gap-2">
          {user.status !== 'deactivated' && (
            <Button size="sm" variant="quiet" onClick={sendAccess} busy={resend.isPending}>
              {user.status === 'invited' ? 'Re-send invitation' : 'Send access link'}
            </Button>
          )}
          {!isSelf &&
            (user.status === 'deactivated' ? (
              <Button size="sm" onClick={() => change({ active: true }, `${user.name} can sign in again.`)} busy={update.isPending}>
                Reactivate
              </Button>
            ) : (
              <ConfirmButton
                question={`Deactivate ${user.name}?`}
                confirmLabel="Deactivate"
                busy={update.isPending}
                onConfirm={() => change({ active: false }, `${user.name} can no longer sign in.`)}
              >
                Deactivate
              </ConfirmButton>
            ))}
        </span>
      </Td>
    </tr>
  );
}
