/** A dyno curve pasted as CSV: a header naming rpm, power and torque columns (any order), then one row per point. */
export type DynoCsvResult = { ok: true; points: { rpm: number; power: number; torque: number }[] } | { ok: false; message: string };

const COLUMNS = ['rpm', 'power', 'torque'] as const;

export function parseDynoCsv(text: string): DynoCsvResult {
  const lines = text.split(/\r?\n/).map((l) => l.trim()).filter((l) => l && !l.startsWith('#'));
  if (lines.length < 2) return { ok: false, message: 'Paste a header line (rpm, power, torque) and at least one row.' };
  const sep = lines[0]!.includes(';') ? ';' : lines[0]!.includes('\t') ? '\t' : ',';
  const header = lines[0]!.split(sep).map((h) => h.trim().toLowerCase());
  const index = Object.fromEntries(COLUMNS.map((c) => [c, header.findIndex((h) => h.startsWith(c))])) as Record<(typeof COLUMNS)[number], number>;
  const missing = COLUMNS.filter((c) => index[c] < 0);
  if (missing.length) return { ok: false, message: `The header has no ${missing.join(' or ')} column (found: ${header.join(', ')}).` };
  const points = [];
  for (let i = 1; i < lines.length; i++) {
    const cells = lines[i]!.split(sep).map((c) => c.trim());
    const row = COLUMNS.map((c) => Number(cells[index[c]]));
    if (cells.length < header.length || row.some((n) => !Number.isFinite(n))) return { ok: false, message: `Line ${i + 1} does not have a number in every column.` };
    points.push({ rpm: row[0]!, power: row[1]!, torque: row[2]! });
  }
  return { ok: true, points };
}
