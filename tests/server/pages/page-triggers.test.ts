import { describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@server/db/sequelize';
import { PAGE_SOURCES } from '@server/pages/page-dependencies';

type TriggerRow = { table: string; name: string; args: string[]; events: string };

/** The page-change triggers the migrations installed, read back from PostgreSQL's catalogue. */
async function installedTriggers(): Promise<TriggerRow[]> {
  return sequelize.query<TriggerRow>(
    `SELECT c.relname AS table, t.tgname AS name,
            -- tgargs holds the arguments one after another, each ended by a NUL byte.
            coalesce((string_to_array(rtrim(encode(t.tgargs, 'escape'), '\\000'), '\\000')), '{}') AS args,
            concat_ws(' ', CASE WHEN t.tgtype & 4 <> 0 THEN 'insert' END, CASE WHEN t.tgtype & 8 <> 0 THEN 'delete' END,
                           CASE WHEN t.tgtype & 16 <> 0 THEN 'update' END, CASE WHEN t.tgtype & 32 <> 0 THEN 'truncate' END) AS events
       FROM pg_trigger t JOIN pg_class c ON c.oid = t.tgrelid JOIN pg_namespace n ON n.oid = c.relnamespace
      WHERE n.nspname = current_schema() AND t.tgname IN ('placard_page_change', 'placard_page_truncate') AND NOT t.tgisinternal
      ORDER BY 1, 2`,
    { type: QueryTypes.SELECT },
  );
}

describe('the database triggers behind the page cache', () => {
  it('are exactly the tables and tags of PAGE_SOURCES: a source without its trigger (or a stale one) fails here', async () => {
    const rows = await installedTriggers();
    const changes = rows.filter((r) => r.name === 'placard_page_change');
    const truncates = rows.filter((r) => r.name === 'placard_page_truncate');
    const expected = Object.entries(PAGE_SOURCES)
      .map(([table, tags]) => ({ table, args: [...tags] }))
      .sort((a, b) => a.table.localeCompare(b.table));
    expect(changes.map((r) => ({ table: r.table, args: r.args })).sort((a, b) => a.table.localeCompare(b.table))).toEqual(expected);
    for (const r of changes) expect(r.events, r.table).toBe('insert delete update');
    expect(truncates.map((r) => r.table).sort()).toEqual(expected.map((e) => e.table));
    for (const r of truncates) expect(r.events, r.table).toBe('truncate');
  });
});
