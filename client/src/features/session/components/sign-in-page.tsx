import { useEffect, useRef, useState, type FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { useSignIn } from '../api/sign-in';
import { fieldMessages, splitServerErrors } from '@client/lib/form-errors';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { safeNext } from '../safe-next';
import { landingAfterSignIn } from '@client/features/shows/api/landing';
import { useSession } from '../api/get-session';
import { AlreadySignedIn } from './already-signed-in';
import { SIGN_IN_WORDS } from '@shared/sign-in-words';
import { useEarlyForm } from '@client/lib/early-form';

const FIELDS = ['email', 'password'] as const;
type Field = (typeof FIELDS)[number];

/** The shared schema, and zod with it, load once the person starts on the form rather than with the first screen. */
const loadSchema = async () => (await import('@shared/schemas/user')).SignInSchema;

/**
 * /sign-in. Two fields checked by the shared schema directly, without a form library: this screen is
 * in the code every visitor downloads first, so it stays light (see `npm run bench`).
 */
export function SignInPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const signIn = useSignIn();
  const { data: session } = useSession();
  const [formError, setFormError] = useState('');
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});
  // What was typed on the form the server drew before this code arrived carries on here; if it was sent, it is sent now.
  const early = useEarlyForm('sign-in');
  const formRef = useRef<HTMLFormElement>(null);
  const earlySend = useRef(early?.sent ?? false);
  useEffect(() => {
    if (!earlySend.current || !formRef.current) return;
    earlySend.current = false;
    formRef.current.requestSubmit();
  });

  const showErrors = (form: HTMLFormElement, fields: Partial<Record<Field, string>>) => {
    setErrors(fields);
    // As a form library would: the first field in trouble takes the focus.
    const first = FIELDS.find((f) => fields[f]);
    if (first) (form.elements.namedItem(first) as HTMLInputElement | null)?.focus();
  };

  const onSubmit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const form = event.currentTarget;
    const data = new FormData(form);
    setFormError('');
    const parsed = (await loadSchema()).safeParse({ email: data.get('email'), password: data.get('password') });
    if (!parsed.success) return showErrors(form, fieldMessages<Field>(parsed.error));
    setErrors({});
    signIn.mutate(parsed.data, {
      onSuccess: async (session) => navigate(params.get('next') ? safeNext(params.get('next')) : await landingAfterSignIn({ isSiteAdmin: session.user?.isSiteAdmin ?? false }), { replace: true }),
      onError: (err) => {
        const { fields, message } = splitServerErrors(err, FIELDS);
        showErrors(form, fields);
        setFormError(message);
      },
    });
  };

  // A field's message goes once the person changes that field.
  const clearOnEdit = (field: Field) => () => setErrors((e) => (e[field] ? { ...e, [field]: undefined } : e));

  // Someone already signed in (not this form's own sign-in, which goes on by itself).
  if (session?.user && signIn.isIdle) return <AlreadySignedIn title="Sign in" name={session.user.name} next={safeNext(params.get('next'))} />;

  return (
    <div className="mx-auto max-w-md">
      <PageHeader title={SIGN_IN_WORDS.heading} />
      {params.get('reset') === 'done' ? <Notice tone="ok">Your password is changed. Sign in with the new one.</Notice> : null}
      <form ref={formRef} onSubmit={(e) => void onSubmit(e)} onFocus={() => void loadSchema()} noValidate className="mt-4 flex flex-col gap-4">
        {formError ? <Notice tone="danger">{formError}</Notice> : null}
        <TextField label={SIGN_IN_WORDS.email} name="email" type="email" autoComplete="email" inputMode="email" defaultValue={early?.values.email} autoFocus={early?.focused === 'email'} onChange={clearOnEdit('email')} error={errors.email} />
        <TextField label={SIGN_IN_WORDS.password} name="password" type="password" autoComplete="current-password" defaultValue={early?.values.password} autoFocus={early?.focused === 'password'} onChange={clearOnEdit('password')} error={errors.password} />
        <Button type="submit" busy={signIn.isPending}>
          {SIGN_IN_WORDS.send}
        </Button>
      </form>
      <p className="mt-6 flex flex-wrap justify-between gap-2 text-sm">
        <Link to="/reset-password" className="underline underline-offset-4">Forgot your password?</Link>
        <Link to={params.get('next') ? `/sign-up?next=${encodeURIComponent(safeNext(params.get('next')))}` : '/sign-up'} className="underline underline-offset-4">
          New here? Make an account
        </Link>
      </p>
    </div>
  );
}
