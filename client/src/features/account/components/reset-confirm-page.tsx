import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { PASSWORD_MIN_LENGTH } from '@shared/constants';
import { PasswordResetConfirmSchema, type PasswordResetConfirmInput } from '@shared/schemas/user';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';
import { applyServerErrors } from '@client/lib/form-errors';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';

export function ResetConfirmPage({ token }: { token: string }) {
  const navigate = useNavigate();
  const confirm = useConfirmPasswordReset();
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState: { errors } } = useForm<PasswordResetConfirmInput>({
    resolver: zodResolver(PasswordResetConfirmSchema),
    defaultValues: { token },
  });

  const onSubmit = handleSubmit((input) => {
    setFormError('');
    confirm.mutate(input, {
      onSuccess: () => navigate('/sign-in?reset=done', { replace: true }),
      onError: (err) => setFormError(applyServerErrors(err, setError, ['password'])),
    });
  });

  return (
    <div className="mx-auto max-w-md">
      <PageHeader title="Choose a new password" />
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
        {formError || errors.token ? (
          <Notice tone="danger">
            <p>{formError || errors.token?.message}</p>
            <Link to="/reset-password" className="underline underline-offset-4">Ask for a new link</Link>
          </Notice>
        ) : null}
        <input type="hidden" {...register('token')} />
        <TextField label="New password" type="password" autoComplete="new-password" {...register('password')} error={errors.password?.message} hint={`At least ${PASSWORD_MIN_LENGTH} characters.`} />
        <Button type="submit" busy={confirm.isPending}>
          Save the new password
        </Button>
      </form>
    </div>
  );
}

