import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { passwordResetRequestSchema } from '#shared/schemas/auth';
import { paths } from '../../../app/paths';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../lib/use-form-errors';
import { useRequestPasswordReset } from '../api/auth-mutations';
import { AuthCard } from './auth-card';

const FIELDS = ['email'] as const;

export function ForgotPasswordScreen() {
  const request = useRequestPasswordReset();
  const form = useFormErrors(FIELDS);
  const [email, setEmail] = useState('');

  function submit(e: FormEvent) {
    e.preventDefault();
    const body = form.validate(passwordResetRequestSchema, { email });
    if (body) request.mutate(body, { onError: form.fromError });
  }

  const back = (
    <Link to={paths.signIn} className="underline-offset-4 hover:underline">
      Back to sign in
    </Link>
  );

  if (request.isSuccess) {
    return (
      <AuthCard title="Check your e-mail" footer={back}>
        {/* The API never says whether an address exists, so neither do we. */}
        <p className="text-sm text-ink-soft">
          If <strong className="text-ink">{request.variables.email}</strong> belongs to a Sojourn account, a link to choose a new
          password is on its way. The link works once and expires soon.
        </p>
      </AuthCard>
    );
  }

  return (
    <AuthCard title="Reset your password" lead="Enter the e-mail address you sign in with. We will send you a link to choose a new password." footer={back}>
      <form onSubmit={submit} noValidate className="flex flex-col gap-5">
        {form.formError && <Banner tone="danger">{form.formError}</Banner>}
        <TextField label="E-mail" type="email" name="email" autoComplete="email" value={email} onValueChange={setEmail} error={form.fieldErrors.email} required autoFocus />
        <Button type="submit" variant="primary" busy={request.isPending} className="self-end">
          Send reset link
        </Button>
      </form>
    </AuthCard>
  );
}
