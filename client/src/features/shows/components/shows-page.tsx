import { Link } from 'react-router-dom';
import { EVENT_ROLE_LABELS, EVENT_STATUS_LABELS } from '@shared/constants';
import { formatMoney } from '@shared/calc/money';
import type { EventSummary } from '@shared/schemas/show';
import { PageHeader } from '@client/components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '@client/components/ui/states';
import { useSession } from '@client/features/session/api/get-session';
import { useMyShows } from '../api/list-my-shows';
import { useOpenShows } from '../api/list-open-shows';
import { showDay } from './show-dates';

const linkButton = 'inline-flex min-h-11 items-center border-2 border-ink px-4 font-display uppercase tracking-wide hover:bg-ink hover:text-paper';

/** What a role has to do in a show right now, in a few words. */
function nextFor(show: EventSummary): string {
  if (show.myRoles.includes('organiser')) {
    if (show.status === 'draft') return 'Finish the settings, classes and judging sheet, then open entries.';
    if (show.status === 'registration_open') return 'Entries are coming in: watch the list and the waiting list.';
    if (show.status === 'registration_closed') return 'Entries are closed: start show day when the gates open.';
    if (show.status === 'show_day') return 'The gate is open: cars are checking in.';
    if (show.status === 'judging') return 'Judges are scoring; publish the results when they are done.';
    return 'The show is over.';
  }
  if (show.myRoles.includes('judge')) return show.status === 'judging' ? 'Judging is open: score your cars.' : show.status === 'results_published' || show.status === 'archived' ? 'The show is over.' : 'Read the judging sheet before the day; scoring opens when judging starts.';
  if (show.myRoles.includes('gate')) {
    if (show.status === 'show_day') return 'The gate is open: check cars in by their number.';
    if (show.status === 'judging') return 'Judging has started: check late arrivals in; they join the judges’ lists.';
    return ['results_published', 'archived'].includes(show.status) ? 'The show is over.' : 'Check-in opens on show day.';
  }
  return '';
}

/** Shows on the field today first, then those to come, then those over: the day's work is at the top. */
const STATUS_ORDER: Record<string, number> = { show_day: 0, judging: 0, registration_closed: 1, registration_open: 1, draft: 2, results_published: 3, archived: 4 };
const byDay = (a: EventSummary, b: EventSummary) => (STATUS_ORDER[a.status] ?? 5) - (STATUS_ORDER[b.status] ?? 5) || a.startsAt.localeCompare(b.startsAt);

/** The card's button: the role's work today where there is some, the show page otherwise. */
function actionFor(show: EventSummary): { to: string; label: string } {
  const onTheDay = show.status === 'show_day' || show.status === 'judging';
  if (onTheDay && show.myRoles.includes('organiser')) return { to: `/shows/${show.id}`, label: 'Today' };
  if (onTheDay && show.myRoles.includes('gate')) return { to: `/gate/${show.id}`, label: 'Check cars in' };
  if (show.status === 'judging' && show.myRoles.includes('judge')) return { to: `/judge/${show.id}`, label: 'Score your cars' };
  return { to: `/shows/${show.id}`, label: 'Open' };
}

export function ShowsPage() {
  const { data: session } = useSession();
  const mine = useMyShows();
  const open = useOpenShows();
  const canCreate = session?.user?.abilities.createEvents;
  return (
    <div className="flex flex-col gap-8">
      <PageHeader title="Shows">Shows you run, judge or work the gate at, and shows taking entries.</PageHeader>
      <section aria-labelledby="mine-heading">
        <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
          <h2 id="mine-heading" className="font-display text-2xl uppercase">Your shows</h2>
          {canCreate ? (
            <Link to="/shows/new" className={linkButton}>
              New show
            </Link>
          ) : null}
        </div>
        {mine.isPending ? <LoadingState /> : mine.isError ? <ErrorState error={mine.error} onRetry={() => void mine.refetch()} /> : mine.data.events.length === 0 ? (
          <EmptyState title="No shows yet">{canCreate ? 'Create one, or accept an invitation from an organiser.' : 'An organiser can invite you to judge or work the gate.'}</EmptyState>
        ) : (
          <ul className="grid gap-3 md:grid-cols-2">
            {[...mine.data.events].sort(byDay).map((s) => (
              <li key={s.id} className="border border-rule bg-white/60 p-4">
                <p className="text-sm uppercase tracking-wide text-signal-ink">{s.myRoles.map((r) => EVENT_ROLE_LABELS[r]).join(' · ')} · {EVENT_STATUS_LABELS[s.status]}</p>
                <h3 className="font-display text-xl uppercase">
                  <Link to={`/shows/${s.id}`} className="hover:text-signal-ink">
                    {s.name}
                  </Link>
                </h3>
                <p className="text-graphite">{showDay(s.startsAt, s.timeZone)} · {s.venueName}</p>
                <p className="mt-2">{nextFor(s)}</p>
                <Link to={actionFor(s).to} className={`${linkButton} mt-3`}>
                  {actionFor(s).label}
                </Link>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section aria-labelledby="open-heading">
        <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
          <h2 id="open-heading" className="font-display text-2xl uppercase">Taking entries</h2>
          <Link to="/entries" className={linkButton}>
            Your entries
          </Link>
        </div>
        <OpenShowList shows={open.data?.events} pending={open.isPending} error={open.error} />
      </section>
    </div>
  );
}

export function OpenShowList({ shows, pending, error }: { shows?: EventSummary[]; pending: boolean; error: unknown }) {
  if (pending) return <LoadingState />;
  if (error) return <ErrorState error={error} />;
  if (!shows?.length) return <EmptyState title="No shows are taking entries">When an organiser opens entries, the show appears here.</EmptyState>;
  return (
    <ul className="grid gap-3 md:grid-cols-2">
      {shows.map((s) => (
        <li key={s.id} className="border border-rule bg-white/60 p-4">
          <h3 className="font-display text-xl uppercase">
            <a href={`/e/${s.slug}`} className="hover:text-signal-ink">
              {s.name}
            </a>
          </h3>
          <p className="text-graphite">{showDay(s.startsAt, s.timeZone)} · {s.venueName}</p>
          <p>Fee {s.entryFee === 0 ? 'free' : formatMoney(s.entryFee, s.currency)} · entries close {showDay(s.registrationClosesAt, s.timeZone)}</p>
          <Link to={`/enter/${s.slug}`} className={`${linkButton} mt-3`}>
            Enter a car
          </Link>
        </li>
      ))}
    </ul>
  );
}
