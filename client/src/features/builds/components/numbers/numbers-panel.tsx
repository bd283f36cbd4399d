import { useId, useState } from 'react';
import { useNumbers } from './numbers-context';
import { UnitSystemSwitch } from '../unit-system-switch';
import { NumberGroupView } from './number-group-view';
import { GroupDiagrams } from './group-diagrams';
import { groupWarnings } from '../../model/numbers/warning-names';
import type { NumberGroup } from '../../model/numbers/types';

export function UnitToggle() {
  const { system, setSystem } = useNumbers();
  return <UnitSystemSwitch system={system} onChange={setSystem} />;
}

function CruiseInput() {
  const { system, cruise, setCruise } = useNumbers();
  const id = useId();
  // The box keeps its own text, so it can be emptied and retyped; the numbers follow a valid speed only.
  const [text, setText] = useState(String(cruise));
  const parse = (t: string) => (t.trim() === '' ? NaN : Number(t.trim().replace(',', '.')));
  const valid = (n: number) => Number.isFinite(n) && n > 0;
  // A valid text that differs from the speed in use is stale (the unit system changed): show the speed.
  const shown = valid(parse(text)) && parse(text) !== cruise ? String(cruise) : text;
  return (
    <div className="flex items-center gap-2 text-sm">
      <label htmlFor={id} className="text-graphite">
        Cruise
      </label>
      <input
        id={id}
        inputMode="numeric"
        autoComplete="off"
        value={shown}
        aria-invalid={valid(parse(shown)) ? undefined : true}
        onChange={(e) => {
          setText(e.target.value);
          const next = parse(e.target.value);
          if (valid(next)) setCruise(next);
        }}
        className="min-h-11 w-20 border border-rule bg-white px-2 tabular-nums"
      />
      <span>{system === 'metric' ? 'km/h' : 'mph'}</span>
    </div>
  );
}

/** The spec check's messages, each naming its section and field; an explanation shared by several is said once, under them. */
export function SpecWarnings() {
  const { warnings } = useNumbers();
  if (!warnings.length) return <p className="text-sm text-ok">Spec check: the figures agree with each other.</p>;
  return (
    <div>
      <h3 className="font-display text-sm uppercase tracking-wide text-caution">Spec check · {warnings.length} to look at</h3>
      <ul className="mt-1 flex flex-col gap-2">
        {groupWarnings(warnings).map((g) => (
          <li key={g.why} className="border-l-4 border-caution pl-2 text-sm">
            <ul>
              {g.items.map((item) => (
                <li key={item.key} data-testid="spec-check-message">
                  <span className="font-semibold">{item.field}: </span>
                  {item.message}
                </li>
              ))}
            </ul>
            <span className="block text-xs text-graphite">{g.why}</span>
          </li>
        ))}
      </ul>
    </div>
  );
}

/** The whole numbers panel (desktop: sticky beside the forms). */
export function NumbersPanel() {
  const { groups } = useNumbers();
  return (
    <section aria-labelledby="numbers-title" data-testid="numbers-panel" className="border border-ink bg-white/70">
      <header className="flex flex-wrap items-center justify-between gap-2 border-b border-ink px-3 py-2">
        <h2 id="numbers-title" className="font-display text-lg uppercase tracking-wide">
          The numbers
        </h2>
        <UnitToggle />
      </header>
      <div className="flex flex-col gap-3 p-3">
        <p className="text-xs text-graphite">Worked out live from what you type, saved or not.</p>
        <SpecWarnings />
        {/* Only groups with figures: an empty wrapper would still take a gap in the column. */}
        {groups.filter((g) => g.rows.length).map((g) => (
          <div key={g.id}>
            <NumberGroupView group={g} showHint={false} />
            <GroupDiagrams id={g.id} />
            {g.id === 'gearing' && g.rows.length ? <CruiseInput /> : null}
          </div>
        ))}
        {groups.every((g) => !g.rows.length) ? <p className="text-sm text-graphite">Nothing to work out yet: fill in the engine, drivetrain, wheels or chassis.</p> : null}
      </div>
    </section>
  );
}

/** On a phone: the numbers that belong to one section, right under its form. */
export function SectionNumbers({ section }: { section: NumberGroup['section'] }) {
  const { groups } = useNumbers();
  const mine = groups.filter((g) => g.section === section);
  if (!mine.length) return null;
  return (
    <div className="mt-4 border border-ink bg-white/70 p-3 lg:hidden" data-testid={`section-numbers-${section}`}>
      <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
        <h3 className="font-display text-base uppercase tracking-wide">The numbers</h3>
        <UnitToggle />
      </div>
      <div className="flex flex-col gap-3">
        {mine.map((g) => (
          <div key={g.id}>
            <NumberGroupView group={g} />
            <GroupDiagrams id={g.id} />
            {g.id === 'gearing' && g.rows.length ? <CruiseInput /> : null}
          </div>
        ))}
      </div>
    </div>
  );
}
