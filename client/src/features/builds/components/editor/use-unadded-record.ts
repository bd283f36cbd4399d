import { useEffect } from 'react';
import { useEditor } from './editor-stores';

/**
 * A record being written (a dyno run, a weigh-in) is stored only when the owner adds it, so it
 * cannot save itself. While its form holds anything, leaving the editor names it and asks,
 * instead of dropping it.
 */
export function useUnaddedRecord({ key, label, section, addLabel, filled }: { key: string; label: string; section: string; addLabel: string; filled: boolean }) {
  const { dirty, savers } = useEditor();
  useEffect(() => {
    if (!filled) return;
    dirty.set(key, 'unadded');
    savers.set(key, { label, section, save: () => Promise.resolve(`not added yet. Press “${addLabel}”, or leave without it.`) });
    return () => {
      savers.delete(key);
      dirty.set(key, undefined);
    };
  }, [filled, key, label, section, addLabel, dirty, savers]);
}
