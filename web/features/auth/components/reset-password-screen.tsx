import { useState, type FormEvent } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../lib/use-form-errors';
import { useConfirmPasswordReset } from '../api/auth-mutations';
import { AuthCard } from './auth-card';
import { NEW_PASSWORD_HINT, newPasswordPairSchema } from './new-password-schema';

const FIELDS = ['password', 'repeat'] as const;

export function ResetPasswordScreen() {
  const params = useParams();
  const [search] = useSearchParams();
  const token = params.token ?? search.get('token') ?? '';
  const confirm = useConfirmPasswordReset();
  const form = useFormErrors(FIELDS);
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');

  const requestAgain = (
    <Link to={paths.forgotPassword} className="underline-offset-4 hover:underline">
      Request a new link
    </Link>
  );

  if (!token) {
    return (
      <AuthCard title="This link is incomplete" footer={requestAgain}>
        <p className="text-sm text-ink-soft">Open the link from your e-mail exactly as it was sent, or ask for a new one.</p>
      </AuthCard>
    );
  }

  if (confirm.isSuccess) {
    return (
      <AuthCard title="Password changed">
        <p className="text-sm text-ink-soft">Your new password is set. Sign in with it from now on.</p>
        <Link to={paths.signIn} className="mt-6 inline-block rounded-md bg-accent px-4 py-2 text-sm font-medium text-white no-underline hover:bg-accent-strong">
          Go to sign in
        </Link>
      </AuthCard>
    );
  }

  function submit(e: FormEvent) {
    e.preventDefault();
    const values = form.validate(newPasswordPairSchema, { password, repeat });
    if (values) confirm.mutate({ token, password: values.password }, { onError: form.fromError });
  }

  return (
    <AuthCard title="Choose a new password" footer={requestAgain}>
      <form onSubmit={submit} noValidate className="flex flex-col gap-5">
        {form.formError && <Banner tone="danger">{form.formError}</Banner>}
        <TextField label="New password" type="password" autoComplete="new-password" value={password} onValueChange={setPassword} hint={NEW_PASSWORD_HINT} error={form.fieldErrors.password} required autoFocus />
        <TextField label="Repeat the new password" type="password" autoComplete="new-password" value={repeat} onValueChange={setRepeat} error={form.fieldErrors.repeat} required />
        <Button type="submit" variant="primary" busy={confirm.isPending} className="self-end">
          Set password
        </Button>
      </form>
    </AuthCard>
  );
}
