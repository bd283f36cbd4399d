import type { Transaction } from 'sequelize';
import type { FigureInput } from '@shared/schemas/figure';
import { FigureChange } from '../../models/figure-change';

const isFigure = (v: unknown): v is FigureInput =>
  typeof v === 'object' && v !== null && 'value' in v && 'unit' in v && 'provenance' in v && typeof (v as FigureInput).value === 'number';

/**
 * Every figure in a nested section object, by dotted path ("front.springRate"). With `lists`, the
 * figures inside lists too ("tubes.2.wall"): every figure that can carry an evidence photo. The
 * history leaves lists out, since a row's index is not a lasting name for it.
 */
export function figuresByPath(data: unknown, prefix = '', opts: { lists?: boolean } = {}): Map<string, FigureInput> {
  const found = new Map<string, FigureInput>();
  if (isFigure(data)) {
    found.set(prefix, data);
    return found;
  }
  if (data && typeof data === 'object' && (opts.lists || !Array.isArray(data))) {
    for (const [key, value] of Object.entries(data)) {
      for (const [p, f] of figuresByPath(value, prefix ? `${prefix}.${key}` : key, opts)) found.set(p, f);
    }
  }
  return found;
}

const sameFigure = (a: FigureInput, b: FigureInput) =>
  a.value === b.value && a.unit === b.unit && a.provenance === b.provenance && (a.measuredOn ?? '') === (b.measuredOn ?? '');

/**
 * Keeps the earlier value of every figure that changed or was cleared, so the build can show
 * "estimated 1,250 kg → measured 1,287 kg on …".
 */
export async function recordFigureChanges(buildId: number, prefix: string, before: unknown, after: unknown, transaction: Transaction): Promise<void> {
  const old = figuresByPath(before, prefix);
  const next = figuresByPath(after, prefix);
  const rows = [...old]
    .filter(([path, figure]) => !next.has(path) || !sameFigure(figure, next.get(path)!))
    .map(([path, figure]) => ({ buildId, path, before: figure, after: next.get(path) ?? null }));
  if (rows.length) await FigureChange.bulkCreate(rows, { transaction });
}
