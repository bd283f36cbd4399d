import { useEditor, useStoreVersion, type PendingState, type Saver } from './editor-stores';

/**
 * One line for the whole build sheet, kept in view beside the sections: everything saved, saving,
 * or which panels did not save. A panel's own status can be a long scroll away on a phone.
 */
export function SaveSummary({ onGoTo }: { onGoTo: (section: string) => void }) {
  const { dirty, savers } = useEditor();
  useStoreVersion(dirty);
  const entries = dirty.entries();
  const inState = (wanted: PendingState) => entries.filter(([, state]) => state === wanted).map(([key]) => savers.get(key));
  const saving = entries.some(([, state]) => state === 'pending' || state === 'saving');
  const failed = inState('failed');
  const unadded = inState('unadded');
  if (failed.length) return <NamedPanels tone="text-danger" heading="● Not saved: " panels={failed} onGoTo={onGoTo} />;
  if (!saving && unadded.length) return <NamedPanels tone="text-graphite" heading="● Not added yet: " panels={unadded} onGoTo={onGoTo} />;
  return (
    <p role="status" data-testid="save-summary" className={`font-display text-sm uppercase tracking-wide ${saving ? 'text-graphite' : 'text-ok'}`}>
      {saving ? 'Saving…' : 'All changes saved'}
    </p>
  );
}

function NamedPanels({ tone, heading, panels, onGoTo }: { tone: string; heading: string; panels: (Saver | undefined)[]; onGoTo: (section: string) => void }) {
  return (
    <p role="status" data-testid="save-summary" className={`text-sm ${tone}`}>
      <span className="font-display uppercase tracking-wide">{heading}</span>
      {panels.map((saver, i) => (
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
