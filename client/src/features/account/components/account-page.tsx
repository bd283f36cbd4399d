import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { AccountUpdateSchema, PasswordChangeSchema, type AccountUpdateInput, type CurrentUser, type PasswordChangeInput } from '@shared/schemas/user';
import { PASSWORD_MIN_LENGTH } from '@shared/constants';
import { OWNER_PUBLIC_WORDS as ownerWords } from '@shared/schemas/owner-credit';
import { useSession } from '@client/features/session/api/get-session';
import { useUpdateAccount } from '../api/update-account';
import { useChangePassword } from '../api/change-password';
import { applyServerErrors } from '@client/lib/form-errors';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { Notice } from '@client/components/ui/notice';
import { Panel } from '@client/components/ui/panel';
import { PageHeader } from '@client/components/ui/page-header';

function ProfileForm({ user }: { user: CurrentUser }) {
  const update = useUpdateAccount();
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState: { errors, isDirty }, reset } = useForm<AccountUpdateInput>({
    resolver: zodResolver(AccountUpdateSchema),
    defaultValues: { name: user.name, hometown: user.hometown, club: user.club },
  });
  const onSubmit = handleSubmit((input) => {
    setFormError('');
    update.mutate(input, {
      onSuccess: ({ user: saved }) => reset({ name: saved.name, hometown: saved.hometown, club: saved.club }),
      onError: (err) => setFormError(applyServerErrors(err, setError, ['name', 'hometown', 'club'])),
    });
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      {update.isSuccess && !isDirty ? <Notice tone="ok">Saved.</Notice> : null}
      <TextField label="Your name" autoComplete="name" {...register('name')} error={errors.name?.message} hint={ownerWords.name} />
      <TextField label="Hometown (optional)" autoComplete="address-level2" {...register('hometown')} error={errors.hometown?.message} hint={ownerWords.hometown} />
      <TextField label="Club (optional)" autoComplete="off" {...register('club')} error={errors.club?.message} hint={ownerWords.club} />
      <p className="text-sm text-graphite">E-mail: {user.email} (private: never shown on a public page or card)</p>
      <Button type="submit" busy={update.isPending} disabled={!isDirty} className="self-start">
        Save
      </Button>
    </form>
  );
}

function PasswordForm() {
  const change = useChangePassword();
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, reset, formState: { errors } } = useForm<PasswordChangeInput>({ resolver: zodResolver(PasswordChangeSchema) });
  const onSubmit = handleSubmit((input) => {
    setFormError('');
    change.mutate(input, {
      onSuccess: () => reset({ currentPassword: '', newPassword: '' }),
      onError: (err) => setFormError(applyServerErrors(err, setError, ['currentPassword', 'newPassword'])),
    });
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      {change.isSuccess ? <Notice tone="ok">Password changed. You stay signed in here; other devices are signed out.</Notice> : null}
      <TextField label="Current password" type="password" autoComplete="current-password" {...register('currentPassword')} error={errors.currentPassword?.message} />
      <TextField label="New password" type="password" autoComplete="new-password" {...register('newPassword')} error={errors.newPassword?.message} hint={`At least ${PASSWORD_MIN_LENGTH} characters.`} />
      <Button type="submit" busy={change.isPending} className="self-start">
        Change password
      </Button>
    </form>
  );
}

export function AccountPage() {
  const { data } = useSession();
  const user = data?.user;
  if (!user) return null;
  const roles = [user.isSiteAdmin ? 'site admin' : '', user.mayOrganise ? 'may organise shows' : ''].filter(Boolean);
  return (
    <div>
      <PageHeader title="Account">
        {user.name}
        {roles.length ? ` · ${roles.join(' · ')}` : ''}
      </PageHeader>
      <div className="grid gap-6 md:grid-cols-2">
        <Panel title="Profile">
          <ProfileForm user={user} />
        </Panel>
        <Panel title="Password">
          <PasswordForm />
        </Panel>
      </div>
    </div>
  );
}
