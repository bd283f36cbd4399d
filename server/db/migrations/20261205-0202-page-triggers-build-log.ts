import type { Migration } from '../migrator';
import { pageChangeTriggersSql } from '../../pages/page-dependencies';

// The build log and the questions are on the car's public page: their tables join PAGE_SOURCES, so the
// triggers are installed again from the list (idempotent: each is dropped and made anew). A database that
// ran the page-change migration before these tables existed gets their triggers here.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.sequelize.query(pageChangeTriggersSql());
};

export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  for (const table of ['build_log_posts', 'build_questions']) {
    await qi.sequelize.query(`DROP TRIGGER IF EXISTS placard_page_change ON ${table}; DROP TRIGGER IF EXISTS placard_page_truncate ON ${table};`);
  }
};
