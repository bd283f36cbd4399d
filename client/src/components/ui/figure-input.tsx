import { useId, useState } from 'react';
import { CalcInputError, convert, formatQuantity, toSystem, UNIT_LABELS, type QuantityKind, type Unit, type UnitOf, type UnitSystem, PREFERRED_UNITS } from '@shared/calc';
import { PROVENANCES, type FigureInput as Figure } from '@shared/schemas/figure';

/** The units offered for each kind, both systems; a saved figure in another unit is still shown. */
export const FIGURE_UNITS: Partial<{ [K in QuantityKind]: UnitOf<K>[] }> = {
  length: ['mm', 'cm', 'in'],
  mass: ['kg', 'lb'],
  power: ['kW', 'hp', 'PS'],
  torque: ['Nm', 'lbft'],
  pressure: ['bar', 'psi', 'kPa'],
  volume: ['cm3', 'L', 'in3'],
  springRate: ['N/mm', 'lb/in', 'kgf/mm'],
  speed: ['km/h', 'mph'],
};

const IMPERIAL = new Set<string>(['in', 'ft', 'mi', 'lb', 'lbf', 'lbft', 'hp', 'psi', 'in3', 'mph', 'lb/in', 'lb/in3', 'lb/ft']);
export const systemOfUnit = (unit: string): UnitSystem => (IMPERIAL.has(unit) ? 'imperial' : 'metric');

const PROVENANCE_LABELS = { measured: 'Measured', estimated: 'Estimated', target: 'Target' } as const;

type NestedError = { message?: string; value?: { message?: string }; unit?: { message?: string }; provenance?: { message?: string }; measuredOn?: { message?: string } };

type Props = {
  label: string;
  kind: QuantityKind;
  value: Figure | undefined;
  onChange: (figure: Figure | undefined) => void;
  onBlur?: () => void;
  /** The owner's unit system: the unit a new figure starts in. */
  system: UnitSystem;
  error?: NestedError;
  warning?: { message: string; why: string };
  hint?: string;
  units?: string[];
  /** The unit a new figure starts in when the trade quotes it one way in both systems (wheel offset in mm). */
  defaultUnit?: string;
  /** Photos of the build that can back a measured figure (a dyno sheet, a scale ticket). */
  evidencePhotos?: { id: number; label: string }[];
};

const parseNumber = (text: string) => (text.trim() === '' ? undefined : Number(text.trim().replace(',', '.')));
const sameNumber = (a: number | undefined, b: number | undefined) => (a === undefined && b === undefined) || (a !== undefined && b !== undefined && (a === b || (Number.isNaN(a) && Number.isNaN(b))));

/** The same figure in the other system, or nothing when it cannot be worked out. */
function otherSystem(kind: QuantityKind, figure: Figure | undefined): string {
  if (!figure || !Number.isFinite(figure.value)) return '';
  const target: UnitSystem = systemOfUnit(figure.unit) === 'imperial' ? 'metric' : 'imperial';
  try {
    const converted = toSystem(kind, { value: figure.value, unit: figure.unit as UnitOf<typeof kind> }, target);
    if (converted.unit === figure.unit) return '';
    return `≈ ${formatQuantity(converted as { value: number; unit: Unit })}`;
  } catch (err) {
    if (err instanceof CalcInputError) return '';
    throw err;
  }
}

const RANGE_MESSAGE = /between (-?[\d.]+) and (-?[\d.]+) (\S+)\.$/;

/** "Bore must be between 20 and 200 mm." said again in the unit the owner typed, so inches need no sums. */
function rangeInOwnersUnit(kind: QuantityKind, message: string, unit: string): string {
  const m = RANGE_MESSAGE.exec(message);
  if (!m || m[3] === unit) return message;
  try {
    const [lo, hi] = [Number(m[1]), Number(m[2])].map((v) => convert(kind, v, m[3] as UnitOf<typeof kind>, unit as UnitOf<typeof kind>));
    return `${message.slice(0, -1)} (${formatQuantity({ value: lo!, unit: unit as Unit })} to ${formatQuantity({ value: hi!, unit: unit as Unit })}).`;
  } catch {
    return message;
  }
}

/**
 * A build-sheet figure: number, unit (both systems), provenance and, when measured, the date.
 * Controlled: the value is the whole figure, or undefined while the number box is empty.
 */
