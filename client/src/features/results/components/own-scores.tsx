import { useState } from 'react';
import { ordinal } from '@shared/schemas/results';
import { Button } from '@client/components/ui/button';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useOwnResults } from '../api/get-own-results';

function Scores({ entryId }: { entryId: number }) {
  const { data, isPending, error } = useOwnResults(entryId);
  if (isPending) return <LoadingState />;
  if (error) return <ErrorState error={error} />;
  const r = data.results;
  const standing = r.total === null
    ? 'No judge finished a sheet for this car, so it was not placed.'
    : [r.bestOfShow ? 'Best of show' : null, r.place !== null ? `${ordinal(r.place)}${r.shared ? ' (shared)' : ''} in ${r.className}${r.place > r.placesAwarded ? ` (places awarded to ${ordinal(r.placesAwarded)})` : ''}` : null].filter(Boolean).join(' · ') + ` · total ${r.total}`;
  return (
    <div className="flex flex-col gap-2" aria-label="Your scores">
      <p className="font-display text-lg uppercase">{standing}</p>
      {r.sheetsCounted ? (
        <table className="w-full text-left tabular-nums">
          <thead>
            <tr className="border-b border-ink text-sm">
              <th className="py-1">Criterion</th>
              <th className="text-right">Mean</th>
              <th className="pl-4">Each judge’s sheet</th>
            </tr>
          </thead>
          <tbody>
            {r.criteria.map((c) => (
              <tr key={c.name} className="border-b border-rule">
                <td className="py-1">
                  {c.name}
                  {c.weight !== 1 ? <span className="text-graphite"> ×{c.weight}</span> : null}
                </td>
                <td className="whitespace-nowrap text-right font-display">
                  {c.mean} <span className="text-graphite">/ {c.maxPoints}</span>
                </td>
                <td className="pl-4">{c.judges.join(', ')}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {r.comments === null ? <p className="text-graphite">This show keeps the judges’ comments private.</p> : r.comments.length ? (
        <ul className="flex flex-col gap-1">
          {r.comments.map((c, i) => (
            <li key={i}>
              {c.criterion ? <span className="font-semibold">{c.criterion}: </span> : null}“{c.text}”
            </li>
          ))}
        </ul>
      ) : <p className="text-graphite">The judges left no comments.</p>}
    </div>
  );
}

/** An owner's own scores for one car, opened on demand; only offered once the show has published its results. */
export function OwnScores({ entryId }: { entryId: number }) {
  const [open, setOpen] = useState(false);
  return (
    <div className="sm:col-span-3">
      <Button type="button" variant="secondary" aria-expanded={open} onClick={() => setOpen((o) => !o)}>
        {open ? 'Hide your scores' : 'Your scores'}
      </Button>
      {open ? <div className="mt-3"><Scores entryId={entryId} /></div> : null}
    </div>
  );
}
