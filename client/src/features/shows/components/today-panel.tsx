import { Link } from 'react-router-dom';
import type { EventDetail } from '@shared/schemas/show';
import { arrivalsWords, sheetsWords, todayNextStep, unpaidWords } from '@shared/today';
import { Panel } from '@client/components/ui/panel';
import { useGateCounts } from '@client/features/show-day/api/get-gate-counts';
import { useEntryTable } from '@client/features/show-day/api/list-entry-table';
import { useJudgingProgress } from '@client/features/judging/api/get-judging-progress';

/** The organiser's day in one place: arrivals, unpaid entries, judging progress and the next thing to do. */
export function TodayPanel({ show }: { show: EventDetail }) {
  const counts = useGateCounts(show.id);
  const unpaid = useEntryTable(show.id, { page: 1, pageSize: 25, sort: 'number', dir: 'asc', status: 'awaiting_payment' });
  const judging = show.status === 'judging';
  const progress = useJudgingProgress(show.id);
  const sheets = judging && progress.data ? progress.data.progress.byJudge.reduce((t, j) => ({ done: t.done + j.scored, all: t.all + j.cars }), { done: 0, all: 0 }) : null;
  const arrived = counts.data?.arrived ?? 0;
  const expected = counts.data?.expected ?? 0;
  const unpaidCount = unpaid.data?.total ?? 0;
  const ready = counts.data && unpaid.data && (!judging || sheets);
  return (
    <Panel title="Today">
      <dl className="grid grid-cols-1 gap-3 sm:grid-cols-3">
        <Figure label="Arrivals" value={counts.data ? arrivalsWords(arrived, expected) : '…'} />
        <Figure label="Unpaid" value={unpaid.data ? unpaidWords(unpaidCount) : '…'} />
        <Figure label="Judging" value={judging ? (sheets ? sheetsWords(sheets.done, sheets.all) : '…') : 'Starts when you start judging'} />
      </dl>
      {ready ? (
        <p className="mt-4 border-l-4 border-signal bg-white px-3 py-2 font-semibold" aria-label="Next">
          {todayNextStep({ status: show.status, arrived, expected, unpaid: unpaidCount, sheets })}
        </p>
      ) : null}
      <p className="mt-3 flex flex-wrap gap-4">
        <Link to={`/gate/${show.id}`} className="underline">Check cars in</Link>
        <Link to={`/shows/${show.id}/entries`} className="underline">Entries</Link>
      </p>
    </Panel>
  );
}

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div className="border-2 border-ink bg-white px-3 py-2">
      <dt className="font-display text-sm uppercase text-graphite">{label}</dt>
      <dd className="text-lg font-semibold">{value}</dd>
    </div>
  );
}
