import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { invitationAcceptSchema } from '#shared/schemas/auth';
import { ROLE_LABELS } from '#shared/schemas/roles';
import { paths } from '../../../app/paths';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { Loading } from '../../../components/ui/loading';
import { TextField } from '../../../components/ui/text-field';
import { useToast } from '../../../components/ui/use-toast';
import { isApiError } from '../../../lib/api-error';
import { useFormErrors } from '../../../lib/use-form-errors';
import { useAcceptInvitation } from '../api/auth-mutations';
import { invitationQueryOptions, type Invitation } from '../api/invitation-query';
import { sessionQueryOptions } from '../api/session-query';
import { AuthCard } from './auth-card';
import { NEW_PASSWORD_HINT, newPasswordPairSchema } from './new-password-schema';

const FIELDS = ['name', 'password', 'repeat'] as const;
const acceptFormSchema = z.intersection(invitationAcceptSchema.pick({ name: true }), newPasswordPairSchema);

export function AcceptInvitationScreen() {
  const token = useParams().token ?? '';
  const invitation = useQuery(invitationQueryOptions(token));

  if (invitation.isPending) return <Loading label="Opening your invitation…" />;
  if (invitation.isError) {
    const gone = isApiError(invitation.error) && (invitation.error.status === 404 || invitation.error.status === 410);
    return (
      <AuthCard
        title={gone ? 'This invitation no longer works' : 'The invitation could not be opened'}
        footer={
          <Link to={paths.signIn} className="underline-offset-4 hover:underline">
            Go to sign in
          </Link>
        }
      >
        <p className="text-sm text-ink-soft">
          {gone
            ? 'It has expired or has already been used. Ask your administrator to send a new one, or sign in if you already set a password.'
            : invitation.error.message}
        </p>
      </AuthCard>
    );
  }
  return <AcceptForm token={token} invitation={invitation.data} />;
}

function AcceptForm({ token, invitation }: { token: string; invitation: Invitation }) {
  const navigate = useNavigate();
  const toast = useToast();
  const session = useQuery(sessionQueryOptions());
  const accept = useAcceptInvitation(token);
  const form = useFormErrors(FIELDS);
  const [name, setName] = useState(invitation.name);
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');

  function submit(e: FormEvent) {
    e.preventDefault();
    const values = form.validate(acceptFormSchema, { name, password, repeat });
    if (!values) return;
    accept.mutate(
      { name: values.name, password: values.password },
      {
        onSuccess: ({ user }) => {
          toast.show(`Welcome to Sojourn, ${user.name}.`, 'ok');
          navigate(paths.engagements, { replace: true });
        },
        onError: form.fromError,
      },
    );
  }

  return (
    <AuthCard
      title="Join Sojourn"
      lead={
        <>
          You are invited as <strong className="text-ink">{ROLE_LABELS[invitation.role]}</strong> with the address{' '}
          <strong className="text-ink">{invitation.email}</strong>. Confirm your name and choose a password.
        </>
      }
    >
      <form onSubmit={submit} noValidate className="flex flex-col gap-5">
        {session.data && (
          <Banner tone="info">
            You are signed in as {session.data.name}. Accepting signs you in as {invitation.email} instead.
          </Banner>
        )}
        {form.formError && <Banner tone="danger">{form.formError}</Banner>}
        <TextField label="Your name" autoComplete="name" value={name} onValueChange={setName} error={form.fieldErrors.name} required />
        <TextField label="Password" type="password" autoComplete="new-password" value={password} onValueChange={setPassword} hint={NEW_PASSWORD_HINT} error={form.fieldErrors.password} required />
        <TextField label="Repeat the password" type="password" autoComplete="new-password" value={repeat} onValueChange={setRepeat} error={form.fieldErrors.repeat} required />
        <Button type="submit" variant="primary" busy={accept.isPending} className="self-end">
          Accept and sign in
        </Button>
      </form>
    </AuthCard>
  );
}
