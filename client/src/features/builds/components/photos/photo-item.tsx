import type { DragEvent } from 'react';
import { PHOTO_CAPTION_MAX, type Photo } from '@shared/schemas/build';
import { Button } from '@client/components/ui/button';
import { GrowingTextField } from '@client/components/ui/growing-text-field';
import { useAutosavedText } from '../editor/use-autosaved-text';
import { PhotoImage } from './photo-image';

type Props = {
  photo: Photo;
  index: number;
  count: number;
  busy: boolean;
  onCaption: (caption: string) => Promise<unknown>;
  onCover: () => void;
  onMove: (to: number) => void;
  onDelete: () => void;
  dragHandlers: { onDragStart: (e: DragEvent) => void; onDragOver: (e: DragEvent) => void; onDrop: (e: DragEvent) => void; onDragEnd: () => void };
  dropTarget: boolean;
};

export function PhotoItem({ photo, index, count, busy, onCaption, onCover, onMove, onDelete, dragHandlers, dropTarget }: Props) {
  const caption = useAutosavedText({ saverKey: `photos:${photo.id}`, label: `Photo ${index + 1} caption`, section: 'photos', stored: photo.caption, send: onCaption });
  const status = caption.state === 'saving' ? 'Saving…' : caption.state === 'saved' ? 'Caption saved' : caption.state === 'failed' ? `Not saved: ${caption.why}` : '';
  return (
    <li draggable {...dragHandlers} className={`flex min-w-0 flex-col gap-2 border bg-white/70 p-2 ${dropTarget ? 'border-signal border-2' : 'border-rule'}`} data-photo-id={photo.id}>
      <div className="relative">
        <PhotoImage photo={photo} sizes="(min-width: 640px) 260px, 90vw" alt={photo.caption || `Photo ${index + 1}`} className="aspect-[3/2] w-full object-cover" />
        {photo.isCover ? <span className="absolute left-0 top-0 bg-ink px-2 py-1 font-display text-xs uppercase text-paper">Cover</span> : null}
        <span className="absolute right-0 top-0 cursor-grab bg-paper/90 px-2 py-1 text-xs" aria-hidden>
          ⇅ drag
        </span>
      </div>
      {/* The whole width of the card, and taller as it wraps: a caption is read in full while typed. It saves itself. */}
      <GrowingTextField
        label={`Caption, photo ${index + 1}`}
        value={caption.text}
        maxLength={PHOTO_CAPTION_MAX}
        onChange={(e) => caption.change(e.target.value)}
        onBlur={() => void caption.saveNow()}
        onKeyDown={(e) => {
          if (e.key === 'Enter') void caption.saveNow();
        }}
      />
      <span role="status" className={`min-h-4 text-xs ${caption.state === 'failed' ? 'text-danger' : 'text-graphite'}`}>
        {status}
      </span>
      <div className="flex flex-wrap gap-1">
        <Button type="button" variant="secondary" className="px-2" aria-label={`Move photo ${index + 1} earlier`} disabled={index === 0 || busy} onClick={() => onMove(index - 1)}>
          ↑ Earlier
        </Button>
        <Button type="button" variant="secondary" className="px-2" aria-label={`Move photo ${index + 1} later`} disabled={index === count - 1 || busy} onClick={() => onMove(index + 1)}>
          ↓ Later
        </Button>
        {!photo.isCover ? (
          <Button type="button" variant="quiet" className="px-2" onClick={onCover}>
            Make cover
          </Button>
        ) : null}
        <Button type="button" variant="quiet" className="px-2" onClick={onDelete}>
          Delete
        </Button>
      </div>
    </li>
  );
}
