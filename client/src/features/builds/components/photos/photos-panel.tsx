import { useRef, useState, type DragEvent } from 'react';
import { PHOTO_MAX_BYTES, PHOTO_MAX_FILES, type OwnerBuild, type Photo } from '@shared/schemas/build';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { byPosition } from '../../api/photo-cache';
import { useUpdatePhoto } from '../../api/update-photo';
import { useReorderPhotos } from '../../api/reorder-photos';
import { useDeletePhoto } from '../../api/delete-photo';
import { EditorSection } from '../editor/section-form';
import { PhotoItem } from './photo-item';
import { UploadZone } from './upload-zone';

const move = <T,>(list: T[], from: number, to: number) => {
  const next = [...list];
  const [item] = next.splice(from, 1);
  next.splice(to, 0, item!);
  return next;
};

export function PhotosPanel({ build }: { build: OwnerBuild }) {
  const photos = byPosition(build.photos);
  const update = useUpdatePhoto(build.id);
  const reorder = useReorderPhotos(build.id);
  const remove = useDeletePhoto(build.id);
  const [deleting, setDeleting] = useState<Photo | null>(null);
  const [error, setError] = useState('');
  const dragged = useRef<number | null>(null);
  const [over, setOver] = useState<number | null>(null);

  const moveTo = (from: number, to: number) => {
    if (to < 0 || to >= photos.length || from === to) return;
    setError('');
    reorder.mutate(move(photos, from, to).map((p) => p.id), { onError: (err) => setError(err.message) });
  };
  const dragHandlers = (index: number) => ({
    onDragStart: (e: DragEvent) => {
      dragged.current = index;
      e.dataTransfer.effectAllowed = 'move';
      e.dataTransfer.setData('text/plain', String(photos[index]!.id));
    },
    onDragOver: (e: DragEvent) => {
      if (dragged.current === null) return;
      e.preventDefault();
      setOver(index);
    },
    onDrop: (e: DragEvent) => {
      e.preventDefault();
      if (dragged.current !== null) moveTo(dragged.current, index);
      dragged.current = null;
      setOver(null);
    },
    onDragEnd: () => {
      dragged.current = null;
      setOver(null);
    },
  });

  return (
    <EditorSection id="photos" title="Photos">
      <div className="flex flex-col gap-4" data-testid="photos-panel">
        <UploadZone buildId={build.id} maxBytes={PHOTO_MAX_BYTES} maxFiles={PHOTO_MAX_FILES} />
        {error ? <Notice tone="danger">{error}</Notice> : null}
        {photos.length ? (
          <>
            <p className="text-sm text-graphite">Drag a photo to reorder, or use Earlier / Later. The cover leads the public page, the card and your list of builds.</p>
            <ol className="grid gap-3 sm:grid-cols-2">
              {photos.map((photo, i) => (
                <PhotoItem
                  key={photo.id}
                  photo={photo}
                  index={i}
                  count={photos.length}
                  busy={reorder.isPending}
                  onCaption={(caption) => update.mutateAsync({ photoId: photo.id, input: { caption } })}
                  onCover={() => update.mutate({ photoId: photo.id, input: { isCover: true } }, { onError: (err) => setError(err.message) })}
                  onMove={(to) => moveTo(i, to)}
                  onDelete={() => setDeleting(photo)}
                  dragHandlers={dragHandlers(i)}
                  dropTarget={over === i}
                />
              ))}
            </ol>
          </>
        ) : (
          <p className="text-sm text-graphite">No photos yet.</p>
        )}
      </div>
      <ConfirmDialog
        open={deleting !== null}
        title="Delete this photo?"
        confirmLabel="Delete the photo"
        busy={remove.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() => deleting && remove.mutate(deleting.id, { onSettled: () => setDeleting(null), onError: (err) => setError(err.message) })}
      >
        {deleting?.caption ? `“${deleting.caption}” ` : 'The photo '}goes from the build, its public page and its cards.
      </ConfirmDialog>
    </EditorSection>
  );
}
