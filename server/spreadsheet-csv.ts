import { stringify } from 'csv-stringify/sync';

/**
 * A CSV that spreadsheet programs open as intended: a byte-order mark (so Excel reads UTF-8), a
 * header row, and any cell starting with = + - @ (or a tab / carriage return) prefixed with a quote
 * so it is never run as a formula (OWASP "CSV Injection"). The one way Placard writes a CSV.
 * `headers` names the columns in order: `{ number: 'Number', title: 'Car' }`.
 */
export function spreadsheetCsv<T extends Record<string, unknown>>(rows: T[], headers: Partial<Record<keyof T & string, string>>): string {
  const columns = Object.entries(headers).map(([key, header]) => ({ key, header: header as string }));
  return stringify(rows, { bom: true, header: true, escape_formulas: true, columns });
}
