import { useState } from 'react';
import type { CardPrint } from '@shared/schemas/card-print';
import { countOf, formatDateTime } from '@shared/words';
import { Panel } from '@client/components/ui/panel';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { useLatestCardPrint } from '../api/get-latest-card-print';
import { useStartCardPrint } from '../api/start-card-print';
import { useSendReminders } from '../api/send-reminders';

type ClassOption = { id: number; name: string };

function Progress({ print }: { print: CardPrint }) {
  const share = print.total ? Math.round((print.done / print.total) * 100) : 0;
  return (
    <div className="flex flex-col gap-1">
      <div role="progressbar" aria-label="Cards done" aria-valuemin={0} aria-valuemax={print.total} aria-valuenow={print.done} className="h-4 w-full border border-ink bg-white">
        <div className="h-full bg-signal transition-[width]" style={{ width: `${share}%` }} />
      </div>
      {print.stalled ? (
        <p role="alert" className="font-semibold">
          This print stopped at {print.done} of {print.total}: the computer drawing it was lost. Print again to carry on.
        </p>
      ) : null}
      <p className="tabular-nums">
        {print.status === 'queued' ? 'Waiting to start: ' : 'Drawing cards: '}
        {print.done} of {countOf(print.total, 'card')}
      </p>
    </div>
  );
}

function Finished({ print }: { print: CardPrint }) {
  const fromCache = print.total - print.rendered;
  return (
    <div className="flex flex-col gap-2">
      <a href={print.downloadUrl!} download className="inline-flex min-h-11 w-fit items-center border-2 border-ink bg-ink px-4 font-display uppercase tracking-wide text-paper hover:bg-paper hover:text-ink">
        Download the PDF ({countOf(print.total, 'card')})
      </a>
      <p className="text-sm text-graphite">
        Started by {print.startedBy}, ready {formatDateTime(print.finishedAt ?? print.startedAt)}. {countOf(print.rendered, 'card')} drawn
        {fromCache ? `, ${fromCache} unchanged since an earlier print` : ''}.
      </p>
    </div>
  );
}

/**
 * The organiser's bulk print of numbered cards (every confirmed entry, or one class, in number
 * order) and the show reminder that sends each entrant their own card.
 */
export function NumberedCardsPanel({ eventId, classes }: { eventId: number; classes: ClassOption[] }) {
  const [classId, setClassId] = useState<number | null>(null);
  const latest = useLatestCardPrint(eventId, classId);
  const start = useStartCardPrint(eventId);
  const reminders = useSendReminders(eventId);
  const print = latest.data ?? null;
  // A print whose worker was lost (stalled) can be started again: it resumes from the cards already drawn.
  const working = (print?.status === 'queued' || print?.status === 'running') && !print.stalled;

  return (
    <Panel title="Numbered cards" className="mb-4">
      <p className="mb-3 max-w-prose">
        One page for each confirmed entry, in number order: the entry number large, the show and class beside it, the car’s name and its QR code.
      </p>
      <div className="flex flex-wrap items-end gap-3">
        <label className="flex flex-col gap-1">
          <span className="text-sm font-semibold">Cards for</span>
          <select
            aria-label="Cards for"
            value={classId ?? ''}
            onChange={(e) => {
              setClassId(e.target.value ? Number(e.target.value) : null);
              start.reset();
            }}
            className="min-h-11 border border-rule bg-white px-2"
          >
            <option value="">Every class</option>
            {classes.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </select>
        </label>
        <Button busy={start.isPending} disabled={working || latest.isPending} onClick={() => start.mutate(classId)}>
          {print?.status === 'done' ? 'Print numbered cards again' : 'Print numbered cards'}
        </Button>
      </div>
      <div className="mt-3 flex flex-col gap-3" aria-live="polite">
        {start.error ? <Notice tone="caution">{start.error.message}</Notice> : null}
        {print && working ? <Progress print={print} /> : null}
        {print?.status === 'done' ? <Finished print={print} /> : null}
        {print?.status === 'failed' ? <Notice tone="danger">The print stopped: {print.error ?? 'unknown error'}. Start it again.</Notice> : null}
      </div>
      <div className="mt-4 border-t border-rule pt-3">
        <p className="mb-2 max-w-prose">Before the show, send every confirmed entrant a reminder with their own card attached, carrying their class and number. Each entrant gets it once.</p>
        <Button variant="secondary" busy={reminders.isPending} onClick={() => reminders.mutate()}>
          E-mail the reminder with each card
        </Button>
        {reminders.data ? <p className="mt-2">Reminder on its way to {countOf(reminders.data.entrants, 'entrant')}.</p> : null}
        {reminders.error ? <div className="mt-2"><Notice tone="caution">{reminders.error.message}</Notice></div> : null}
      </div>
    </Panel>
  );
}
