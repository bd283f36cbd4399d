import { createContext, useContext, useSyncExternalStore } from 'react';
import type { OwnerBuild } from '@shared/schemas/build';
// The form names are the editor's vocabulary, used by the numbers logic too: they live in model/.
export { FORM_LABELS, type FormKey } from '../../model/form-keys';

/** A tiny external store: forms write to it as the owner types without re-rendering the page. */
export class MapStore<V> {
  private map = new Map<string, V>();
  private version = 0;
  private listeners = new Set<() => void>();
  get = (key: string) => this.map.get(key);
  set = (key: string, value: V | undefined) => {
    if (value === undefined ? !this.map.has(key) : this.map.get(key) === value) return;
    if (value === undefined) this.map.delete(key);
    else this.map.set(key, value);
    this.version++;
    this.listeners.forEach((l) => l());
  };
  entries = () => [...this.map.entries()];
  getVersion = () => this.version;
  subscribe = (listener: () => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };
}

/**
 * A panel whose edits are not stored yet: waiting for the typing to stop, on the way, or refused;
 * or a record (a dyno run, a weigh-in) written but not added, which only the owner can store.
 */
export type PendingState = 'pending' | 'saving' | 'failed' | 'unadded';

/** Saves a panel's edits now; resolves to null once they are stored, or to why they are not. */
export type SaveNow = () => Promise<string | null>;

/** Something that saves itself: a section's form, a photo's caption. `section` is where it sits. */
export type Saver = { label: string; section: string; save: SaveNow };

export type Editor = {
  build: OwnerBuild;
  /** The forms' current values (unsaved included), for the live numbers. */
  drafts: MapStore<unknown>;
  /** Which forms (by FormKey) and captions (`photos:<id>`) hold edits not stored yet, and where those stand. */
  dirty: MapStore<PendingState>;
  /** Everything that saves itself, by the same keys, for leaving the editor. */
  savers: Map<string, Saver>;
};

export const createEditorStores = () => ({ drafts: new MapStore<unknown>(), dirty: new MapStore<PendingState>(), savers: new Map<string, Saver>() });

export const EditorContext = createContext<Editor | null>(null);

export function useEditor(): Editor {
  const editor = useContext(EditorContext);
  if (!editor) throw new Error('useEditor outside the build editor');
  return editor;
}

/** Re-renders when the store changes; returns the store's version. */
export function useStoreVersion<V>(store: MapStore<V>): number {
  return useSyncExternalStore(store.subscribe, store.getVersion, store.getVersion);
}
