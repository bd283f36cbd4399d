import { Op, type Transaction } from 'sequelize';
import type { PublishWarning, PublishWarningCar } from '@shared/schemas/results';
import { Build } from '../../models/build';
import { Criterion } from '../../models/criterion';
import { Entry } from '../../models/entry';
import { EventClass } from '../../models/event-class';
import { Score } from '../../models/score';
import { judgedEntries } from '../judging/judging';
import { finishedSheets } from './results';

/**
 * What publishing now would quietly get wrong: cars with scores that never arrived (left out of the
 * places) and arrived cars with no finished sheet (no place). Empty when publishing is plain sailing.
 */
export async function publishWarnings(eventId: number, transaction?: Transaction): Promise<PublishWarning[]> {
  const warnings: PublishWarning[] = [];
  const scoredIds = (await Score.findAll({ where: { eventId }, attributes: ['entryId'], group: ['entryId'], transaction })).map((s) => s.entryId);
  const scoredAway = scoredIds.length
    ? await Entry.findAll({
        where: { id: { [Op.in]: scoredIds }, status: { [Op.ne]: 'checked_in' } },
        include: [{ model: EventClass, as: 'eventClass', attributes: ['name'] }],
        order: [['number', 'ASC']],
        transaction,
      })
    : [];
  if (scoredAway.length) warnings.push({ kind: 'scored_not_arrived', cars: await carsOf(scoredAway, transaction) });

  const arrived = await judgedEntries(eventId, transaction);
  const criterionIds = (await Criterion.findAll({ where: { eventId }, attributes: ['id'], transaction })).map((c) => c.id);
  const sheets = await finishedSheets(eventId, arrived.map((e) => e.id), criterionIds, transaction);
  const withSheet = new Set(sheets.map((s) => s.entryId));
  const unsheeted = arrived.filter((e) => !withSheet.has(e.id));
  if (unsheeted.length) warnings.push({ kind: 'no_finished_sheet', cars: await carsOf(unsheeted, transaction) });
  return warnings;
}

async function carsOf(entries: Entry[], transaction?: Transaction): Promise<PublishWarningCar[]> {
  const builds = await Build.findAll({ where: { id: { [Op.in]: entries.map((e) => e.buildId) } }, attributes: ['id', 'title'], transaction });
  const titleOf = new Map(builds.map((b) => [b.id, b.title]));
  return entries.map((e) => ({ entryId: e.id, number: e.number as number, title: titleOf.get(e.buildId) ?? '', className: e.eventClass?.name ?? '' }));
}
