import { ASKABLE_PRIVATE_FIELD_WORDS, type AskablePrivateField } from '@shared/constants';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { EntryCreateSchema, type EntryCreateInput } from '@shared/schemas/entry';
import type { PublicEvent } from '@shared/schemas/public-event';
import type { BuildSummary } from '@shared/schemas/build';
import { ApiError } from '@client/lib/api';
import { applyServerErrors } from '@client/lib/form-errors';
import { resolverFor } from '@client/lib/form-resolver';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { SelectField } from '@client/components/ui/select-field';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useBuilds } from '@client/features/builds/api/list-builds';
import { usePublicShow } from '../api/get-public-show';
import { useRegisterEntry } from '../api/register-entry';
import { placesLeftWords, refundRuleWords } from '@shared/entry-terms-words';
import { showTime } from './show-dates';

/** The two choices as picked: option values are text until the schema reads them as ids. */
type EntryValues = { buildId: string; classId: string; shares: string[] | string | boolean };
/** One ticked box alone reads as its value (or true); several as a list: always a list for the schema. */
const sharesOf = (v: EntryValues['shares'], asked: readonly AskablePrivateField[]) => asked.filter((f) => (Array.isArray(v) ? v.includes(f) : v === true || v === f));
const entryResolverFor = (asked: readonly AskablePrivateField[]) =>
  resolverFor(EntryCreateSchema, (v: EntryValues) => ({ buildId: Number(v.buildId), classId: Number(v.classId), shares: sharesOf(v.shares, asked) }));

function EntryForm({ event: e, published }: { event: PublicEvent; published: BuildSummary[] }) {
  const entry = useRegisterEntry(e.id);
  const navigate = useNavigate();
  const [formError, setFormError] = useState('');
  const { register, control, handleSubmit, setError, formState: { errors } } = useForm<EntryValues, unknown, EntryCreateInput>({ resolver: entryResolverFor(e.asksFor), defaultValues: { buildId: '', classId: '', shares: [] } });
  const classId = useWatch({ control, name: 'classId' });
  const submit = handleSubmit((input) => {
    setFormError('');
    entry.mutate(input, {
      onSuccess: () => navigate('/entries'),
      // A show that stopped taking entries names the show (eventId), which is no box of this form: say it on top.
      onError: (err) => setFormError((err instanceof ApiError ? err.fields.eventId : undefined) ?? applyServerErrors(err, setError, ['buildId', 'classId', 'shares'])),
    });
  });
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <SelectField label="Your car" placeholder="Pick a published build" {...register('buildId')} options={published.map((b) => ({ value: String(b.id), label: b.title }))} error={errors.buildId?.message} />
      <SelectField label="Class" placeholder="Pick a class" {...register('classId')} options={e.classes.map((c) => ({ value: String(c.id), label: `${c.name} (${placesLeftWords(c.placesLeft)})` }))} error={errors.classId?.message} hint={e.classes.find((c) => String(c.id) === classId)?.description} />
      {e.asksFor.length ? (
        <fieldset>
          <legend className="text-sm font-semibold">This show asks for more than your name, e-mail and phone</legend>
          <p className="text-sm text-graphite">Only the show’s organisers see what you share, and only for this entry.</p>
          {e.asksFor.map((field) => (
            <label key={field} className="mt-2 flex min-h-11 items-center gap-2">
              <input type="checkbox" className="h-5 w-5 accent-ink" value={field} {...register('shares')} />
              Share my {ASKABLE_PRIVATE_FIELD_WORDS[field]} with the organisers
            </label>
          ))}
          {errors.shares?.message ? <p role="alert" className="mt-1 text-sm text-danger">{errors.shares.message}</p> : null}
        </fieldset>
      ) : null}
      <p className="text-graphite">
        {e.entryFee > 0 ? `The entry gets its number at once and is confirmed when the fee of ${e.feeText} is paid.` : 'The show is free: the entry is confirmed at once.'} If the class or the show is full, the entry goes on the waiting list and you get an e-mail when a place frees.
      </p>
      <p>
        <strong>Refunds:</strong> {refundRuleWords(e.refundRule, e.timeZone, e.entryFee)}
      </p>
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      <div>
        <Button type="submit" busy={entry.isPending} disabled={!e.takingEntries}>
          Enter the car
        </Button>
      </div>
    </form>
  );
}

/** An owner enters one of their published builds in a class of an open show. */
export function EnterShowPage() {
  const slug = useParams().slug ?? '';
  const show = usePublicShow(slug);
  const builds = useBuilds();
  if (show.isPending || builds.isPending) return <LoadingState />;
  if (show.error) return <ErrorState error={show.error} />;
  if (builds.error) return <ErrorState error={builds.error} />;
  const e = show.data.event;
  const published = builds.data.builds.filter((b) => b.published);

  return (
    <div className="max-w-2xl">
      <PageHeader title={`Enter ${e.name}`}>
        {showTime(e.startsAt, e.timeZone)} · {e.venueName} · fee {e.feeText}
      </PageHeader>
      {!e.takingEntries ? <Notice tone="caution">This show is not taking entries now.</Notice> : null}
      {published.length === 0 ? (
        <Notice tone="caution">
          Only a published build sheet can be entered. <Link to="/builds" className="underline">Publish one of your builds</Link> first.
        </Notice>
      ) : (
        <EntryForm event={e} published={published} />
      )}
    </div>
  );
}
