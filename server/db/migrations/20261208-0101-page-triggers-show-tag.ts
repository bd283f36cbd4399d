import type { Migration } from '../migrator';
import { PAGE_SOURCES, pageChangeTriggersSql } from '../../pages/page-dependencies';

// A show's own row and its classes now also name `show:<id>`, the tag a car's page holds for each show it is in,
// so another car's entry changing no longer drops it: the triggers are installed again from PAGE_SOURCES.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.sequelize.query(pageChangeTriggersSql());
};

// Back to the list before: the show's row and classes without `show:`.
export const down: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.sequelize.query(pageChangeTriggersSql({ ...PAGE_SOURCES, events: ['event:id', 'events'], event_classes: ['event:event_id'] }));
};
