import { createContext, useContext, useMemo, useState, type ReactNode } from 'react';
import type { UnitSystem } from '@shared/calc';
import type { Sections } from '@shared/schemas/build-sections';
import type { FigureInput } from '@shared/schemas/figure';
import { SECTION_KINDS } from '@shared/schemas/build-sections';
import { useEditor, useStoreVersion, type FormKey } from '../editor/editor-stores';
import { cleanValues } from '../editor/form-values';
import { useUnitSystem } from '../editor/unit-system';
import { computeNumbers, type Numbers } from '../../model/numbers/compute-numbers';
import type { PlacedWarning } from '../../model/numbers/spec-input';

type NumbersState = Numbers & { system: UnitSystem; setSystem: (s: UnitSystem) => void; cruise: number; setCruise: (n: number) => void };

const NumbersContext = createContext<NumbersState | null>(null);

const DEFAULT_CRUISE: Record<UnitSystem, number> = { metric: 100, imperial: 65, uk: 65 };

/** Works the numbers out from the forms' live values; only what reads them re-renders as the owner types. */
export function NumbersProvider({ children }: { children: ReactNode }) {
  const { build, drafts } = useEditor();
  const version = useStoreVersion(drafts);
  const [system, setSystem] = useUnitSystem();
  const [cruiseBySystem, setCruiseBySystem] = useState(DEFAULT_CRUISE);
  const cruise = cruiseBySystem[system];

  const numbers = useMemo(() => {
    void version; // recompute whenever a form's values change
    const sections = {} as Record<string, unknown>;
    for (const kind of SECTION_KINDS) sections[kind] = cleanValues(drafts.get(kind) ?? build.sections[kind] ?? {});
    const overview = (drafts.get('overview') ? cleanValues(drafts.get('overview')) : build.overview) as { weight?: FigureInput | null };
    return computeNumbers({ sections: sections as Sections, weight: overview.weight ?? null, weighIns: build.weighIns, dynoRuns: build.dynoRuns, system, cruise });
  }, [version, drafts, build, system, cruise]);

  const value = useMemo(
    () => ({ ...numbers, system, setSystem, cruise, setCruise: (n: number) => setCruiseBySystem((c) => ({ ...c, [system]: n })) }),
    [numbers, system, setSystem, cruise],
  );
  return <NumbersContext.Provider value={value}>{children}</NumbersContext.Provider>;
}

export function useNumbers(): NumbersState {
  const state = useContext(NumbersContext);
  if (!state) throw new Error('useNumbers outside NumbersProvider');
  return state;
}

/** The spec-check warning for one field of one form, if any. */
export function useFieldWarning(form: FormKey, path: string): PlacedWarning | undefined {
  return useNumbers().warnings.find((w) => w.form === form && w.path === path);
}