export function FigureInput({ label, kind, value, onChange, onBlur, system, error, warning, hint, units, defaultUnit, evidencePhotos }: Props) {
  const id = useId();
  const [text, setText] = useState(value ? String(value.value) : '');
  // Follow the form when it changes the figure from outside (a reset after saving, a dyno run applied).
  const shown = sameNumber(parseNumber(text), value?.value) ? text : value && Number.isFinite(value.value) ? String(value.value) : '';
  const offered = [...(units ?? FIGURE_UNITS[kind] ?? Object.keys(PREFERRED_UNITS.metric))] as string[];
  // A unit or provenance chosen before any number is typed is kept until there is a figure to hold it.
  const [draft, setDraft] = useState<{ unit?: string; provenance?: Figure['provenance'] }>({});
  const unit = value?.unit ?? draft.unit ?? defaultUnit ?? (PREFERRED_UNITS[system][kind] as string);
  if (!offered.includes(unit)) offered.push(unit);
  const provenance = value?.provenance ?? draft.provenance ?? 'estimated';

  const emit = (next: Partial<Figure> & { text?: string }) => {
    if (next.unit || next.provenance) setDraft((d) => ({ ...d, ...(next.unit ? { unit: next.unit } : {}), ...(next.provenance ? { provenance: next.provenance } : {}) }));
    const nextText = next.text ?? shown;
    const number = parseNumber(nextText);
    if (number === undefined) return onChange(undefined);
    const nextProvenance = next.provenance ?? provenance;
    const measuredOn = nextProvenance === 'measured' ? ('measuredOn' in next ? next.measuredOn : value?.measuredOn) : undefined;
    const evidencePhotoId = nextProvenance === 'measured' ? ('evidencePhotoId' in next ? next.evidencePhotoId : value?.evidencePhotoId) : undefined;
    onChange({ value: number, unit: next.unit ?? unit, provenance: nextProvenance, ...(measuredOn ? { measuredOn } : {}), ...(evidencePhotoId ? { evidencePhotoId } : {}) });
  };

  const messages = [error?.message, error?.value?.message, error?.unit?.message, error?.provenance?.message, error?.measuredOn?.message].filter((m): m is string => Boolean(m)).map((m) => rangeInOwnersUnit(kind, m, unit));
  const other = otherSystem(kind, value);
  const boxClass = 'min-h-11 border bg-white px-2 text-base outline-none focus:border-ink focus:ring-1 focus:ring-ink';

  return (
    <fieldset className="flex min-w-0 flex-col gap-1" aria-describedby={messages.length ? `${id}-error` : undefined}>
      <legend className="mb-1 text-sm font-semibold">{label}</legend>
      <div className="flex flex-wrap items-stretch gap-1">
        <input
          id={`${id}-value`}
          aria-label={label}
          inputMode="decimal"
          autoComplete="off"
          value={shown}
          onChange={(e) => {
            setText(e.target.value);
            emit({ text: e.target.value });
          }}
          onBlur={onBlur}
          aria-invalid={error?.value || error?.message ? true : undefined}
          className={`min-w-[8rem] flex-1 tabular-nums ${boxClass} ${error?.value || error?.message ? 'border-danger' : 'border-rule'}`}
        />
        <select aria-label={`${label} unit`} value={unit} onChange={(e) => emit({ unit: e.target.value })} onBlur={onBlur} className={`w-24 ${boxClass} border-rule`}>
          {offered.map((u) => (
            <option key={u} value={u}>
              {UNIT_LABELS[u as Unit] ?? u}
            </option>
          ))}
        </select>
        <select aria-label={`${label}: measured, estimated or target`} value={provenance} onChange={(e) => emit({ provenance: e.target.value as Figure['provenance'] })} onBlur={onBlur} className={`w-32 ${boxClass} border-rule`}>
          {PROVENANCES.map((p) => (
            <option key={p} value={p}>
              {PROVENANCE_LABELS[p]}
            </option>
          ))}
        </select>
        {provenance === 'measured' ? (
          <input
            type="date"
            aria-label={`${label}: measured on`}
            value={value?.measuredOn ?? ''}
            onChange={(e) => emit({ measuredOn: e.target.value || undefined })}
            onBlur={onBlur}
            className={`w-40 ${boxClass} ${error?.measuredOn ? 'border-danger' : 'border-rule'}`}
          />
        ) : null}
        {provenance === 'measured' && evidencePhotos?.length ? (
          <select
            aria-label={`${label}: evidence photo`}
            value={value?.evidencePhotoId ?? ''}
            onChange={(e) => emit({ evidencePhotoId: e.target.value ? Number(e.target.value) : undefined })}
            onBlur={onBlur}
            className={`w-48 ${boxClass} border-rule`}
          >
            <option value="">No evidence photo</option>
            {evidencePhotos.map((p) => (
              <option key={p.id} value={p.id}>
                {p.label}
              </option>
            ))}
          </select>
        ) : null}
      </div>
      {other ? <p className="text-sm tabular-nums text-graphite">{other}</p> : null}
      {hint ? <p className="text-sm text-graphite">{hint}</p> : null}
      {messages.length ? (
        <p id={`${id}-error`} role="alert" className="text-sm text-danger">
          {messages.join(' ')}
        </p>
      ) : null}
      {warning && !messages.length ? (
        <p className="border-l-4 border-caution bg-white/70 px-2 py-1 text-sm">
          <span className="font-semibold">Check: </span>
          {warning.message} <span className="text-graphite">{warning.why}</span>
        </p>
      ) : null}
    </fieldset>
  );
}
