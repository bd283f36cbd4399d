import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { BUILD_STYLE_LABELS, type OwnerBuild } from '@shared/schemas/build';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { useSetPublished } from '../../api/set-published';
import { useDeleteBuild, useForgetBuild } from '../../api/delete-build';
import { useEditor } from './editor-stores';
import { useUnitSystem } from './unit-system';

const linkClass = 'inline-flex min-h-11 items-center border-2 border-ink px-4 font-display uppercase tracking-wide hover:bg-ink hover:text-paper';

export function EditorHeader({ build }: { build: OwnerBuild }) {
  const { dirty } = useEditor();
  const [system] = useUnitSystem();
  const navigate = useNavigate();
  const publish = useSetPublished(build.id);
  const remove = useDeleteBuild(build.id);
  const forget = useForgetBuild();
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState('');
  const { overview } = build;
  const subtitle = [overview.modelYear, overview.style ? BUILD_STYLE_LABELS[overview.style] : null].filter(Boolean).join(' · ');

  return (
    <div className="mb-6 border-b border-rule pb-4">
      <p className="text-sm">
        <Link to="/builds" className="inline-flex min-h-11 items-center underline underline-offset-4 hover:text-signal-ink">
          ← My builds
        </Link>
      </p>
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="min-w-0">
          <h1 className="font-display text-3xl font-semibold uppercase tracking-wide break-words sm:text-4xl">{overview.title}</h1>
          <p className="text-graphite">
            {subtitle ? `${subtitle} · ` : ''}
            <span className={`font-display uppercase ${build.published ? 'text-ok' : 'text-caution'}`}>{build.published ? 'Published' : 'Draft'}</span> · code <span className="font-display tracking-widest">{build.code}</span>
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          {build.abilities.publish ? (
            <Button type="button" variant={build.published ? 'secondary' : 'primary'} busy={publish.isPending} onClick={() => publish.mutate(!build.published, { onError: (err) => setError(err.message) })}>
              {build.published ? 'Unpublish' : 'Publish'}
            </Button>
          ) : null}
          {/* A draft's public address answers "not found" until it is published: the owner previews it through their own session. */}
          <a href={`${build.published ? build.publicUrl : `/api/builds/${build.id}/preview`}?units=${system}`} target="_blank" rel="noopener" className={linkClass}>
            {build.published ? 'Open public page ↗' : 'Preview public page ↗'}
          </a>
          <Link to={`/builds/${build.id}/card`} className={linkClass}>
            Print a card
          </Link>
          {build.abilities.delete ? (
            <Button type="button" variant="danger" onClick={() => setConfirming(true)}>
              Delete build
            </Button>
          ) : null}
        </div>
      </div>
      <p className="mt-2 text-sm text-graphite">
        {build.published ? 'Published: anyone with the QR code or the link sees the public page.' : 'Draft: the public page and the QR code work only once you publish.'} Private details never appear there.
      </p>
      {error ? <Notice tone="danger">{error}</Notice> : null}
      <ConfirmDialog
        open={confirming}
        title="Delete this build?"
        confirmLabel="Delete for good"
        typeToConfirm={overview.title}
        busy={remove.isPending}
        onCancel={() => setConfirming(false)}
        onConfirm={() =>
          remove.mutate(undefined, {
            onSuccess: () => {
              for (const [key] of dirty.entries()) dirty.set(key, undefined);
              void Promise.resolve(navigate('/builds', { replace: true })).then(() => forget(build.id));
            },
            onError: (err) => {
              setConfirming(false);
              setError(err.message);
            },
          })
        }
      >
        The build sheet, its photos, dyno runs and weigh-ins go for good, and its QR code stops working. Printed cards will point nowhere.
      </ConfirmDialog>
    </div>
  );
}
