import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { EVENT_ROLES, EVENT_ROLE_LABELS } from '@shared/constants';
import { InvitationCreateSchema, type InvitationCreateInput } from '@shared/schemas/show-people';
import { type EventDetail } from '@shared/schemas/show';
import { applyServerErrors } from '@client/lib/form-errors';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { Panel } from '@client/components/ui/panel';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { LoadingState } from '@client/components/ui/states';
import { useInvitePerson } from '../api/invite-person';
import { useShowPeople } from '../api/list-show-people';
import { useRemoveMember } from '../api/remove-member';
import { useRevokeInvitation } from '../api/revoke-invitation';
import { showDay } from './show-dates';

/** Invites one person by e-mail to a role; the role stays picked for the next invitation. */
function InvitationForm({ showId }: { showId: number }) {
  const invite = useInvitePerson(showId);
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, resetField, setError, formState: { errors } } = useForm<InvitationCreateInput>({ resolver: zodResolver(InvitationCreateSchema), defaultValues: { email: '', role: 'judge' } });
  const send = handleSubmit((input) => {
    setFormError('');
    invite.mutate(input, { onSuccess: () => resetField('email'), onError: (err) => setFormError(applyServerErrors(err, setError, ['email', 'role'])) });
  });
  return (
    <>
      <form onSubmit={send} noValidate className="mt-4 grid gap-3 sm:grid-cols-[2fr_1fr_auto] sm:items-end">
        <TextField label="Invite by e-mail" type="email" {...register('email')} error={errors.email?.message} />
        <SelectField label="As" {...register('role')} options={EVENT_ROLES.map((r) => ({ value: r, label: EVENT_ROLE_LABELS[r] }))} error={errors.role?.message} />
        <Button type="submit" busy={invite.isPending}>
          Send the invitation
        </Button>
      </form>
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      {invite.isSuccess ? <Notice tone="ok">Sent. The link works once.</Notice> : null}
    </>
  );
}

/** Organisers, judges and gate staff of the show; invitations by e-mail (a link that works once). */
export function PeoplePanel({ show }: { show: EventDetail }) {
  const people = useShowPeople(show.id);
  const revoke = useRevokeInvitation(show.id);
  const remove = useRemoveMember(show.id);
  const organisers = people.data?.members.filter((m) => m.role === 'organiser').length ?? 0;

  return (
    <Panel title="People">
      {people.isPending ? <LoadingState /> : null}
      <ul className="divide-y divide-rule">
        {people.data?.members.map((m) => (
          <li key={`${m.userId}-${m.role}`} className="flex flex-wrap items-center justify-between gap-2 py-2">
            <span>
              <strong>{m.name}</strong> · {EVENT_ROLE_LABELS[m.role]} <span className="text-sm text-graphite">{m.email}</span>
            </span>
            <Button type="button" variant="quiet" disabled={m.role === 'organiser' && organisers <= 1} title={m.role === 'organiser' && organisers <= 1 ? 'The last organiser cannot leave' : undefined} onClick={() => remove.mutate({ userId: m.userId, role: m.role })}>
              Remove
            </Button>
          </li>
        ))}
      </ul>
      {remove.isError ? <Notice tone="danger">{remove.error.message}</Notice> : null}
      {people.data?.invitations.length ? (
        <>
          <h3 className="mt-4 font-display uppercase">Waiting for an answer</h3>
          <ul className="divide-y divide-rule">
            {people.data.invitations.map((i) => (
              <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <span>
                  {i.email} · {EVENT_ROLE_LABELS[i.role]} <span className="text-sm text-graphite">link works until {showDay(i.expiresAt, show.timeZone)}</span>
                </span>
                <Button type="button" variant="quiet" onClick={() => revoke.mutate(i.id)}>
                  Withdraw
                </Button>
              </li>
            ))}
          </ul>
        </>
      ) : null}
      <InvitationForm showId={show.id} />
    </Panel>
  );
}
