import { useEditor, useStoreVersion } from './editor-stores';
import { SaveSummary } from './save-summary';

export const EDITOR_SECTIONS = [
  ['overview', 'Overview'],
  ['engine', 'Engine'],
  ['drivetrain', 'Drivetrain'],
  ['chassis', 'Chassis and suspension'],
  ['brakes', 'Brakes'],
  ['wheels', 'Wheels and tyres'],
  ['body', 'Body and interior'],
  ['extra', 'Extra lines'],
  ['credits', 'Credits'],
  ['photos', 'Photos'],
  ['dyno', 'Dyno runs'],
  ['weighIns', 'Weigh-ins'],
  ['log', 'Build log'],
  ['questions', 'Questions'],
  ['history', 'History'],
  ['private', 'Private details'],
] as const;

/** Scrolls to a section and moves focus to its heading, without touching the URL. */
function goTo(id: string) {
  const el = document.getElementById(`section-${id}`);
  if (!el) return;
  el.scrollIntoView({ behavior: 'smooth', block: 'start' });
  document.getElementById(`section-${id}-title`)?.focus({ preventScroll: true });
}

/** Desktop: a sticky list beside the forms. Phone: a sticky select at the top. */
export function SectionNav() {
  const { dirty } = useEditor();
  useStoreVersion(dirty);
  // A photo's caption counts for the photos section.
  const mark = (id: string) => (dirty.entries().some(([key]) => key === id || key.startsWith(`${id}:`)) ? ' ●' : '');
  return (
    <>
      <div className="sticky top-0 z-10 -mx-4 flex flex-col gap-1 border-b border-rule bg-paper px-4 py-2 lg:hidden">
        <label htmlFor="section-jump" className="sr-only">
          Go to section
        </label>
        <select id="section-jump" className="min-h-11 w-full border border-ink bg-white px-2 font-display uppercase" value="" onChange={(e) => e.target.value && goTo(e.target.value)}>
          <option value="">Go to a section…</option>
          {EDITOR_SECTIONS.map(([id, label]) => (
            <option key={id} value={id}>
              {label}
              {mark(id) ? ' (not saved yet)' : ''}
            </option>
          ))}
        </select>
        <SaveSummary onGoTo={goTo} />
      </div>
      <nav aria-label="Build sheet sections" className="sticky top-4 hidden max-h-[calc(100vh-2rem)] overflow-y-auto lg:block">
        <div className="mb-2 px-3">
          <SaveSummary onGoTo={goTo} />
        </div>
        <ol className="flex flex-col border-l border-rule">
          {EDITOR_SECTIONS.map(([id, label]) => (
            <li key={id}>
              <a
                href={`#section-${id}`}
                onClick={(e) => {
                  e.preventDefault();
                  goTo(id);
                }}
                className="flex min-h-11 items-center px-3 text-sm hover:text-signal-ink"
              >
                {label}
                {mark(id) ? <span className="ml-1 text-caution" aria-label="not saved yet">●</span> : null}
              </a>
            </li>
          ))}
        </ol>
      </nav>
    </>
  );
}
