import type { ResultLine, ResultsReview } from '@shared/schemas/judging';
import { placeWords } from '@shared/schemas/results';
import { countOf } from '@shared/words';

/** One table of places: place, number, car, total (rounded for display), how it was decided. */
export function PlacingsTable({ lines, caption }: { lines: ResultLine[]; caption: string }) {
  return (
    <table className="w-full text-left tabular-nums">
      <caption className="text-left font-display text-lg uppercase">{caption}</caption>
      <thead>
        <tr className="border-b border-ink text-sm">
          <th className="py-1">Place</th>
          <th>No.</th>
          <th>Car</th>
          <th className="text-right">Total</th>
          <th className="hidden pl-4 sm:table-cell">Decided by</th>
        </tr>
      </thead>
      <tbody>
        {lines.map((l) => (
          <tr key={`${l.place}-${l.entryId}`} className={`border-b border-rule ${l.shared ? 'bg-caution/10' : ''}`}>
            <td className="py-2 font-display">{placeWords(l.place, l.shared)}</td>
            <td>{l.number}</td>
            <td>{l.title}</td>
            <td className="text-right font-display">{l.totalShown}</td>
            <td className="hidden pl-4 text-sm text-graphite sm:table-cell">{l.decidedBy === 'score' ? '' : l.decidedBy}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** The results as they stand: best of show, then each class. */
export function ReviewTables({ review }: { review: ResultsReview }) {
  return (
    <div className="flex flex-col gap-4">
      {review.bestOfShow.length ? <PlacingsTable caption="Best of show" lines={review.bestOfShow} /> : null}
      {review.classes.map((c) =>
        c.placings.length ? (
          <PlacingsTable key={c.classId} caption={c.className} lines={c.placings} />
        ) : (
          <p key={c.classId}>
            <span className="font-display text-lg uppercase">{c.className}</span>: no car placed{c.unscored ? `; ${countOf(c.unscored, 'car')} without a finished sheet` : ''}.
          </p>
        ),
      )}
    </div>
  );
}
