import type { UnitSystem } from '@shared/calc';

const CHOICES: Array<[UnitSystem, string]> = [
  ['metric', 'Metric'],
  ['imperial', 'Imperial'],
];

/** The owner's units, one press away: My builds and the editor's numbers read the same choice. */
export function UnitSystemSwitch({ system, onChange }: { system: UnitSystem; onChange: (next: UnitSystem) => void }) {
  return (
    <div role="group" aria-label="Units" className="flex w-fit border border-ink">
      {CHOICES.map(([s, label]) => (
        <button key={s} type="button" aria-pressed={system === s} onClick={() => onChange(s)} className={`min-h-11 px-3 font-display text-sm uppercase ${system === s ? 'bg-ink text-paper' : 'hover:text-signal-ink'}`}>
          {label}
        </button>
      ))}
    </div>
  );
}
