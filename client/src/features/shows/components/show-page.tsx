import { Link, useParams } from 'react-router-dom';
import { EVENT_ROLE_LABELS, EVENT_STATUS_LABELS } from '@shared/constants';
import { formatMoney } from '@shared/calc/money';
import { spanInZone } from '@shared/calc/time-zone';
import { PageHeader } from '@client/components/ui/page-header';
import { Panel } from '@client/components/ui/panel';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { Notice } from '@client/components/ui/notice';
import { useShow } from '../api/get-show';
import { useUpdateShow } from '../api/update-show';
import { LifecyclePanel } from './lifecycle-panel';
import { ClassesPanel } from './classes-panel';
import { JudgingSheetPanel } from './judging-sheet-panel';
import { PeoplePanel } from './people-panel';
import { EntriesLinkPanel } from './entries-link-panel';
import { GatePanel } from './gate-panel';
import { TodayPanel } from './today-panel';
import { ShowSettingsForm } from './show-settings-form';
import { LogoPanel } from './logo-panel';
import { showTime } from './show-dates';
import { JudgingPanel } from '@client/features/judging/components/judging-panel';
import { PeoplesChoicePanel } from './peoples-choice-panel';
import { ResultsPanel } from '@client/features/results/components/results-panel';

/** One show, as the person's roles in it allow: organisers run everything; judges read the sheet; the gate checks in. */
export function ShowPage() {
  const id = Number(useParams().id);
  const { data, isPending, error, refetch } = useShow(id);
  const update = useUpdateShow(id);
  if (isPending) return <LoadingState />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  const show = data.event;
  const a = show.abilities;
  const onTheDay = show.status === 'show_day' || show.status === 'judging';
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title={show.name}>
        {EVENT_STATUS_LABELS[show.status]} · you are {show.myRoles.map((r) => EVENT_ROLE_LABELS[r].toLowerCase()).join(' and ')} ·{' '}
        <a href={show.publicUrl} className="underline">public page</a>
      </PageHeader>
      {/* The day's work first, so on a phone it is not below the show's details. */}
      {a.manage && onTheDay ? <TodayPanel show={show} /> : null}
      {a.judge ? (
        <Link to={`/judge/${show.id}`} className="flex min-h-14 items-center justify-center border-2 border-ink bg-ink font-display text-xl uppercase text-paper">
          Score your cars
        </Link>
      ) : null}
      {!a.manage && (show.myRoles.includes('gate') || a.checkIn) ? <GatePanel show={show} /> : null}
      <Panel title="The show">
        <p>{spanInZone(show.startsAt, show.endsAt, show.timeZone, 'short')} ({show.timeZone})</p>
        <p>{show.venueName}{show.venueAddress ? `, ${show.venueAddress}` : ''}</p>
        <p>Entries {showTime(show.registrationOpensAt, show.timeZone)} – {showTime(show.registrationClosesAt, show.timeZone)} · fee {show.entryFee === 0 ? 'free' : formatMoney(show.entryFee, show.currency)}</p>
      </Panel>
      <LifecyclePanel show={show} />
      {a.manage && ['show_day', 'judging', 'results_published'].includes(show.status) ? <JudgingPanel show={show} /> : null}
      {a.manage && ['show_day', 'judging', 'results_published', 'archived'].includes(show.status) ? <PeoplesChoicePanel show={show} /> : null}
      {a.manage && show.status !== 'draft' ? <ResultsPanel show={show} /> : null}
      {a.manage && a.checkIn ? <GatePanel show={show} /> : null}
      {a.viewEntries ? <EntriesLinkPanel show={show} /> : null}
      <ClassesPanel show={show} />
      {/* Keyed by the show only: the editor resets itself from the saved sheet, and keeps its "Saved." */}
      <JudgingSheetPanel key={show.id} show={show} />
      {a.manage ? <PeoplePanel show={show} /> : null}
      {a.manage ? <LogoPanel show={show} /> : null}
      {a.manage ? (
        <Panel title="Settings">
          {update.isSuccess ? <Notice tone="ok">Saved.</Notice> : null}
          <ShowSettingsForm key={show.id} show={show} submitLabel="Save settings" busy={update.isPending} onSubmit={(input) => update.mutateAsync(input)} />
        </Panel>
      ) : null}
      <p>
        <Link to="/shows" className="underline">All your shows</Link>
      </p>
    </div>
  );
}
