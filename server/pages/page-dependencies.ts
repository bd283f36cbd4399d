/**
 * What each public page shows, declared once. A page is cached with the tags below; a committed write
 * to one of the tables in PAGE_SOURCES names its tags on the `placard_pages` channel (a trigger
 * installed from this list, see installPageChangeTriggers), and every process drops the pages holding
 * any of them. A test checks that the database's triggers are this list.
 */
export const PAGE_CHANGE_CHANNEL = 'placard_pages';

/** Every cached page is dropped when this tag arrives (a TRUNCATE, or a listener that was away). */
export const EVERY_PAGE = '*';

/**
 * For each table a public page reads: the tags a changed row names. `kind:column` names the row's
 * value (before and after the change), a bare word names itself (a change anywhere in that table).
 */
export const PAGE_SOURCES = {
  builds: ['build:id', 'builds'],
  build_sections: ['build:build_id'],
  photos: ['build:build_id'],
  dyno_runs: ['build:build_id'],
  weigh_ins: ['build:build_id'],
  build_log_posts: ['build:build_id'],
  build_questions: ['build:build_id'],
  users: ['user:id', 'users'],
  events: ['event:id', 'events', 'show:id'],
  event_classes: ['event:event_id', 'show:event_id'],
  entries: ['event:event_id', 'build:build_id'],
  published_results: ['event:event_id'],
} as const satisfies Record<string, readonly string[]>;

/** The tags of each public page: what it shows, in the words of PAGE_SOURCES. */
export const pageTags = {
  /** The home page: the newest published builds (and their owners), and the shows taking entries. */
  home: () => ['builds', 'users', 'events'],
  /**
   * A car's page: the build, its owner, and each show it is entered in: the show's own row and classes
   * (`show:`; its name, status, voting, the class name), while its own entry names the build. Another
   * car's entry (a check-in every few seconds on show day) leaves it alone, as `event:` would not.
   */
  build: (buildId: number, ownerId: number, eventIds: number[]) => [`build:${buildId}`, `user:${ownerId}`, ...eventIds.map((id) => `show:${id}`)],
  /** A show's page: the show, its classes, entries and results, and the title of each car listed. */
  event: (eventId: number, buildIds: number[]) => [`event:${eventId}`, ...buildIds.map((id) => `build:${id}`)],
};

const quote = (s: string) => `'${s.replace(/'/g, "''")}'`;

/** SQL that (re)installs the trigger of every table in PAGE_SOURCES (or an older list, for a migration's down); a migration runs it whenever the list changes. */
export function pageChangeTriggersSql(sources: Record<string, readonly string[]> = PAGE_SOURCES): string {
  const perTable = Object.entries(sources).map(
    ([table, tags]) => `
    DROP TRIGGER IF EXISTS placard_page_change ON ${table};
    CREATE TRIGGER placard_page_change AFTER INSERT OR UPDATE OR DELETE ON ${table}
      FOR EACH ROW EXECUTE FUNCTION placard_page_changed(${tags.map(quote).join(', ')});
    DROP TRIGGER IF EXISTS placard_page_truncate ON ${table};
    CREATE TRIGGER placard_page_truncate AFTER TRUNCATE ON ${table}
      FOR EACH STATEMENT EXECUTE FUNCTION placard_pages_truncated();`,
  );
  return `
    CREATE OR REPLACE FUNCTION placard_page_changed() RETURNS trigger LANGUAGE plpgsql AS $$
    DECLARE
      tags text[] := '{}';
      spec text;
      val text;
      r jsonb;
    BEGIN
      FOREACH spec IN ARRAY TG_ARGV LOOP
        IF position(':' IN spec) = 0 THEN
          tags := tags || spec;
        ELSE
          FOREACH r IN ARRAY ARRAY[CASE WHEN TG_OP <> 'INSERT' THEN to_jsonb(OLD) END, CASE WHEN TG_OP <> 'DELETE' THEN to_jsonb(NEW) END] LOOP
            val := r ->> split_part(spec, ':', 2);
            IF val IS NOT NULL THEN tags := tags || (split_part(spec, ':', 1) || ':' || val); END IF;
          END LOOP;
        END IF;
      END LOOP;
      -- Sent at commit, and only then; identical notifications of one transaction arrive once.
      PERFORM pg_notify(${quote(PAGE_CHANGE_CHANNEL)}, array_to_string(ARRAY(SELECT DISTINCT unnest(tags)), ' '));
      RETURN NULL;
    END $$;
    CREATE OR REPLACE FUNCTION placard_pages_truncated() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      PERFORM pg_notify(${quote(PAGE_CHANGE_CHANNEL)}, ${quote(EVERY_PAGE)});
      RETURN NULL;
    END $$;
    ${perTable.join('\n')}`;
}
