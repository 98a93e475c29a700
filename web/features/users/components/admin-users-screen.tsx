import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Button } from '../../../components/ui/button';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { Table, Th } from '../../../components/ui/table';
import { useCurrentUser } from '../../auth/api/use-current-user';
import { userListQuery } from '../api/user-queries';
import { InviteUserForm } from './invite-user-form';
import { UserRow } from './user-row';

const statusOrder = { active: 0, invited: 1, deactivated: 2 } as const;

export function AdminUsersScreen() {
  const me = useCurrentUser();
  const users = useQuery(userListQuery());
  const [inviting, setInviting] = useState(false);

  return (
    <>
      <PageHeader
        eyebrow="Administration"
        title="People"
        description="Everyone with a Sojourn account. A role says what a person may do; engagement membership says where."
        actions={
          !inviting && (
            <Button variant="primary" onClick={() => setInviting(true)}>
              Invite a person
            </Button>
          )
        }
      />
      {inviting && (
        <section aria-labelledby="invite-title" className="mb-10 rounded-lg border border-rule bg-sheet px-6 py-6">
          <h2 id="invite-title" className="mb-5 text-lg font-bold">
            Invite a person
          </h2>
          <InviteUserForm onDone={() => setInviting(false)} />
        </section>
      )}
      {users.isPending && <Loading label="Loading people…" />}
      {users.isError && <QueryErrorNotice error={users.error} what="list of people" onRetry={() => users.refetch()} />}
      {users.isSuccess && (
        <Table caption="People with an account">
          <thead>
            <tr>
              <Th>Name</Th>
              <Th>E-mail</Th>
              <Th>Role</Th>
              <Th>Status</Th>
              <Th>Last sign-in</Th>
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            </tr>
          </thead>
          <tbody>
            {[...users.data]
              .sort((a, b) => statusOrder[a.status] - statusOrder[b.status] || a.name.localeCompare(b.name))
              .map((u) => (
                <UserRow key={u.id} user={u} isSelf={u.id === me.id} />
              ))}
          </tbody>
        </Table>
      )}
    </>
  );
}
