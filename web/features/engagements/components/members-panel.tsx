import { useQuery } from '@tanstack/react-query';
import { ROLE_LABELS } from '#shared/schemas/roles';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { ConfirmButton } from '../../../components/ui/confirm-button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { Table, Td, Th } from '../../../components/ui/table';
import { useToast } from '../../../components/ui/use-toast';
import { formatDate } from '../../../lib/format-date';
import { engagementMembersQuery } from '../api/engagement-queries';
import { useRemoveMember } from '../api/engagement-mutations';
import { AddMemberForm } from './add-member-form';

interface MembersPanelProps {
  engagementId: number;
  canManage: boolean;
}

export function MembersPanel({ engagementId, canManage }: MembersPanelProps) {
  const members = useQuery(engagementMembersQuery(engagementId));
  const remove = useRemoveMember(engagementId);
  const toast = useToast();

  return (
    <section aria-labelledby="members-title">
      <h2 id="members-title" className="mb-4 text-xl font-bold">
        Members
      </h2>
      {members.isPending && <Loading label="Loading members…" />}
      {members.isError && <QueryErrorNotice error={members.error} what="member list" onRetry={() => members.refetch()} />}
      {members.isSuccess && members.data.length === 0 && (
        <EmptyState title="Nobody is on this engagement yet">{canManage ? 'Add the consultants, the partner and the client contact below.' : null}</EmptyState>
      )}
      {members.isSuccess && members.data.length > 0 && (
        <Table caption="Members of this engagement">
          <thead>
            <tr>
              <Th>Name</Th>
              <Th>E-mail</Th>
              <Th>Role</Th>
              <Th>Added</Th>
              {canManage && (
                <Th>
                  <span className="sr-only">Actions</span>
                </Th>
              )}
            </tr>
          </thead>
          <tbody>
            {members.data.map((m) => (
              <tr key={m.userId}>
                <Td className="font-medium">{m.name}</Td>
                <Td className="text-ink-soft">{m.email}</Td>
                <Td>{ROLE_LABELS[m.role]}</Td>
                <Td className="whitespace-nowrap text-ink-soft">{formatDate(m.addedAt, false)}</Td>
                {canManage && (
                  <Td className="text-right">
                    <ConfirmButton
                      question={`Remove ${m.name}?`}
                      confirmLabel="Remove"
                      busy={remove.isPending && remove.variables === m.userId}
                      onConfirm={() =>
                        remove.mutate(m.userId, {
                          onSuccess: () => toast.show(`${m.name} is no longer a member.`, 'ok'),
                          onError: (err) => toast.show(err.message, 'danger'),
                        })
                      }
                    >
                      Remove
                    </ConfirmButton>
                  </Td>
                )}
              </tr>
            ))}
          </tbody>
        </Table>
      )}
      {canManage && members.isSuccess && <AddMemberForm engagementId={engagementId} memberIds={members.data.map((m) => m.userId)} />}
    </section>
  );
}
