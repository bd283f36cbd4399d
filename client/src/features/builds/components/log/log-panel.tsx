import { useState } from 'react';
import type { OwnerBuild } from '@shared/schemas/build';
import type { OwnLogPost } from '@shared/schemas/build-log';
import { countOf } from '@shared/words';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { LightText } from '@client/components/ui/light-text';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useLogPosts } from '../../api/list-log-posts';
import { useDeleteLogPost } from '../../api/delete-log-post';
import { EditorSection } from '../editor/section-form';
import { LogPostForm } from './log-post-form';

/** The build log in the editor: posts newest first by their date, drafts marked, each editable. */
export function LogPanel({ build }: { build: OwnerBuild }) {
  const posts = useLogPosts(build.id);
  const remove = useDeleteLogPost(build.id);
  // null: no form open; 'new': writing a post; a post: editing it.
  const [editing, setEditing] = useState<OwnLogPost | 'new' | null>(null);
  const [deleting, setDeleting] = useState<OwnLogPost | null>(null);
  const [error, setError] = useState('');
  const list = posts.data?.posts ?? [];
  const published = list.filter((p) => p.status === 'published').length;
  return (
    <EditorSection id="log" title="Build log">
      <div className="flex flex-col gap-4">
        <p className="text-sm text-graphite">
          Dated posts on the build over time. The newest published ones show on the build page; all of them on its log page and in its feed.
          {list.length ? ` ${countOf(published, 'post')} published, ${countOf(list.length - published, 'draft')}.` : ''}
        </p>
        {error ? <Notice tone="danger">{error}</Notice> : null}
        {posts.isPending ? <LoadingState label="Loading the log…" /> : posts.error ? <ErrorState error={posts.error} onRetry={() => void posts.refetch()} /> : null}
        {editing === 'new' ? <LogPostForm build={build} post={null} onDone={() => setEditing(null)} /> : (
          <div>
            <Button type="button" variant="secondary" onClick={() => setEditing('new')}>
              Write a post
            </Button>
          </div>
        )}
        <ol className="flex flex-col gap-3">
          {list.map((p) =>
            editing !== 'new' && editing?.id === p.id ? (
              <li key={p.id}>
                <LogPostForm build={build} post={p} onDone={() => setEditing(null)} />
              </li>
            ) : (
              <li key={p.id} className="border border-rule p-3">
                <p className="text-sm text-graphite">
                  <time dateTime={p.postedOn}>{p.postedOn}</time> · {p.status === 'draft' ? <strong className="text-caution">Draft</strong> : 'Published'}
                  {p.photoIds.length ? ` · ${countOf(p.photoIds.length, 'photo')}` : ''}
                </p>
                <h3 className="font-display uppercase">{p.title}</h3>
                <LightText text={p.body} className="line-clamp-4 text-sm" />
                <div className="mt-2 flex flex-wrap gap-2">
                  <Button type="button" variant="secondary" onClick={() => setEditing(p)} aria-label={`Edit ${p.title}`}>
                    Edit
                  </Button>
                  <Button type="button" variant="quiet" onClick={() => setDeleting(p)} aria-label={`Delete ${p.title}`}>
                    Delete
                  </Button>
                </div>
              </li>
            ),
          )}
        </ol>
      </div>
      <ConfirmDialog
        open={deleting !== null}
        title={`Delete “${deleting?.title ?? ''}”?`}
        confirmLabel="Delete the post"
        busy={remove.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() =>
          deleting &&
          remove.mutate(deleting.id, {
            onSuccess: () => setDeleting(null),
            onError: (err) => {
              setDeleting(null);
              setError(err.message);
            },
          })
        }
      >
        <p>The post leaves the build page, its log page and its feed. Its photos stay with the build.</p>
      </ConfirmDialog>
    </EditorSection>
  );
}
