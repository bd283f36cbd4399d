import { useState } from 'react';
import type { EventDetail } from '@shared/schemas/show';
import { EVENT_ACTIONS } from '@shared/event-lifecycle';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { Panel } from '@client/components/ui/panel';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useTakeStep } from '@client/features/shows/api/take-step';
import { useResultsReview } from '../api/get-results-review';
import { useRemoveTieBreak } from '../api/remove-tie-break';
import { ResultRulesForm } from './result-rules-form';
import { ReviewTables } from './results-review';
import { TieOrderForm } from './tie-order-form';
import { ResultsDownloads } from './results-downloads';
import { PublishWarnings } from './publish-warnings';

/** The organiser's results: the rules, the places as they stand, ties to order by hand, publishing, then print and export. */
export function ResultsPanel({ show }: { show: EventDetail }) {
  const review = useResultsReview(show.id);
  const publish = useTakeStep(show.id);
  const remove = useRemoveTieBreak(show.id);
  const [asking, setAsking] = useState(false);
  if (review.isPending) return <Panel title="Results"><LoadingState /></Panel>;
  if (review.error) return <Panel title="Results"><ErrorState error={review.error} /></Panel>;
  const { review: r, tieBreaks, rules, published, warnings } = review.data;
  const classNames = new Map(r.classes.map((c) => [c.classId, c.className]));
  const judging = show.status === 'judging';
  // Places exist once judges score; before that the panel holds the rules only.
  const scoring = judging || published;
  return (
    <Panel
      title="Results"
      actions={
        judging ? (
          <Button type="button" onClick={() => setAsking(true)}>
            Publish results
          </Button>
        ) : null
      }
    >
      <div className="flex flex-col gap-6">
        {!published && judging ? <PublishWarnings warnings={warnings} /> : null}
        {published ? <Notice tone="ok">Published: the places below are on the show’s public page and every entrant has been e-mailed their scores.</Notice> : null}
        {!published && r.ties.length ? (
          <Notice tone="caution">
            {r.ties.length === 1 ? 'One tie is' : `${r.ties.length} ties are`} left shared by the rules. Publish them shared, or put the cars in order below with a reason.
          </Notice>
        ) : null}
        {scoring ? <ReviewTables review={r} /> : <p className="text-graphite">Places appear here once judging starts.</p>}
        {!published && judging
          ? r.ties.map((t) => {
              const label = t.scope === 'best-of-show' ? 'Best of show' : (classNames.get(t.classId ?? 0) ?? 'A class');
              return <TieOrderForm key={`${t.scope}-${t.classId}-${t.place}-${t.numbers.join()}`} eventId={show.id} tie={t} label={label} />;
            })
          : null}
        {tieBreaks.length ? (
          <section aria-label="Ties ordered by hand">
            <h3 className="font-display uppercase">Ties ordered by hand</h3>
            <ul className="divide-y divide-rule">
              {tieBreaks.map((t) => (
                <li key={t.id} className="flex flex-wrap items-center justify-between gap-2 py-1">
                  <span>
                    Cars {t.numbers.join(' before ')}: “{t.reason}” <span className="text-graphite">({t.by})</span>
                  </span>
                  {!published ? (
                    <Button type="button" variant="quiet" busy={remove.isPending} onClick={() => remove.mutate(t.id)}>
                      Remove
                    </Button>
                  ) : null}
                </li>
              ))}
            </ul>
          </section>
        ) : null}
        {published ? <ResultsDownloads eventId={show.id} paper={rules.printPaper} /> : null}
        <section aria-label="How places are decided">
          <h3 className="font-display uppercase">How places are decided</h3>
          <ResultRulesForm key={JSON.stringify(rules)} eventId={show.id} rules={rules} locked={published} />
        </section>
      </div>
      <ConfirmDialog
        open={asking}
        title="Publish results?"
        confirmLabel={warnings.length ? 'Publish anyway' : 'Publish results'}
        danger={false}
        busy={publish.isPending}
        onCancel={() => setAsking(false)}
        onConfirm={() => publish.mutate({ action: 'publish_results', acknowledgeWarnings: warnings.length > 0 }, { onSettled: () => { setAsking(false); void review.refetch(); } })}
      >
        <PublishWarnings warnings={warnings} />
        <p>{EVENT_ACTIONS.publish_results.explains}</p>
        <p>Every entrant is e-mailed their own place and scores{rules.shareCommentsWithEntrants ? ', with the judges’ comments' : ''}. {r.ties.length ? `${r.ties.length} tie${r.ties.length === 1 ? '' : 's'} will be published as shared places.` : ''}</p>
      </ConfirmDialog>
      {publish.isError ? <Notice tone="danger">{publish.error.message}</Notice> : null}
    </Panel>
  );
}
