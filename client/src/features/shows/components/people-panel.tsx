import { useState, type FormEvent } from 'react';
import { EVENT_ROLES, EVENT_ROLE_LABELS, type EventRole } from '@shared/constants';
import { InvitationCreateSchema } from '@shared/schemas/show-people';
import { type EventDetail } from '@shared/schemas/show';
import { fieldsFromIssues } from '@shared/errors';
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
import { fieldErrors, showDay } from './show-dates';

/** Organisers, judges and gate staff of the show; invitations by e-mail (a link that works once). */
export function PeoplePanel({ show }: { show: EventDetail }) {
  const people = useShowPeople(show.id);
  const invite = useInvitePerson(show.id);
  const revoke = useRevokeInvitation(show.id);
  const remove = useRemoveMember(show.id);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<EventRole>('judge');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const all = { ...fieldErrors(invite.error), ...errors };
  const organisers = people.data?.members.filter((m) => m.role === 'organiser').length ?? 0;

  const send = (e: FormEvent) => {
    e.preventDefault();
    const parsed = InvitationCreateSchema.safeParse({ email, role });
    if (!parsed.success) return setErrors(fieldsFromIssues(parsed.error.issues));
    setErrors({});
    invite.mutate(parsed.data, { onSuccess: () => setEmail('') });
  };

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
      <form onSubmit={send} noValidate className="mt-4 grid gap-3 sm:grid-cols-[2fr_1fr_auto] sm:items-end">
        <TextField label="Invite by e-mail" type="email" value={email} onChange={(e) => setEmail(e.target.value)} error={all.email} />
        <SelectField label="As" value={role} onChange={(e) => setRole(e.target.value as EventRole)} options={EVENT_ROLES.map((r) => ({ value: r, label: EVENT_ROLE_LABELS[r] }))} error={all.role} />
        <Button type="submit" busy={invite.isPending}>
          Send the invitation
        </Button>
      </form>
      {invite.isSuccess ? <Notice tone="ok">Sent. The link works once.</Notice> : null}
    </Panel>
  );
}
