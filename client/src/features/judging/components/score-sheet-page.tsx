import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { SHEET_STATE_LABELS } from '@shared/judging/sheet-state';
import { notArrivedReason } from '@shared/judging/arrival';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useJudgeView } from '../api/get-judge-view';
import { carSheet } from '../offline/sheet-merge';
import { deviceId } from '../offline/device';
import { recordNote, recordScore } from '../offline/outbox';
import { useLocalLines } from '../offline/use-local-lines';
import { PointInput } from './point-input';
import { SendStatus } from './send-status';

/** One car's sheet: every line with its points and comment, the car's comment, previous / next in number order. */
export function ScoreSheetPage() {
  const params = useParams();
  const eventId = Number(params.eventId);
  const entryId = Number(params.entryId);
  const { data, error, refetch, isPending } = useJudgeView(eventId);
  const lines = useLocalLines(eventId);
  if (isPending || !lines) return <LoadingState label="Opening the sheet…" />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  const { view } = data;
  const index = view.cars.findIndex((c) => c.entryId === entryId);
  const car = view.cars[index];
  if (!car) {
    const expected = view.expected.find((c) => c.entryId === entryId);
    return <ErrorState error={new Error(expected ? notArrivedReason([expected.number]) : 'This car is not on your list.')} />;
  }
  const sheet = carSheet(view, lines, entryId, { deviceId: deviceId(), fetchedAt: data.fetchedAt });
  const open = view.event.judgingOpen;
  const prev = view.cars[index - 1];
  const next = view.cars[index + 1];

  return (
    <div className="space-y-4" key={entryId}>
      <nav className="flex items-center justify-between gap-2" aria-label="Cars">
        <Link to={`/judge/${eventId}`} className="inline-flex min-h-11 items-center font-display uppercase underline underline-offset-4">
          My cars
        </Link>
        <span className="font-display uppercase text-graphite">{SHEET_STATE_LABELS[sheet.state]}</span>
      </nav>
      <header className="flex gap-3">
        {car.cover ? <img src={car.cover.url} alt="" width={120} height={Math.round((120 * car.cover.height) / car.cover.width)} className="h-auto w-28 shrink-0 border-2 border-ink object-cover" /> : null}
        <div className="min-w-0">
          <p className="font-display text-5xl leading-none tabular-nums">{car.number}</p>
          <h1 className="text-xl font-semibold">{car.title}</h1>
          <p className="text-graphite">{car.className}</p>
        </div>
      </header>
      {car.figures.length ? (
        <dl className="grid grid-cols-2 gap-x-3 gap-y-1 border-y-2 border-rule py-2 text-sm">
          {car.figures.map((f) => (
            <div key={f.label}>
              <dt className="text-graphite">{f.label}</dt>
              <dd className="font-semibold tabular-nums">{f.metric}</dd>
            </div>
          ))}
        </dl>
      ) : null}
      {view.event.closedReason ? <p role="alert" className="border-l-4 border-danger bg-white px-3 py-2 font-semibold">{view.event.closedReason}</p> : null}
      <SendStatus unsent={sheet.unsent} refused={sheet.refused} />
      <ol className="space-y-5">
        {view.criteria.map((c) => {
          const line = sheet.lines[c.id]!;
          return (
            <li key={c.id} className="space-y-2 border-t-2 border-ink pt-3">
              <div className="flex items-baseline justify-between gap-2">
                <h2 className="font-display text-xl uppercase">{c.name}</h2>
                <span className="text-sm text-graphite">
                  0–{c.maxPoints}
                  {line.state === 'pending' ? <strong className="ml-2 text-caution">not sent</strong> : null}
                </span>
              </div>
              {line.state === 'replaced' ? (
                <p role="status" className="border-l-4 border-caution bg-white px-3 py-2 font-semibold">
                  {line.message}
                </p>
              ) : null}
              <PointInput label={c.name} max={c.maxPoints} value={line.points} disabled={!open} onChange={(p) => void recordScore(eventId, entryId, c.id, p, line.comment)} />
              <CommentBox
                label={`Comment on ${c.name.toLowerCase()}`}
                saved={line.comment}
                disabled={!open || line.points === null}
                hint={line.points === null ? 'Give points first, then a comment.' : undefined}
                onSave={(text) => line.points !== null && void recordScore(eventId, entryId, c.id, line.points, text)}
              />
            </li>
          );
        })}
      </ol>
      <div className="border-t-2 border-ink pt-3">
        {sheet.note.state === 'replaced' ? (
          <p role="status" className="mb-2 border-l-4 border-caution bg-white px-3 py-2 font-semibold">
            {sheet.note.message}
          </p>
        ) : null}
        <CommentBox label="Comment on the whole car" saved={sheet.note.comment} disabled={!open} onSave={(text) => void recordNote(eventId, entryId, text)} rows={4} />
      </div>
      <nav className="fixed inset-x-0 bottom-0 flex gap-2 border-t-2 border-ink bg-paper p-2" aria-label="Previous and next car">
        {prev ? (
          <Link to={`/judge/${eventId}/cars/${prev.entryId}`} className="flex min-h-14 flex-1 items-center justify-center border-2 border-ink bg-white font-display text-lg uppercase">
            ← No. {prev.number}
          </Link>
        ) : (
          <span className="flex-1" />
        )}
        {next ? (
          <Link to={`/judge/${eventId}/cars/${next.entryId}`} className="flex min-h-14 flex-1 items-center justify-center border-2 border-ink bg-ink font-display text-lg uppercase text-paper">
            No. {next.number} →
          </Link>
        ) : (
          <Link to={`/judge/${eventId}`} className="flex min-h-14 flex-1 items-center justify-center border-2 border-ink bg-ink font-display text-lg uppercase text-paper">
            All my cars
          </Link>
        )}
      </nav>
    </div>
  );
}

/** A comment saved when the judge leaves the box, so typing never sends a line per letter. */
function CommentBox({ label, saved, onSave, disabled, hint, rows = 2 }: { label: string; saved: string; onSave: (text: string) => void; disabled?: boolean; hint?: string; rows?: number }) {
  const [text, setText] = useState<string | null>(null);
  const value = text ?? saved;
  return (
    <label className="block">
      <span className="text-sm font-semibold">{label}</span>
      <textarea
        rows={rows}
        value={value}
        disabled={disabled}
        onChange={(e) => setText(e.target.value)}
        onBlur={() => {
          if (text !== null && text.trim() !== saved) onSave(text.trim());
          setText(null);
        }}
        className="mt-1 block w-full border-2 border-ink bg-white p-2 text-base disabled:opacity-60"
      />
      {hint ? <span className="text-sm text-graphite">{hint}</span> : null}
    </label>
  );
}
