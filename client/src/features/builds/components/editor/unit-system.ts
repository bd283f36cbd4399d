import { useSyncExternalStore } from 'react';
import type { UnitSystem } from '@shared/calc';

const KEY = 'placard.unitSystem';
const listeners = new Set<() => void>();

function read(): UnitSystem {
  try {
    const saved = localStorage.getItem(KEY);
    if (saved === 'metric' || saved === 'imperial') return saved;
  } catch {
    // storage may be off: fall back to the language
  }
  return typeof navigator !== 'undefined' && /^en-(US|LR|MM)\b/.test(navigator.language) ? 'imperial' : 'metric';
}

/** The owner's chosen unit system, kept on this device. */
export function useUnitSystem(): [UnitSystem, (next: UnitSystem) => void] {
  const system = useSyncExternalStore(
    (l) => {
      listeners.add(l);
      return () => listeners.delete(l);
    },
    read,
    () => 'metric' as UnitSystem,
  );
  return [system, setUnitSystem];
}

function setUnitSystem(next: UnitSystem) {
  try {
    localStorage.setItem(KEY, next);
  } catch {
    // storage is off: the choice is not kept
  }
  listeners.forEach((l) => l());
}
