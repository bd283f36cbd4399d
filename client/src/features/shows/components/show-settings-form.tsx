import { ASKABLE_PRIVATE_FIELD_LABELS, ASKABLE_PRIVATE_FIELDS, type AskablePrivateField } from '@shared/constants';
import { useState } from 'react';
import { useForm, type FieldErrors, type Resolver } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { EventCreateSchema, type EventCreateInput, type EventDetail } from '@shared/schemas/show';
import { currencyDecimals, isKnownCurrency, parseMoney } from '@shared/calc/money';
import { instantToWallTime, isValidTimeZone, wallTimeToInstant } from '@shared/calc/time-zone';
import { applyServerErrors } from '@client/lib/form-errors';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { TextField } from '@client/components/ui/text-field';
import { TextAreaField } from '@client/components/ui/text-area-field';

const ZONES: string[] = (Intl as { supportedValuesOf?: (k: string) => string[] }).supportedValuesOf?.('timeZone') ?? [];
const DATE_FIELDS = ['startsAt', 'endsAt', 'registrationOpensAt', 'registrationClosesAt'] as const;

/**
 * The boxes as typed, named as the schema's fields so that its errors (and the server's) land under
 * them: times are wall times on the show's clock, the fee has decimals, numbers are text.
 */
type SettingsValues = {
  name: string;
  slug: string;
  venueName: string;
  venueAddress: string;
  timeZone: string;
  startsAt: string;
  endsAt: string;
  registrationOpensAt: string;
  registrationClosesAt: string;
  capacity: string;
  entryFee: string;
  currency: string;
  refundRule: { fullRefundUntil: string; afterwardsPercent: string };
  description: string;
  asksFor: AskablePrivateField[];
};
const FIELD_NAMES = ['name', 'slug', 'venueName', 'venueAddress', 'timeZone', ...DATE_FIELDS, 'capacity', 'entryFee', 'currency', 'refundRule.fullRefundUntil', 'refundRule.afterwardsPercent', 'description', 'asksFor'] as const;

function valuesFrom(show?: EventDetail): SettingsValues {
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
    entryFee: show ? (show.entryFee / 10 ** decimals).toFixed(decimals) : '0',
    currency: show?.currency ?? 'USD',
    refundRule: { fullRefundUntil: wall(show?.refundRule.fullRefundUntil), afterwardsPercent: String(show?.refundRule.afterwardsPercent ?? 0) },
    description: show?.description ?? '',
    asksFor: show?.asksFor ?? [],
  };
}

/**
 * What was typed → the API's input (wall times to instants in the show's zone, the fee to minor units),
 * with the problems only the conversion can see: an empty date, a fee that is not an amount.
 */
function toInput(v: SettingsValues): { input: Record<string, unknown>; problems: Partial<Record<keyof SettingsValues, string>> } {
  const problems: Partial<Record<keyof SettingsValues, string>> = {};
  const zoneOk = isValidTimeZone(v.timeZone);
  const instant = (wall: string) => (zoneOk ? wallTimeToInstant(wall, v.timeZone) : wall);
  for (const field of DATE_FIELDS) if (!v[field]) problems[field] = 'Pick a date and time.';
  const currency = v.currency.trim().toUpperCase();
  const fee = isKnownCurrency(currency) ? parseMoney(v.entryFee, currency) : 0;
  if (fee === null) problems.entryFee = `Type the fee as an amount with at most ${currencyDecimals(currency)} decimals.`;
  const input = {
    name: v.name,
    slug: v.slug,
    venueName: v.venueName,
    venueAddress: v.venueAddress,
    timeZone: v.timeZone,
    ...Object.fromEntries(DATE_FIELDS.map((f) => [f, v[f] ? instant(v[f]) : ''])),
    capacity: v.capacity ? Number(v.capacity) : null,
    entryFee: fee ?? 0,
    currency,
    refundRule: { fullRefundUntil: v.refundRule.fullRefundUntil ? instant(v.refundRule.fullRefundUntil) : null, afterwardsPercent: Number(v.refundRule.afterwardsPercent || 0) },
    description: v.description,
    asksFor: Array.isArray(v.asksFor) ? v.asksFor : [],
  };
  return { input, problems };
}

const checkInput = zodResolver(EventCreateSchema as never) as unknown as Resolver<SettingsValues, unknown, EventCreateInput>;

