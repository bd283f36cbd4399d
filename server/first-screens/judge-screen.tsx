import { renderToStaticMarkup } from 'react-dom/server';
import type { JudgeView } from '@shared/schemas/judging';
import { SHEET_STATE_LABELS, sheetState } from '@shared/judging/sheet-state';
import { EXPECTED_CAR_MARK, EXPECTED_CARS_HEADING, myCarsSummary } from '@shared/judging/arrival';

/** Shown when a car is opened before the app's code has arrived: the app opens it on arrival. */
export const OPENING_CAR_SOON = 'Opening that car as soon as your cars have finished loading…';

/**
 * A judge's cars as the server draws them on a cold first load, before the app's code arrives (seconds on one
 * bar): the show, how many are scored, each car with its state as the server holds it, then the cars still
 * expected. A car tapped now is opened by the app when it takes over (early-script.ts holds the link). Same words
 * and order as judge-cars-page.tsx; a phone whose worker keeps the app never sees this (its app opens at once).
 */
export function judgeScreenHtml(view: JudgeView): string {
  const states = view.cars.map((car) => sheetState(view.criteria.filter((c) => view.scores.some((s) => s.entryId === car.entryId && s.criterionId === c.id)).length, view.criteria.length));
  return renderToStaticMarkup(
    <div data-early-path={`/judge/${view.event.id}`} className="early">
      <h1>{view.event.name}</h1>
      <p>{myCarsSummary(states.filter((s) => s === 'scored').length, view.cars.length, view.expected.length)}</p>
      {view.event.closedReason ? <p role="alert">{view.event.closedReason}</p> : null}
      <p data-early-note="" role="status" hidden>{OPENING_CAR_SOON}</p>
      {view.cars.length ? (
        <ol className="early-list">
          {view.cars.map((car, i) => (
            <li key={car.entryId}>
              <a href={`/judge/${view.event.id}/cars/${car.entryId}`}>
                <b>{car.number}</b> {car.title} · {car.className} · {SHEET_STATE_LABELS[states[i]!]}
              </a>
            </li>
          ))}
        </ol>
      ) : null}
      {view.expected.length ? (
        <>
          <h2>{EXPECTED_CARS_HEADING}</h2>
          <ol className="early-list">
            {view.expected.map((car) => (
              <li key={car.entryId}>
                <b>{car.number}</b> {car.title} · {car.className} · {EXPECTED_CAR_MARK}
              </li>
            ))}
          </ol>
        </>
      ) : null}
    </div>,
  );
}
