import type { Migration } from '../migrator';
import { pageChangeTriggersSql, PAGE_SOURCES } from '../../pages/page-dependencies';

// Public pages are cached in every web process: a committed change to what a page shows names the
// page's tags on the `placard_pages` channel, from triggers installed from the one declared list
// (server/pages/page-dependencies.ts). A later change to that list adds a migration that runs this again.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.sequelize.query(pageChangeTriggersSql());
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  for (const table of Object.keys(PAGE_SOURCES)) {
    await qi.sequelize.query(`DROP TRIGGER IF EXISTS placard_page_change ON ${table}; DROP TRIGGER IF EXISTS placard_page_truncate ON ${table};`);
  }
  await qi.sequelize.query('DROP FUNCTION IF EXISTS placard_page_changed(); DROP FUNCTION IF EXISTS placard_pages_truncated();');
};
