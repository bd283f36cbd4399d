import { useState } from 'react';
import { Link } from 'react-router-dom';
import { PRINT_PAPERS, PRINT_PAPER_LABELS, type PrintPaper } from '@shared/schemas/results';
import { SelectField } from '@client/components/ui/select-field';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useAwards } from '../api/get-awards';

const linkStyle = 'inline-flex min-h-11 items-center border-2 border-ink px-4 font-display uppercase tracking-wide hover:bg-ink hover:text-paper';

/** After publishing: the results sheet, the certificates (all, or one award) on the paper chosen, and every score as CSV. */
export function ResultsDownloads({ eventId, paper: savedPaper }: { eventId: number; paper: PrintPaper }) {
  const [paper, setPaper] = useState<PrintPaper>(savedPaper);
  const awards = useAwards(eventId, true);
  const base = `/api/events/${eventId}/results`;
  return (
    <section className="flex flex-col gap-3" aria-label="Print and export">
      <h3 className="font-display uppercase">Print and export</h3>
      <SelectField label="Paper" className="max-w-60" value={paper} options={PRINT_PAPERS.map((p) => ({ value: p, label: PRINT_PAPER_LABELS[p] }))} onChange={(e) => setPaper(e.target.value as PrintPaper)} />
      <div className="flex flex-wrap gap-2">
        <a className={linkStyle} href={`${base}/sheet.pdf?paper=${paper}`} download>
          Results sheet (PDF)
        </a>
        <a className={linkStyle} href={`${base}/certificates.pdf?paper=${paper}`} download>
          Every certificate (PDF)
        </a>
        <a className={linkStyle} href={`${base}/scores.csv`} download>
          Every score (CSV)
        </a>
        <Link className={linkStyle} to={`/shows/${eventId}/read-out`}>
          Announcer’s read-out
        </Link>
      </div>
      {awards.isPending ? <LoadingState /> : awards.error ? <ErrorState error={awards.error} /> : (
        <ul className="divide-y divide-rule">
          {awards.data.awards.map((a) => (
            <li key={a.key} className="flex flex-wrap items-center justify-between gap-2 py-1">
              <span>
                <span className="font-semibold">{a.name}</span>: {a.winners.map((w) => `${w.number} ${w.title}`).join(' and ')}
              </span>
              <a className="inline-flex min-h-11 items-center underline" href={`${base}/certificates.pdf?paper=${paper}&award=${encodeURIComponent(a.key)}`} download>
                Certificate{a.winners.length > 1 ? 's' : ''}
              </a>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
