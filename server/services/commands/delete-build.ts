import type { Transaction } from 'sequelize';
import { withTransaction } from '../../db/transaction';
import { ConflictError } from '../../errors';
import type { Build } from '../../models/build';
import { deleteBuildIn } from '../builds/builds';
import { blockingEntryOf } from '../entries/entries';

/**
 * Deletes a build unless a show it is entered in still needs it: the entry is checked and the build
 * deleted in one transaction. The photo files are the caller's to delete once it has committed.
 */
export async function deleteBuild(build: Build, outer?: Transaction): Promise<{ photoKeys: string[] }> {
  return withTransaction(outer, async (transaction) => {
    const show = await blockingEntryOf(build.id, transaction);
    if (show) throw new ConflictError(`This build is entered in ${show}. Withdraw the entry, or wait until the show is over, before deleting the build.`, { id: `Entered in ${show}.` });
    return deleteBuildIn(build, transaction);
  });
}
