import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { EntryCreateSchema } from '@shared/schemas/entry';
import { fieldsFromIssues } from '@shared/errors';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { SelectField } from '@client/components/ui/select-field';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useBuilds } from '@client/features/builds/api/list-builds';
import { usePublicShow } from '../api/get-public-show';
import { useRegisterEntry } from '../api/register-entry';
import { fieldErrors, showTime } from './show-dates';

/** An owner enters one of their published builds in a class of an open show. */
export function EnterShowPage() {
  const slug = useParams().slug ?? '';
  const show = usePublicShow(slug);
  const builds = useBuilds();
  const register = useRegisterEntry(show.data?.event.id ?? 0);
  const navigate = useNavigate();
  const [buildId, setBuildId] = useState('');
  const [classId, setClassId] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  if (show.isPending || builds.isPending) return <LoadingState />;
  if (show.error) return <ErrorState error={show.error} />;
  if (builds.error) return <ErrorState error={builds.error} />;
  const e = show.data.event;
  const published = builds.data.builds.filter((b) => b.published);
  const all = { ...fieldErrors(register.error), ...errors };

  const submit = (ev: FormEvent) => {
    ev.preventDefault();
    const parsed = EntryCreateSchema.safeParse({ buildId: Number(buildId), classId: Number(classId) });
    if (!parsed.success) return setErrors(fieldsFromIssues(parsed.error.issues));
    setErrors({});
    register.mutate(parsed.data, { onSuccess: () => navigate('/entries') });
  };

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
        <form onSubmit={submit} noValidate className="flex flex-col gap-4">
          <SelectField label="Your car" placeholder="Pick a published build" value={buildId} onChange={(x) => setBuildId(x.target.value)} options={published.map((b) => ({ value: String(b.id), label: b.title }))} error={all.buildId} />
          <SelectField label="Class" placeholder="Pick a class" value={classId} onChange={(x) => setClassId(x.target.value)} options={e.classes.map((c) => ({ value: String(c.id), label: c.name }))} error={all.classId} hint={e.classes.find((c) => String(c.id) === classId)?.description} />
          <p className="text-graphite">
            {e.entryFee > 0 ? `The entry gets its number at once and is confirmed when the fee of ${e.feeText} is paid.` : 'The show is free: the entry is confirmed at once.'} If the class or the show is full, the entry goes on the waiting list and you get an e-mail when a place frees.
          </p>
          {register.isError && !Object.keys(fieldErrors(register.error)).length ? <Notice tone="danger">{register.error.message}</Notice> : null}
          {register.isError && fieldErrors(register.error).eventId ? <Notice tone="danger">{fieldErrors(register.error).eventId}</Notice> : null}
          <div>
            <Button type="submit" busy={register.isPending} disabled={!e.takingEntries}>
              Enter the car
            </Button>
          </div>
        </form>
      )}
    </div>
  );
}
