import { useRef, useState } from 'react';
import type { EventDetail } from '@shared/schemas/show';
import { ApiError } from '@client/lib/api';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { Panel } from '@client/components/ui/panel';
import { useRemoveShowLogo } from '../api/remove-show-logo';
import { useUploadShowLogo } from '../api/upload-show-logo';

/** The show's logo: on its public page and its screens. Organisers change or remove it. */
export function LogoPanel({ show }: { show: EventDetail }) {
  const upload = useUploadShowLogo(show.id);
  const remove = useRemoveShowLogo(show.id);
  const input = useRef<HTMLInputElement>(null);
  const [asking, setAsking] = useState(false);
  const failed = upload.error ?? remove.error;
  return (
    <Panel title="Logo">
      <div className="flex flex-wrap items-center gap-4">
        {show.logo ? (
          <picture>
            <source srcSet={show.logo.webp} type="image/webp" />
            <img src={show.logo.jpeg} alt={`${show.name} logo`} width={show.logo.width} height={show.logo.height} className="h-24 w-auto max-w-48 border border-rule bg-white object-contain p-1" />
          </picture>
        ) : (
          <p className="text-graphite">No logo yet. A square or wide image (JPEG, PNG, WebP or AVIF) reads best.</p>
        )}
        <label className="inline-flex min-h-11 cursor-pointer items-center border-2 border-ink px-4 font-display uppercase tracking-wide hover:bg-ink hover:text-paper focus-within:outline-2">
          {upload.isPending ? 'Uploading…' : show.logo ? 'Change the logo' : 'Add a logo'}
          <input
            ref={input}
            type="file"
            accept="image/jpeg,image/png,image/webp,image/avif"
            className="sr-only"
            disabled={upload.isPending}
            onChange={(e) => {
              const file = e.target.files?.[0];
              if (file) upload.mutate(file, { onSettled: () => input.current && (input.current.value = '') });
            }}
          />
        </label>
        {show.logo ? (
          <Button type="button" variant="quiet" onClick={() => setAsking(true)}>
            Remove
          </Button>
        ) : null}
      </div>
      {failed ? <Notice tone="danger">{(failed instanceof ApiError && failed.fields.logo) || failed.message}</Notice> : null}
      <ConfirmDialog open={asking} title="Remove the logo?" confirmLabel="Remove" busy={remove.isPending} onCancel={() => setAsking(false)} onConfirm={() => remove.mutate(undefined, { onSettled: () => setAsking(false) })}>
        <p>The show’s public page and screens go back to showing its name only.</p>
      </ConfirmDialog>
    </Panel>
  );
}
