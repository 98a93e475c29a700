import { useState, type FormEvent } from 'react';
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { signInBodySchema } from '#shared/schemas/auth';
import { paths } from '../../../app/paths';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { safeReturnPath } from '../../../lib/safe-return-path';
import { useFormErrors } from '../../../lib/use-form-errors';
import { useSignIn } from '../api/auth-mutations';
import { sessionQueryOptions } from '../api/session-query';
import { AuthCard } from './auth-card';

const FIELDS = ['email', 'password'] as const;

export function SignInScreen() {
  const [params] = useSearchParams();
  const next = safeReturnPath(params.get('next'));
  const navigate = useNavigate();
  const session = useQuery(sessionQueryOptions());
  const signIn = useSignIn();
  const form = useFormErrors(FIELDS);
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');

  if (session.data) return <Navigate to={next} replace />;

  function submit(e: FormEvent) {
    e.preventDefault();
    const body = form.validate(signInBodySchema, { email, password });
    if (!body) return;
    signIn.mutate(body, {
      onSuccess: () => navigate(next, { replace: true }),
      onError: (err) => {
        form.fromError(err);
        setPassword('');
      },
    });
  }

  return (
    <AuthCard
      title="Sign in"
      lead="Capacity studies, reviewed and signed, in one place."
      footer={
        <>
          Invited by your firm? Follow the link in your invitation e-mail to set a password.
        </>
      }
    >
      <form onSubmit={submit} noValidate className="flex flex-col gap-5">
        {params.get('next') && !form.formError && <Banner tone="info">Sign in to continue where you were.</Banner>}
        {form.formError && <Banner tone="danger">{form.formError}</Banner>}
        <TextField label="E-mail" type="email" name="email" autoComplete="username" value={email} onValueChange={setEmail} error={form.fieldErrors.email} required autoFocus />
        <TextField
          label="Password"
          type="password"
          name="password"
          autoComplete="current-password"
          value={password}
          onValueChange={setPassword}
          error={form.fieldErrors.password}
          required
        />
        <div className="flex items-center justify-between gap-4">
          <Link to={paths.forgotPassword} className="text-sm underline-offset-4 hover:underline">
            Forgot your password?
          </Link>
          <Button type="submit" variant="primary" busy={signIn.isPending}>
            Sign in
          </Button>
        </div>
      </form>
    </AuthCard>
  );
}
