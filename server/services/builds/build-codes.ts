import { randomInt } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { BUILD_CODE_ALPHABET, BUILD_CODE_LENGTH } from '@shared/schemas/build';
import { Build } from '../../models/build';
import { RetiredBuildCode } from '../../models/retired-build-code';

export function randomBuildCode(length = BUILD_CODE_LENGTH): string {
  let code = '';
  for (let i = 0; i < length; i++) code += BUILD_CODE_ALPHABET[randomInt(BUILD_CODE_ALPHABET.length)];
  return code;
}

/** A code no build has now or ever had (31^7 ≈ 27 billion codes: a clash is rare, so a few tries suffice). */
export async function newBuildCode(transaction?: Transaction): Promise<string> {
  for (let attempt = 0; attempt < 10; attempt++) {
    const code = randomBuildCode();
    const [live, retired] = await Promise.all([Build.count({ where: { code }, transaction }), RetiredBuildCode.count({ where: { code }, transaction })]);
    if (live === 0 && retired === 0) return code;
  }
  throw new Error('Could not find a free build code after 10 tries');
}
