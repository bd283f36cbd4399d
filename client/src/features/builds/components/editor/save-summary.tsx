import { useEditor, useStoreVersion } from './editor-stores';

/**
 * One line for the whole build sheet, kept in view beside the sections: everything saved, saving,
 * or which panels did not save. A panel's own status can be a long scroll away on a phone.
 */
export function SaveSummary({ onGoTo }: { onGoTo: (section: string) => void }) {
  const { dirty, savers } = useEditor();
  useStoreVersion(dirty);
  const entries = dirty.entries();
  const failed = entries.filter(([, state]) => state === 'failed').map(([key]) => savers.get(key));
  if (failed.length) {
    return (
      <p role="status" data-testid="save-summary" className="text-sm text-danger">
        <span className="font-display uppercase tracking-wide">● Not saved: </span>
        {failed.map((saver, i) => (
          <span key={saver?.label ?? i}>
            {i ? ', ' : ''}
            <button type="button" className="inline-flex min-h-11 items-center underline underline-offset-2" onClick={() => saver && onGoTo(saver.section)}>
              {saver?.label ?? 'a panel'}
            </button>
          </span>
        ))}
      </p>
    );
  }
  return (
    <p role="status" data-testid="save-summary" className={`font-display text-sm uppercase tracking-wide ${entries.length ? 'text-graphite' : 'text-ok'}`}>
      {entries.length ? 'Saving…' : 'All changes saved'}
    </p>
  );
}
