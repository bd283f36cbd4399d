import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { PASSWORD_MIN_LENGTH } from '@shared/constants';
import { SignUpSchema, type SignUpInput } from '@shared/schemas/user';
import { useSignUp } from '../api/sign-up';
import { applyServerErrors } from '@client/lib/form-errors';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { rememberNextAfterSignUp } from '../next-after-sign-up';
import { safeNext } from '../safe-next';
import { useSession } from '../api/get-session';
import { AlreadySignedIn } from './already-signed-in';

/** The token of an invitation link the person came from (`next=/invitations/<token>`): its mail proves the address. */
const invitationTokenIn = (next: string | null) => /^\/invitations\/([A-Za-z0-9_-]{20,100})$/.exec(next ?? '')?.[1];

export function SignUpPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const invitationToken = invitationTokenIn(params.get('next'));
  const signUp = useSignUp();
  const { data: session } = useSession();
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState: { errors } } = useForm<SignUpInput>({ resolver: zodResolver(SignUpSchema) });

  const onSubmit = handleSubmit((input) => {
    setFormError('');
    rememberNextAfterSignUp(params.get('next'));
    signUp.mutate(invitationToken ? { ...input, invitationToken } : input, {
      // From an invitation with the invited address the account is confirmed and signed in: straight back to it.
      onSuccess: ({ session }) => {
        if (session) void navigate(safeNext(params.get('next')));
      },
      onError: (err) => setFormError(applyServerErrors(err, setError, ['email', 'name', 'password'])),
    });
  });

  if (session?.user && signUp.isIdle) return <AlreadySignedIn title="Make an account" name={session.user.name} next={safeNext(params.get('next'))} />;

  if (signUp.isSuccess && !signUp.data.session) {
    return (
      <div className="mx-auto max-w-md">
        <PageHeader title="Check your inbox" />
        <Notice tone="ok">
          <p>{signUp.data.message}</p>
          {signUp.data.demoMode ? <p className="mt-1 text-sm">Demo mode: mail is caught, not sent. The site admin reads it under Caught mail.</p> : null}
        </Notice>
        <p className="mt-6 text-sm">Opened in this browser, the link confirms your address and signs you in. Elsewhere it confirms it, and you sign in there with your password.</p>
        <p className="mt-2 text-sm">
          Nothing arrived? Look in the spam folder, then <Link to="/sign-in" className="underline underline-offset-4">sign in</Link> and ask for a new link.
        </p>
      </div>
    );
  }

  return (
    <div className="mx-auto max-w-md">
      <PageHeader title="Make an account">One account for your builds, the shows you enter and the shows you help run.</PageHeader>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
        {formError ? <Notice tone="danger">{formError}</Notice> : null}
        <TextField label="Your name" autoComplete="name" {...register('name')} error={errors.name?.message} hint="Shown on your build pages and cards." />
        <TextField
          label="E-mail"
          type="email"
          autoComplete="email"
          inputMode="email"
          {...register('email')}
          error={errors.email?.message}
          hint={invitationToken ? 'Use the address the invitation was sent to: the account is then ready at once. Never shown to anyone else.' : 'Never shown to anyone else.'}
        />
        <TextField label="Password" type="password" autoComplete="new-password" {...register('password')} error={errors.password?.message} hint={`At least ${PASSWORD_MIN_LENGTH} characters.`} />
        <Button type="submit" busy={signUp.isPending}>
          Make my account
        </Button>
      </form>
      <p className="mt-6 text-sm">
        Already have one?{' '}
        <Link to={params.get('next') ? `/sign-in?next=${encodeURIComponent(params.get('next')!)}` : '/sign-in'} className="underline underline-offset-4">
          Sign in
        </Link>
      </p>
    </div>
  );
}
