/** Ten points or fewer: one button per value, one tap. More: a stepper with large − and + and the value between. */
export function PointInput({ label, max, value, onChange, disabled }: { label: string; max: number; value: number | null; onChange: (points: number) => void; disabled?: boolean }) {
  if (max <= 10) {
    return (
      <div role="radiogroup" aria-label={label} className="grid grid-cols-6 gap-1.5">
        {Array.from({ length: max + 1 }, (_, p) => (
          <button
            key={p}
            type="button"
            role="radio"
            aria-checked={value === p}
            disabled={disabled}
            onClick={() => onChange(p)}
            className={`min-h-12 border-2 border-ink font-display text-xl tabular-nums disabled:opacity-50 ${value === p ? 'bg-ink text-paper' : 'bg-white text-ink active:bg-rule'}`}
          >
            {p}
          </button>
        ))}
      </div>
    );
  }
  const step = (d: number) => onChange(Math.min(max, Math.max(0, (value ?? 0) + d)));
  return (
    <div className="flex items-stretch gap-2" role="group" aria-label={label}>
      <button type="button" disabled={disabled} onClick={() => step(-1)} aria-label={`${label}: one less`} className="min-h-14 w-16 border-2 border-ink bg-white font-display text-3xl">
        −
      </button>
      <output aria-live="polite" className="flex min-w-20 flex-1 items-center justify-center border-2 border-ink bg-white font-display text-3xl tabular-nums">
        {value ?? '–'}
      </output>
      <button type="button" disabled={disabled} onClick={() => step(1)} aria-label={`${label}: one more`} className="min-h-14 w-16 border-2 border-ink bg-white font-display text-3xl">
        +
      </button>
    </div>
  );
}
