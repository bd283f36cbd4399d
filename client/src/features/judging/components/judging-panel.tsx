import { countOf } from '@shared/words';
import type { EventDetail } from '@shared/schemas/show';
import { Panel } from '@client/components/ui/panel';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useAssignJudge } from '../api/assign-judge';
import { useCloseJudging } from '../api/close-judging';
import { useJudgingProgress } from '../api/get-judging-progress';
import { useJudges } from '../api/list-judges';
import { useReopenJudging } from '../api/reopen-judging';

/** The organiser's judging: each judge's classes, progress per class and per judge, and closing judging. */
export function JudgingPanel({ show }: { show: EventDetail }) {
  const judges = useJudges(show.id);
  const progress = useJudgingProgress(show.id);
  const assign = useAssignJudge(show.id);
  const close = useCloseJudging(show.id);
  const reopen = useReopenJudging(show.id);
  if (judges.isPending || progress.isPending) return <Panel title="Judging"><LoadingState /></Panel>;
  if (judges.error || progress.error) return <Panel title="Judging"><ErrorState error={judges.error ?? progress.error} /></Panel>;
  const p = progress.data.progress;
  const judging = show.status === 'judging';
  return (
    <Panel
      title="Judging"
      actions={
        judging ? (
          <Button variant={p.judgingOpen ? 'danger' : 'secondary'} busy={close.isPending || reopen.isPending} onClick={() => (p.judgingOpen ? close.mutate() : reopen.mutate())}>
            {p.judgingOpen ? 'Close judging' : 'Reopen judging'}
          </Button>
        ) : null
      }
    >
      <div className="space-y-5">
        {judging && !p.judgingOpen ? <Notice tone="caution">Judging is closed: phones can no longer send scores. Reopen it to let judges change their sheets.</Notice> : null}
        {assign.error ? <Notice tone="danger">{assign.error.message}</Notice> : null}
        <section>
          <h3 className="font-display uppercase">Judges and their classes</h3>
          {judges.data.judges.length === 0 ? <p className="text-graphite">Invite judges under People first.</p> : null}
          <ul className="divide-y divide-rule">
            {judges.data.judges.map((j) => (
              <li key={j.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 py-2">
                <span className="min-w-32 font-semibold">{j.name}</span>
                <label className="inline-flex min-h-11 items-center gap-2">
                  <input type="checkbox" className="h-5 w-5" checked={j.allClasses} onChange={(e) => assign.mutate({ judgeId: j.id, input: { allClasses: e.target.checked, classIds: e.target.checked ? [] : show.classes.map((c) => c.id) } })} />
                  Every class
                </label>
                {show.classes.map((c) => {
                  const on = j.allClasses || j.classIds.includes(c.id);
                  const next = on ? j.classIds.filter((id) => id !== c.id) : [...j.classIds, c.id];
                  return (
                    <label key={c.id} className="inline-flex min-h-11 items-center gap-2">
                      <input type="checkbox" className="h-5 w-5" checked={on} disabled={j.allClasses || (on && next.length === 0)} onChange={() => assign.mutate({ judgeId: j.id, input: { allClasses: false, classIds: next } })} />
                      {c.name}
                    </label>
                  );
                })}
              </li>
            ))}
          </ul>
        </section>
        <section>
          <h3 className="font-display uppercase">Finished sheets per class</h3>
          <table className="w-full text-left tabular-nums">
            <thead>
              <tr className="border-b border-ink"><th className="py-1">Class</th><th>Cars</th><th>Cars by finished sheets</th></tr>
            </thead>
            <tbody>
              {p.byClass.map((c) => (
                <tr key={c.classId} className="border-b border-rule">
                  <td className="py-1">{c.name}</td>
                  <td>{c.cars}</td>
                  <td>{c.bySheets.map((b) => `${countOf(b.cars, 'car')} with ${countOf(b.sheets, 'finished sheet')}`).join(' · ') || '–'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
        <section>
          <h3 className="font-display uppercase">What each judge has left</h3>
          <table className="w-full text-left tabular-nums">
            <thead>
              <tr className="border-b border-ink"><th className="py-1">Judge</th><th>Scored</th><th>Partly</th><th>Not yet</th><th>Cars left</th></tr>
            </thead>
            <tbody>
              {p.byJudge.map((j) => (
                <tr key={j.judgeId} className="border-b border-rule">
                  <td className="py-1">{j.name}</td>
                  <td>{j.scored} / {j.cars}</td>
                  <td>{j.partly}</td>
                  <td>{j.notYet}</td>
                  <td>{j.leftNumbers.length ? j.leftNumbers.join(', ') : 'none'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      </div>
    </Panel>
  );
}
