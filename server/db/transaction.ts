import type { Transaction } from 'sequelize';
import { sequelize } from './sequelize';

/**
 * Runs `work` in the caller's transaction when there is one, else in a new one: how a service
 * takes an optional transaction, so it can be one step of a larger change or stand alone.
 */
export function withTransaction<T>(transaction: Transaction | undefined, work: (transaction: Transaction) => Promise<T>): Promise<T> {
  return transaction ? work(transaction) : sequelize.transaction(work);
}
