import { Link, useParams } from 'react-router-dom';
import { SHEET_STATE_LABELS, type SheetState } from '@shared/judging/sheet-state';
import { EXPECTED_CAR_MARK, EXPECTED_CARS_EXPLAINED, EXPECTED_CARS_HEADING, myCarsSummary } from '@shared/judging/arrival';
import type { ExpectedCar } from '@shared/schemas/judging';
import { ErrorState, LoadingState, EmptyState } from '@client/components/ui/states';
import { useJudgeView } from '../api/get-judge-view';
import { carSheet } from '../offline/sheet-merge';
import { deviceId } from '../offline/device';
import { useLocalLines } from '../offline/use-local-lines';
import { SendStatus } from './send-status';

const stateStyle: Record<SheetState, string> = {
  scored: 'bg-ok text-paper',
  partly: 'bg-caution text-ink',
  not_yet: 'bg-paper text-ink border-2 border-ink',
};

/** My cars: every car that arrived for the judge to score, in number order, each marked scored / partly / not yet; then the cars still expected. */
export function JudgeCarsPage() {
  const eventId = Number(useParams().eventId);
  const { data, error, refetch, isPending } = useJudgeView(eventId);
  const lines = useLocalLines(eventId);
  if (isPending || !lines) return <LoadingState label="Opening your cars…" />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  const { view, fromDevice } = data;
  const sheets = view.cars.map((car) => ({ car, sheet: carSheet(view, lines, car.entryId, { deviceId: deviceId(), fetchedAt: data.fetchedAt }) }));
  const unsent = sheets.reduce((n, s) => n + s.sheet.unsent, 0);
  const refused = [...new Set(sheets.flatMap((s) => s.sheet.refused))];
  return (
    <div className="space-y-4">
      <div>
        <h1 className="font-display text-3xl uppercase">{view.event.name}</h1>
        <p className="text-graphite">
          {myCarsSummary(sheets.filter((s) => s.sheet.state === 'scored').length, sheets.length, view.expected.length)}
          {fromDevice ? ' · shown from this phone’s copy' : ''}
        </p>
      </div>
      {view.event.closedReason ? <p role="alert" className="border-l-4 border-danger bg-white px-3 py-2 font-semibold">{view.event.closedReason}</p> : null}
      <SendStatus unsent={unsent} refused={refused} />
      {sheets.length === 0 && view.expected.length === 0 ? (
        <EmptyState title="No cars yet">The organiser has not given you a class yet.</EmptyState>
      ) : sheets.length === 0 ? null : (
        <ol className="divide-y-2 divide-rule border-y-2 border-ink">
          {sheets.map(({ car, sheet }) => (
            <li key={car.entryId}>
              <Link to={`/judge/${eventId}/cars/${car.entryId}`} className="flex min-h-16 items-center gap-3 px-1 py-2 hover:bg-white">
                <span className="w-14 shrink-0 text-center font-display text-3xl tabular-nums">{car.number}</span>
                <span className="min-w-0 flex-1">
                  <span className="block truncate text-lg font-semibold">{car.title}</span>
                  <span className="block text-sm text-graphite">{car.className}</span>
                </span>
                <span className={`shrink-0 px-2 py-1 font-display text-sm uppercase ${stateStyle[sheet.state]}`}>
                  {SHEET_STATE_LABELS[sheet.state]}
                  {sheet.unsent ? ' · not sent' : ''}
                </span>
              </Link>
            </li>
          ))}
        </ol>
      )}
      <ExpectedCars cars={view.expected} />
    </div>
  );
}

/** The judge's cars that have not arrived: listed so the judge knows they may come, with nothing to open. */
function ExpectedCars({ cars }: { cars: ExpectedCar[] }) {
  if (!cars.length) return null;
  return (
    <section aria-labelledby="expected-cars" className="space-y-2">
      <h2 id="expected-cars" className="font-display text-xl uppercase">{EXPECTED_CARS_HEADING}</h2>
      <p className="text-sm text-graphite">{EXPECTED_CARS_EXPLAINED}</p>
      <ol className="divide-y-2 divide-rule border-y-2 border-rule text-graphite">
        {cars.map((car) => (
          <li key={car.entryId} className="flex min-h-14 items-center gap-3 px-1 py-2">
            <span className="w-14 shrink-0 text-center font-display text-2xl tabular-nums">{car.number}</span>
            <span className="min-w-0 flex-1">
              <span className="block truncate font-semibold">{car.title}</span>
              <span className="block text-sm">{car.className}</span>
            </span>
            <span className="shrink-0 border-2 border-dashed border-graphite px-2 py-1 font-display text-sm uppercase">{EXPECTED_CAR_MARK}</span>
          </li>
        ))}
      </ol>
    </section>
  );
}
