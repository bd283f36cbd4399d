import { useRef, useState, type DragEvent } from 'react';
import { ApiError } from '@client/lib/api';
import { megabytes } from '@shared/words';
import { useUploadPhoto } from '../../api/upload-photos';

const TYPES = ['image/jpeg', 'image/png', 'image/webp', 'image/avif'];

type Upload = { key: string; name: string; progress: number; state: 'uploading' | 'done' | 'error' | 'refused'; message?: string };

/** Client-side pre-check (the server checks the bytes again): type and size, with a clear reason. */
function precheck(file: File, maxBytes: number): string | null {
  if (/heic|heif/i.test(file.type) || /\.hei[cf]$/i.test(file.name)) return `${file.name} is a HEIC photo, which Placard cannot read yet: export it as JPEG.`;
  if (!TYPES.includes(file.type)) return `${file.name} is not a JPEG, PNG, WebP or AVIF image.`;
  if (file.size > maxBytes) return `${file.name} is ${megabytes(file.size)}; the limit is ${megabytes(maxBytes)} a photo.`;
  return null;
}

/** Why the server refused a file: its own words name the file and the reason (type, size, pixels). */
function refusalOf(file: File, err: Error): string {
  const why = err instanceof ApiError ? err.fields.photos : undefined;
  return why ?? `${file.name}: ${err.message}`;
}

export function UploadZone({ buildId, maxBytes, maxFiles }: { buildId: number; maxBytes: number; maxFiles: number }) {
  const upload = useUploadPhoto(buildId);
  const input = useRef<HTMLInputElement>(null);
  const [uploads, setUploads] = useState<Upload[]>([]);
  const [hover, setHover] = useState(false);
  const patch = (key: string, change: Partial<Upload>) => setUploads((list) => list.map((u) => (u.key === key ? { ...u, ...change } : u)));

  const start = (files: File[]) => {
    const picked = files.slice(0, maxFiles);
    const extra = files.length - picked.length;
    const stamp = Date.now();
    const next: Upload[] = picked.map((file, i) => {
      const refused = precheck(file, maxBytes);
      return { key: `${stamp}-${i}`, name: file.name, progress: 0, state: refused ? 'refused' : 'uploading', ...(refused ? { message: refused } : {}) };
    });
    if (extra > 0) next.push({ key: `${stamp}-more`, name: `${extra} more`, progress: 0, state: 'refused', message: `At most ${maxFiles} photos at a time: ${extra} left out. Add them next.` });
    setUploads((list) => [...list.filter((u) => u.state !== 'done'), ...next]);
    // In the order chosen, one after another: the first chosen arrives first, so it becomes the cover
    // when the build has none yet (the server makes the first photo of a build its cover), and the
    // photos keep the order they were chosen in.
    void picked.reduce(async (before, file, i) => {
      await before;
      const item = next[i]!;
      if (item.state !== 'uploading') return;
      // mutateAsync, not mutate: mutate's own callbacks fire for the latest call only.
      await upload.mutateAsync({ file, onProgress: (p) => patch(item.key, { progress: p }) }).then(
        // A photo stored clears the refusals of earlier choices: they have been read, and the next try worked.
        () => setUploads((list) => list.filter((u) => u.key.startsWith(`${stamp}-`) || u.state === 'uploading').map((u) => (u.key === item.key ? { ...u, state: 'done', progress: 1 } : u))),
        (err: Error) => patch(item.key, { state: 'error', message: refusalOf(file, err) }),
      );
    }, Promise.resolve());
  };

  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setHover(false);
    start([...e.dataTransfer.files]);
  };

  return (
    <div className="flex flex-col gap-2">
      <div
        onDragOver={(e) => {
          if ([...e.dataTransfer.types].includes('Files')) {
            e.preventDefault();
            setHover(true);
          }
        }}
        onDragLeave={() => setHover(false)}
        onDrop={onDrop}
        className={`flex flex-col items-center gap-2 border-2 border-dashed px-4 py-6 text-center ${hover ? 'border-signal bg-white' : 'border-rule'}`}
      >
        <p className="font-display uppercase tracking-wide">Drop photos here</p>
        <p className="text-sm text-graphite">
          or{' '}
          {/* The input sits inside its label, so the label shows the focus ring when the keyboard reaches the (visually hidden) input. */}
          <label className="inline-flex min-h-11 cursor-pointer items-center border-2 border-ink px-3 font-display uppercase text-ink hover:bg-ink hover:text-paper has-focus-visible:outline-3 has-focus-visible:outline-offset-2 has-focus-visible:outline-signal">
            Choose photos
            <input
              ref={input}
              type="file"
              multiple
              accept={TYPES.join(',')}
              className="sr-only"
              onChange={(e) => {
                start([...(e.target.files ?? [])]);
                if (input.current) input.current.value = '';
              }}
            />
          </label>
        </p>
        <p className="text-xs text-graphite">
          JPEG, PNG, WebP or AVIF, up to {megabytes(maxBytes)} each, {maxFiles} at a time. Location data is stripped; each photo is stored in sizes for phones and print.
        </p>
      </div>
      {uploads.length ? (
        <ul className="flex flex-col gap-1" aria-label="Uploads">
          {uploads.map((u) => (
            <li key={u.key} className="text-sm">
              {u.state === 'refused' || u.state === 'error' ? (
                <p role="alert" className="border-l-4 border-danger pl-2 text-danger">
                  {u.message}
                </p>
              ) : (
                <div className="flex items-center gap-2">
                  <span className="min-w-0 flex-1 truncate">{u.name}</span>
                  <span role="progressbar" aria-label={`Uploading ${u.name}`} aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(u.progress * 100)} className="block h-2 w-32 border border-ink">
                    <span className={`block h-full ${u.state === 'done' ? 'bg-ok' : 'bg-ink'}`} style={{ width: `${Math.round(u.progress * 100)}%` }} />
                  </span>
                  <span className="w-20 text-right tabular-nums text-graphite">{u.state === 'done' ? 'Done' : u.progress >= 1 ? 'Resizing…' : `${Math.round(u.progress * 100)}%`}</span>
                </div>
              )}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
