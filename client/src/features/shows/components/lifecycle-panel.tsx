import { useState } from 'react';
import { EVENT_STATUS_LABELS, EVENT_STATUSES } from '@shared/constants';
import { EVENT_ACTIONS, actionsFrom, type EventAction } from '@shared/event-lifecycle';
import type { EventDetail } from '@shared/schemas/show';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { Panel } from '@client/components/ui/panel';
import { useQuery } from '@tanstack/react-query';
import { useTakeStep } from '../api/take-step';
import { resultsReviewQueryOptions } from '@client/features/results/api/get-results-review';
import { PublishWarnings } from '@client/features/results/components/publish-warnings';

/** Where the show is in its life, and the next steps, each explained and confirmed before it happens. */
export function LifecyclePanel({ show }: { show: EventDetail }) {
  const step = useTakeStep(show.id);
  const [asking, setAsking] = useState<EventAction | null>(null);
  const here = EVENT_STATUSES.indexOf(show.status);
  // Publishing shows the review's warnings here too, and says "publish anyway" only after showing them.
  const review = useQuery({ ...resultsReviewQueryOptions(show.id), enabled: show.abilities.manage && show.status === 'judging' });
  const warnings = review.data?.warnings ?? [];
  return (
    <Panel title="Where the show is">
      <ol className="flex flex-wrap gap-x-1 gap-y-2 text-sm" aria-label="Steps of the show">
        {EVENT_STATUSES.map((s, i) => (
          <li key={s} aria-current={s === show.status ? 'step' : undefined} className={`border px-2 py-1 ${s === show.status ? 'border-ink bg-ink text-paper' : i < here ? 'border-rule text-graphite line-through' : 'border-rule'}`}>
            {EVENT_STATUS_LABELS[s]}
          </li>
        ))}
      </ol>
      {show.abilities.manage ? (
        <div className="mt-4 flex flex-col gap-3">
          {actionsFrom(show.status).map((a) => (
            <div key={a} className="flex flex-wrap items-center gap-3">
              <Button type="button" variant={a === 'reopen_registration' ? 'secondary' : 'primary'} onClick={() => setAsking(a)}>
                {EVENT_ACTIONS[a].label}
              </Button>
              <p className="text-graphite">{EVENT_ACTIONS[a].explains}</p>
            </div>
          ))}
          {step.isError ? <Notice tone="danger">{step.error.message}</Notice> : null}
        </div>
      ) : null}
      <ConfirmDialog
        open={asking !== null}
        title={asking ? `${EVENT_ACTIONS[asking].label}?` : ''}
        confirmLabel={asking ? EVENT_ACTIONS[asking].label : 'Go'}
        danger={asking === 'archive'}
        busy={step.isPending}
        onCancel={() => setAsking(null)}
        onConfirm={() => asking && step.mutate({ action: asking, acknowledgeWarnings: asking === 'publish_results' && warnings.length > 0 }, { onSettled: () => setAsking(null) })}
      >
        {asking ? <p>{EVENT_ACTIONS[asking].explains}</p> : null}
        {asking === 'publish_results' ? <PublishWarnings warnings={warnings} /> : null}
      </ConfirmDialog>
    </Panel>
  );
}
