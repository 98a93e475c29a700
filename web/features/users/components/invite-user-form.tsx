import { useState, type FormEvent } from 'react';
import { EMAIL_MAX } from '#shared/schemas/auth';
import { ROLES, ROLE_LABELS, type Role } from '#shared/schemas/roles';
import { inviteUserSchema, NAME_MAX } from '#shared/schemas/users';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { useToast } from '../../../components/ui/use-toast';
import { useFormErrors } from '../../../lib/use-form-errors';
import { useInviteUser } from '../api/user-mutations';

const FIELDS = ['email', 'name', 'role'] as const;
const roleOptions = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

export function InviteUserForm({ onDone }: { onDone: () => void }) {
  const invite = useInviteUser();
  const form = useFormErrors(FIELDS);
  const toast = useToast();
  const [email, setEmail] = useState('');
  const [name, setName] = useState('');
  const [role, setRole] = useState<Role | ''>('');

  function submit(e: FormEvent) {
    e.preventDefault();
    const body = form.validate(inviteUserSchema, { email, name, role: role || undefined });
    if (!body) return;
    invite.mutate(body, {
      onSuccess: (user) => {
        toast.show(`Invitation sent to ${user.email}.`, 'ok');
        onDone();
      },
      onError: form.fromError,
    });
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-5">
      {form.formError && <Banner tone="danger">{form.formError}</Banner>}
      <div className="grid gap-5 md:grid-cols-3">
        <TextField label="E-mail" type="email" autoComplete="off" value={email} onValueChange={setEmail} maxLength={EMAIL_MAX} error={form.fieldErrors.email} required autoFocus />
        <TextField label="Name" autoComplete="off" value={name} onValueChange={setName} maxLength={NAME_MAX} error={form.fieldErrors.name} required />
        <SelectField label="Role" value={role} onValueChange={(v) => setRole(v as Role | '')} options={roleOptions} placeholder="Choose a role" error={form.fieldErrors.role} required />
      </div>
      <p className="text-sm text-ink-soft">
        The person receives an e-mail with a link to set a password. Add them to engagements afterwards; a role alone opens none.
      </p>
      <div className="flex justify-end gap-2">
        <Button variant="quiet" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" variant="primary" busy={invite.isPending}>
          Send invitation
        </Button>
      </div>
    </form>
  );
}
