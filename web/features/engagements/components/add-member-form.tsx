import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { addMemberSchema } from '#shared/schemas/engagements';
import { ROLE_LABELS } from '#shared/schemas/roles';
import { paths } from '../../../app/paths';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { useFormErrors } from '../../../lib/use-form-errors';
import { userListQuery } from '../../users/api/user-queries';
import { useAddMember } from '../api/engagement-mutations';

const FIELDS = ['userId'] as const;

/** Administrators pick anyone with an account who is not already a member and not deactivated. */
export function AddMemberForm({ engagementId, memberIds }: { engagementId: number; memberIds: number[] }) {
  const users = useQuery(userListQuery());
  const add = useAddMember(engagementId);
  const form = useFormErrors(FIELDS);
  const [userId, setUserId] = useState('');
  // Confirmed beside the button rather than in a toast: a toast sits over this button when the form
  // is at the foot of the page, just as the next person is being added.
  const [added, setAdded] = useState<string | null>(null);

  const candidates = (users.data ?? [])
    .filter((u) => u.status !== 'deactivated' && !memberIds.includes(u.id))
    .sort((a, b) => a.name.localeCompare(b.name))
    .map((u) => ({ value: String(u.id), label: `${u.name} (${u.email}) · ${ROLE_LABELS[u.role]}${u.status === 'invited' ? ', invited' : ''}` }));

  function submit(e: FormEvent) {
    e.preventDefault();
    const body = form.validate(addMemberSchema, { userId: userId ? Number(userId) : undefined });
    if (!body) return;
    setAdded(null);
    add.mutate(body.userId, {
      onSuccess: (member) => {
        setAdded(`${member.name} added.`);
        setUserId('');
      },
      onError: form.fromError,
    });
  }

  return (
    <form onSubmit={submit} noValidate className="mt-6 rounded-lg border border-rule bg-sheet px-5 py-5">
      <h3 className="mb-3 font-sans text-sm font-semibold">Add a member</h3>
      {form.formError && <Banner tone="danger">{form.formError}</Banner>}
      {users.isError && <Banner tone="danger">The list of people could not be loaded: {users.error.message}</Banner>}
      <div className="flex flex-wrap items-end gap-3">
        <SelectField
          label="Person"
          className="min-w-64 flex-1"
          value={userId}
          onValueChange={setUserId}
          placeholder={users.isPending ? 'Loading people…' : candidates.length ? 'Choose a person' : 'Everyone is already a member'}
          options={candidates}
          error={form.fieldErrors.userId}
        />
        <Button type="submit" variant="primary" busy={add.isPending} disabled={!candidates.length}>
          Add to engagement
        </Button>
        <p role="status" className="self-center text-sm font-medium text-ok">
          {added}
        </p>
      </div>
      {/* A new person is not in the list until invited; say where that is done. */}
      <p className="mt-3 text-sm text-ink-soft">
        Someone without an account? <Link to={paths.adminUsers}>Invite them under People</Link>, then add them here.
      </p>
    </form>
  );
}
