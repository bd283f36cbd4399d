import { useState, type FormEvent } from 'react';
import type { EventDetail } from '@shared/schemas/event';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { Panel } from '@client/components/ui/panel';
import { TextField } from '@client/components/ui/text-field';
import { useCheckIn } from '../api/show-entries';
import { showTime } from './show-dates';

/** The gate: type the number on the card; the answer says at once if it is unpaid or already in. */
export function GatePanel({ show }: { show: EventDetail }) {
  const checkIn = useCheckIn(show.id);
  const [number, setNumber] = useState('');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const n = Number(number);
    if (!Number.isInteger(n) || n < 1) return;
    checkIn.mutate(n, { onSuccess: () => setNumber('') });
  };
  if (!show.abilities.checkIn) {
    return (
      <Panel title="Gate">
        <p>Check-in opens on show day, when the organiser opens the gate. The show starts {showTime(show.startsAt, show.timeZone)} at {show.venueName}.</p>
      </Panel>
    );
  }
  return (
    <Panel title="Gate: check a car in">
      <form onSubmit={submit} className="flex flex-wrap items-end gap-3">
        <TextField label="Entry number" inputMode="numeric" autoFocus value={number} onChange={(e) => setNumber(e.target.value)} className="w-40" />
        <Button type="submit" busy={checkIn.isPending}>
          Check in
        </Button>
      </form>
      {checkIn.isSuccess ? <Notice tone="ok">Number {checkIn.data.entry.number} is checked in.</Notice> : null}
      {checkIn.isError ? <Notice tone="danger">{checkIn.error.message}</Notice> : null}
    </Panel>
  );
}
