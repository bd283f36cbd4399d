import type { Model, ModelStatic, Transaction, WhereOptions } from 'sequelize';
import { NotFoundError } from '../errors';

/**
 * The row with this id in this show, or a 404 naming what was asked for: an id of another show's
 * row finds nothing, so a show's routes cannot reach into another show.
 */
export async function oneOfShow<M extends Model>(model: ModelStatic<M>, id: number, eventId: number, what: string, transaction?: Transaction): Promise<M> {
  const row = await model.findOne({ where: { id, eventId } as WhereOptions, transaction });
  if (!row) throw new NotFoundError(`No such ${what} in this show.`);
  return row;
}
