import { useState, type FormEvent } from 'react';
import { EventCreateSchema, type EventCreateInput, type EventDetail } from '@shared/schemas/show';
import { currencyDecimals, isKnownCurrency, parseMoney } from '@shared/calc/money';
import { instantToWallTime, isValidTimeZone, wallTimeToInstant } from '@shared/calc/time-zone';
import { fieldsFromIssues } from '@shared/errors';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { TextField } from '@client/components/ui/text-field';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { fieldErrors } from './show-dates';

const ZONES: string[] = (Intl as { supportedValuesOf?: (k: string) => string[] }).supportedValuesOf?.('timeZone') ?? [];
const DATE_FIELDS = ['startsAt', 'endsAt', 'registrationOpensAt', 'registrationClosesAt'] as const;

type Draft = Record<string, string>;

function draftFrom(show?: EventDetail): Draft {
  const tz = show?.timeZone ?? Intl.DateTimeFormat().resolvedOptions().timeZone;
  const wall = (iso: string | null | undefined) => (iso ? instantToWallTime(iso, tz) : '');
  const decimals = currencyDecimals(show?.currency ?? 'USD');
  return {
    name: show?.name ?? '',
    slug: show?.slug ?? '',
    venueName: show?.venueName ?? '',
    venueAddress: show?.venueAddress ?? '',
    timeZone: tz,
    startsAt: wall(show?.startsAt),
    endsAt: wall(show?.endsAt),
    registrationOpensAt: wall(show?.registrationOpensAt),
    registrationClosesAt: wall(show?.registrationClosesAt),
    capacity: show?.capacity ? String(show.capacity) : '',
    fee: show ? (show.entryFee / 10 ** decimals).toFixed(decimals) : '0',
    currency: show?.currency ?? 'USD',
    fullRefundUntil: wall(show?.refundRule.fullRefundUntil),
    afterwardsPercent: String(show?.refundRule.afterwardsPercent ?? 0),
    description: show?.description ?? '',
  };
}

/** Turns what was typed (wall times in the show's zone, a fee with decimals) into the API's input, or field errors. */
function toInput(d: Draft): { input?: EventCreateInput; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const zoneOk = isValidTimeZone(d.timeZone!);
  const instant = (field: string, optional = false) => {
    const v = d[field] ?? '';
    if (!v) {
      if (!optional) errors[field] = 'Pick a date and time.';
      return optional ? null : '';
    }
    return zoneOk ? wallTimeToInstant(v, d.timeZone!) : v;
  };
  const currency = d.currency!.trim().toUpperCase();
  const fee = isKnownCurrency(currency) ? parseMoney(d.fee ?? '', currency) : 0;
  if (fee === null) errors.entryFee = `Type the fee as an amount with at most ${currencyDecimals(currency)} decimals.`;
  const raw = {
    name: d.name,
    slug: d.slug,
    venueName: d.venueName,
    venueAddress: d.venueAddress,
    timeZone: d.timeZone,
    ...Object.fromEntries(DATE_FIELDS.map((f) => [f, instant(f)])),
    capacity: d.capacity ? Number(d.capacity) : null,
    entryFee: fee ?? 0,
    currency,
    refundRule: { fullRefundUntil: instant('fullRefundUntil', true), afterwardsPercent: Number(d.afterwardsPercent || 0) },
    description: d.description,
  };
  const parsed = EventCreateSchema.safeParse(raw);
  if (!parsed.success) Object.assign(errors, fieldsFromIssues(parsed.error.issues));
  return Object.keys(errors).length ? { errors } : { input: parsed.data, errors };
}

/** The show's settings, for a new show and for changes; times are typed on the show's own clock. */
export function ShowSettingsForm({ show, submitLabel, busy, serverError, onSubmit }: { show?: EventDetail; submitLabel: string; busy: boolean; serverError: unknown; onSubmit: (input: EventCreateInput) => void }) {
  const [draft, setDraft] = useState<Draft>(() => draftFrom(show));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const all = { ...fieldErrors(serverError), ...errors };
  const err = (f: string) => all[f] ?? all[`refundRule.${f}`];
  const bind = (f: string) => ({ value: draft[f] ?? '', onChange: (e: { target: { value: string } }) => setDraft((d) => ({ ...d, [f]: e.target.value })), error: err(f === 'fee' ? 'entryFee' : f) });

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const { input, errors: found } = toInput(draft);
    setErrors(found);
    if (input) onSubmit(input);
  };

  return (
    <form onSubmit={submit} noValidate className="grid gap-4 md:grid-cols-2">
      <TextField label="Name" {...bind('name')} className="md:col-span-2" />
      <TextField label="Address of the public page" hint="/e/ followed by this: lowercase letters, digits, hyphens." {...bind('slug')} />
      <TextField label="Time zone (IANA name)" hint="All times below are on this clock, e.g. America/Chicago." list="time-zones" {...bind('timeZone')} />
      <datalist id="time-zones">
        {ZONES.map((z) => (
          <option key={z} value={z} />
        ))}
      </datalist>
      <TextField label="Venue" {...bind('venueName')} />
      <TextField label="Venue address" {...bind('venueAddress')} />
      <TextField type="datetime-local" label="Show starts" {...bind('startsAt')} />
      <TextField type="datetime-local" label="Show ends" {...bind('endsAt')} />
      <TextField type="datetime-local" label="Entries open" {...bind('registrationOpensAt')} />
      <TextField type="datetime-local" label="Entries close" hint="Before the show starts." {...bind('registrationClosesAt')} />
      <TextField inputMode="numeric" label="Capacity of the show" hint="Empty for no limit; classes can have their own." {...bind('capacity')} />
      <div className="grid grid-cols-[1fr_7rem] gap-2">
        <TextField inputMode="decimal" label="Entry fee" hint="0 for a free show." {...bind('fee')} />
        <TextField label="Currency" hint="ISO 4217" maxLength={3} {...bind('currency')} />
      </div>
      <TextField type="datetime-local" label="Full refund until" hint="Empty: no full-refund period." {...bind('fullRefundUntil')} />
      <TextField inputMode="numeric" label="Refund after that date (%)" hint="0 for none." {...bind('afterwardsPercent')} />
      <TextAreaField label="Description" rows={5} {...bind('description')} className="md:col-span-2" />
      {serverError && !Object.keys(fieldErrors(serverError)).length ? (
        <div className="md:col-span-2">
          <Notice tone="danger">{(serverError as Error).message}</Notice>
        </div>
      ) : null}
      <div className="md:col-span-2">
        <Button type="submit" busy={busy}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
