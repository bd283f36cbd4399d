import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { PasswordResetRequestSchema, type PasswordResetRequestInput } from '@shared/schemas/user';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { applyServerErrors } from '@client/lib/form-errors';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { useSession } from '@client/features/session/api/get-session';

export function ResetRequestPage() {
  const request = useRequestPasswordReset();
  const { data: session } = useSession();
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState: { errors } } = useForm<PasswordResetRequestInput>({ resolver: zodResolver(PasswordResetRequestSchema) });

  const onSubmit = handleSubmit((input) => {
    setFormError('');
    request.mutate(input, { onError: (err) => setFormError(applyServerErrors(err, setError, ['email'])) });
  });

  return (
    <div className="mx-auto max-w-md">
      <PageHeader title="Reset your password">We e-mail you a link that works once, for an hour.</PageHeader>
      {request.isSuccess ? (
        <Notice tone="ok">
          <p>{request.data.message}</p>
          {session?.demoMode ? <p className="mt-1 text-sm">Demo mode: mail is caught, not sent. The site admin reads it under Caught mail.</p> : null}
        </Notice>
      ) : (
        <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
          {formError ? <Notice tone="danger">{formError}</Notice> : null}
          <TextField label="E-mail" type="email" autoComplete="email" inputMode="email" {...register('email')} error={errors.email?.message} />
          <Button type="submit" busy={request.isPending}>
            Send the link
          </Button>
        </form>
      )}
    </div>
  );
}