/** The shared schema checks the converted input; the conversion's own problems win on their fields. */
const settingsResolver: Resolver<SettingsValues, unknown, EventCreateInput> = async (values, context, options) => {
  const { input, problems } = toInput(values);
  const checked = await checkInput(input as unknown as SettingsValues, context, options);
  if (!Object.keys(problems).length) return checked;
  const errors: FieldErrors<SettingsValues> = { ...checked.errors };
  for (const [field, message] of Object.entries(problems)) errors[field as keyof SettingsValues] = { type: 'conversion', message } as never;
  return { values: {}, errors };
};

/** The show's settings, for a new show and for changes; times are typed on the show's own clock. */
export function ShowSettingsForm({ show, submitLabel, busy, onSubmit }: { show?: EventDetail; submitLabel: string; busy: boolean; onSubmit: (input: EventCreateInput) => Promise<unknown> }) {
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState: { errors } } = useForm<SettingsValues, unknown, EventCreateInput>({ resolver: settingsResolver, defaultValues: valuesFrom(show) });
  const submit = handleSubmit(async (input) => {
    setFormError('');
    await onSubmit(input).catch((err: unknown) => setFormError(applyServerErrors(err, setError, FIELD_NAMES)));
  });

  return (
    <form onSubmit={submit} noValidate className="grid gap-4 md:grid-cols-2">
      <TextField label="Name" {...register('name')} error={errors.name?.message} className="md:col-span-2" />
      <TextField label="Address of the public page" hint="/e/ followed by this: lowercase letters, digits, hyphens." {...register('slug')} error={errors.slug?.message} />
      <TextField label="Time zone (IANA name)" hint="All times below are on this clock, e.g. America/Chicago." list="time-zones" {...register('timeZone')} error={errors.timeZone?.message} />
      <datalist id="time-zones">
        {ZONES.map((z) => (
          <option key={z} value={z} />
        ))}
      </datalist>
      <TextField label="Venue" {...register('venueName')} error={errors.venueName?.message} />
      <TextField label="Venue address" {...register('venueAddress')} error={errors.venueAddress?.message} />
      <TextField type="datetime-local" label="Show starts" {...register('startsAt')} error={errors.startsAt?.message} />
      <TextField type="datetime-local" label="Show ends" {...register('endsAt')} error={errors.endsAt?.message} />
      <TextField type="datetime-local" label="Entries open" {...register('registrationOpensAt')} error={errors.registrationOpensAt?.message} />
      <TextField type="datetime-local" label="Entries close" hint="Before the show starts." {...register('registrationClosesAt')} error={errors.registrationClosesAt?.message} />
      <TextField inputMode="numeric" label="Capacity of the show" hint="Empty for no limit; classes can have their own." {...register('capacity')} error={errors.capacity?.message} />
      <div className="grid grid-cols-[1fr_7rem] gap-2">
        <TextField inputMode="decimal" label="Entry fee" hint="0 for a free show." {...register('entryFee')} error={errors.entryFee?.message} />
        <TextField label="Currency" hint="ISO 4217" maxLength={3} {...register('currency')} error={errors.currency?.message} />
      </div>
      <TextField type="datetime-local" label="Full refund until" hint="Empty: no full-refund period." {...register('refundRule.fullRefundUntil')} error={errors.refundRule?.fullRefundUntil?.message} />
      <TextField inputMode="numeric" label="Refund after that date (%)" hint="0 for none." {...register('refundRule.afterwardsPercent')} error={errors.refundRule?.afterwardsPercent?.message} />
      <TextAreaField label="Description" rows={5} {...register('description')} error={errors.description?.message} className="md:col-span-2" />
      <fieldset className="md:col-span-2">
        <legend className="text-sm font-semibold">Also ask entrants for</legend>
        <p className="text-sm text-graphite">You always see each entrant’s name, e-mail and phone. Tick what the show needs beyond that (an insurer may want plates); entrants agree to share it when they enter, and only the show’s organisers see it.</p>
        <div className="mt-2 flex flex-wrap gap-4">
          {ASKABLE_PRIVATE_FIELDS.map((field) => (
            <label key={field} className="flex min-h-11 items-center gap-2">
              <input type="checkbox" className="h-5 w-5 accent-ink" value={field} {...register('asksFor')} />
              {ASKABLE_PRIVATE_FIELD_LABELS[field]}
            </label>
          ))}
        </div>
        {errors.asksFor?.message ? <p role="alert" className="mt-1 text-sm text-danger">{errors.asksFor.message}</p> : null}
      </fieldset>
      {formError ? (
        <div className="md:col-span-2">
          <Notice tone="danger">{formError}</Notice>
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
