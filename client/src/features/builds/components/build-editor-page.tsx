import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { ApiError } from '@client/lib/api';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { Notice } from '@client/components/ui/notice';
import type { OwnerBuild } from '@shared/schemas/build';
import { useBuild } from '../api/get-build';
import { EditorContext, createEditorStores, type Editor } from './editor/editor-stores';
import { EditorHeader } from './editor/editor-header';
import { SectionNav } from './editor/section-nav';
import { UnsavedGuard } from './editor/unsaved-guard';
import { NumbersProvider } from './numbers/numbers-context';
import { NumbersPanel } from './numbers/numbers-panel';
import { OverviewForm } from './sections/overview-form';
import { EngineForm } from './sections/engine-form';
import { DrivetrainForm } from './sections/drivetrain-form';
import { ChassisForm } from './sections/chassis-form';
import { BrakesForm } from './sections/brakes-form';
import { WheelsForm } from './sections/wheels-form';
import { BodyForm } from './sections/body-form';
import { ExtraForm } from './sections/extra-form';
import { CreditsForm } from './sections/credits-form';
import { PrivateForm } from './sections/private-form';
import { PhotosPanel } from './photos/photos-panel';
import { DynoPanel } from './records/dyno-panel';
import { WeighInsPanel } from './records/weigh-ins-panel';
import { HistoryPanel } from './records/history-list';
import { LogPanel } from './log/log-panel';
import { QuestionsPanel } from './questions/questions-panel';

function Editor({ build }: { build: OwnerBuild }) {
  const [stores] = useState(createEditorStores);
  const editor: Editor = { build, ...stores };
  return (
    <EditorContext.Provider value={editor}>
      <NumbersProvider>
        <UnsavedGuard />
        <EditorHeader build={build} />
        <div className="grid gap-4 lg:grid-cols-[10rem_minmax(0,1fr)_18rem]">
          <SectionNav />
          <div className="flex min-w-0 flex-col gap-6">
            <OverviewForm build={build} />
            <EngineForm build={build} />
            <DrivetrainForm build={build} />
            <ChassisForm build={build} />
            <BrakesForm build={build} />
            <WheelsForm build={build} />
            <BodyForm build={build} />
            <ExtraForm build={build} />
            <CreditsForm build={build} />
            <PhotosPanel build={build} />
            <DynoPanel build={build} />
            <WeighInsPanel build={build} />
            <LogPanel build={build} />
            <QuestionsPanel build={build} />
            <HistoryPanel build={build} />
            <PrivateForm build={build} />
          </div>
          <aside className="hidden lg:block">
            <div className="sticky top-4 max-h-[calc(100vh-2rem)] overflow-y-auto">
              <NumbersPanel />
            </div>
          </aside>
        </div>
      </NumbersProvider>
    </EditorContext.Provider>
  );
}

function NoSuchBuild({ children }: { children: string }) {
  return (
    <div className="flex flex-col items-start gap-3">
      <Notice tone="danger">{children}</Notice>
      <Link to="/builds" className="inline-flex min-h-11 items-center underline underline-offset-4 hover:text-signal-ink">
        ← Back to My builds
      </Link>
    </div>
  );
}

/** /builds/:id — the build editor: one form per section, each saved by itself as the owner types, and the live numbers. */
export function BuildEditorPage() {
  const id = Number(useParams().id);
  // Checked before any request: /builds/abc must not ask the server for /api/builds/NaN.
  if (!Number.isInteger(id) || id <= 0) return <NoSuchBuild>That is not a build’s address.</NoSuchBuild>;
  return <LoadedEditor id={id} />;
}

function LoadedEditor({ id }: { id: number }) {
  const { data, isPending, error, refetch } = useBuild(id);
  if (isPending) return <LoadingState label="Loading the build sheet…" />;
  if (error) {
    if (error instanceof ApiError && (error.status === 404 || error.status === 403)) return <NoSuchBuild>No build of yours at this address. It may have been deleted.</NoSuchBuild>;
    return <ErrorState error={error} onRetry={() => void refetch()} />;
  }
  return <Editor build={data.build} />;
}

export default BuildEditorPage;
