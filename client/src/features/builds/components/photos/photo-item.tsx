import { useState, type DragEvent } from 'react';
import { PHOTO_CAPTION_MAX, type Photo } from '@shared/schemas/build';
import { Button } from '@client/components/ui/button';
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
  const [caption, setCaption] = useState(photo.caption);
  const [state, setState] = useState<'idle' | 'saving' | 'saved' | 'error'>('idle');
  const saveCaption = () => {
    if (caption.trim() === photo.caption.trim()) return;
    setState('saving');
    onCaption(caption.trim()).then(
      () => setState('saved'),
      () => setState('error'),
    );
  };
  return (
    <li draggable {...dragHandlers} className={`flex flex-col gap-2 border bg-white/70 p-2 ${dropTarget ? 'border-signal border-2' : 'border-rule'}`} data-photo-id={photo.id}>
      <div className="relative">
        <PhotoImage photo={photo} sizes="(min-width: 1024px) 240px, (min-width: 640px) 45vw, 90vw" alt={photo.caption || `Photo ${index + 1}`} className="aspect-[3/2] w-full object-cover" />
        {photo.isCover ? <span className="absolute left-0 top-0 bg-ink px-2 py-1 font-display text-xs uppercase text-paper">Cover</span> : null}
        <span className="absolute right-0 top-0 cursor-grab bg-paper/90 px-2 py-1 text-xs" aria-hidden>
          ⇅ drag
        </span>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={`caption-${photo.id}`} className="text-sm font-semibold">
          Caption
        </label>
        <div className="flex gap-1">
          <input
            id={`caption-${photo.id}`}
            value={caption}
            maxLength={PHOTO_CAPTION_MAX}
            onChange={(e) => {
              setCaption(e.target.value);
              setState('idle');
            }}
            onBlur={saveCaption}
            onKeyDown={(e) => {
              if (e.key === 'Enter') {
                e.preventDefault();
                saveCaption();
              }
            }}
            className="min-h-11 min-w-0 flex-1 border border-rule bg-white px-2"
          />
          <Button type="button" variant="secondary" className="px-2" onClick={saveCaption} disabled={caption.trim() === photo.caption.trim()}>
            Save
          </Button>
        </div>
        <span role="status" className="text-xs text-graphite">
          {state === 'saving' ? 'Saving…' : state === 'saved' ? 'Caption saved' : state === 'error' ? 'Not saved: try again' : caption.trim() !== photo.caption.trim() ? 'Unsaved caption' : ''}
        </span>
      </div>
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
