import { useState } from 'react';
import { Button } from '@client/components/ui/button';
import { PageHeader } from '@client/components/ui/page-header';
import { Panel } from '@client/components/ui/panel';
import { EmptyState, ErrorState, LoadingState } from '@client/components/ui/states';
import { useBuilds } from '../api/list-builds';
import { BuildSummaryCard } from './build-summary-card';
import { CreateBuildForm } from './create-build-form';
import { UnitSystemSwitch } from './unit-system-switch';
import { useUnitSystem } from './editor/unit-system';

/** /builds — the owner's builds, and where a new build sheet starts. */
export function MyBuildsPage() {
  const { data, isPending, error, refetch } = useBuilds();
  const [creating, setCreating] = useState(false);
  const [system, setSystem] = useUnitSystem();
  const builds = data?.builds ?? [];
  return (
    <div>
      <PageHeader title="My builds">One build sheet per car: print cards from it, and the QR code opens it on a visitor’s phone.</PageHeader>
      {isPending ? <LoadingState label="Loading your builds…" /> : null}
      {error ? <ErrorState error={error} onRetry={() => void refetch()} /> : null}
      {data && (creating || builds.length === 0) ? (
        builds.length === 0 && !creating ? (
          <EmptyState title="No builds yet">
            <p>Start with a title; engine, chassis, photos and the rest can follow whenever you like.</p>
            <Button className="mt-4" onClick={() => setCreating(true)}>
              New build
            </Button>
          </EmptyState>
        ) : (
          <Panel title="New build" className="mb-6">
            <CreateBuildForm onCancel={() => setCreating(false)} />
          </Panel>
        )
      ) : null}
      {builds.length ? (
        <>
          <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
            {!creating ? <Button onClick={() => setCreating(true)}>New build</Button> : <span />}
            <UnitSystemSwitch system={system} onChange={setSystem} />
          </div>
          <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
            {builds.map((b) => (
              <BuildSummaryCard key={b.id} build={b} system={system} />
            ))}
          </ul>
        </>
      ) : null}
    </div>
  );
}
