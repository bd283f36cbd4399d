import { publishWarningWords, type PublishWarning } from '@shared/schemas/results';
import { Notice } from '@client/components/ui/notice';

/** What publishing now would leave out, each car named, so the organiser publishes anyway only knowingly. */
export function PublishWarnings({ warnings }: { warnings: PublishWarning[] }) {
  if (!warnings.length) return null;
  return (
    <Notice tone="caution">
      <ul aria-label="Before you publish" className="list-disc space-y-1 pl-5">
        {warnings.map((w) => (
          <li key={w.kind}>{publishWarningWords(w)}</li>
        ))}
      </ul>
    </Notice>
  );
}
