import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { SignInSchema, type SignInInput } from '@shared/schemas/user';
import { useSignIn } from '../api/sign-in';
import { applyServerErrors } from '@client/lib/form-errors';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { safeNext } from '../safe-next';
import { landingAfterSignIn } from '@client/features/shows/api/landing';

export function SignInPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const signIn = useSignIn();
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState: { errors } } = useForm<SignInInput>({ resolver: zodResolver(SignInSchema) });

  const onSubmit = handleSubmit((input) => {
    setFormError('');
    signIn.mutate(input, {
      onSuccess: async () => navigate(params.get('next') ? safeNext(params.get('next')) : await landingAfterSignIn(), { replace: true }),
      onError: (err) => setFormError(applyServerErrors(err, setError, ['email', 'password'])),
    });
  });

  return (
    <div className="mx-auto max-w-md">
      <PageHeader title="Sign in" />
      {params.get('reset') === 'done' ? <Notice tone="ok">Your password is changed. Sign in with the new one.</Notice> : null}
      <form onSubmit={onSubmit} noValidate className="mt-4 flex flex-col gap-4">
        {formError ? <Notice tone="danger">{formError}</Notice> : null}
        <TextField label="E-mail" type="email" autoComplete="email" inputMode="email" {...register('email')} error={errors.email?.message} />
        <TextField label="Password" type="password" autoComplete="current-password" {...register('password')} error={errors.password?.message} />
        <Button type="submit" busy={signIn.isPending}>
          Sign in
        </Button>
      </form>
      <p className="mt-6 flex flex-wrap justify-between gap-2 text-sm">
        <Link to="/reset-password" className="underline underline-offset-4">Forgot your password?</Link>
        <Link to="/sign-up" className="underline underline-offset-4">New here? Make an account</Link>
      </p>
    </div>
  );
}
