import argon2 from 'argon2';
import { config } from '../config';

/**
 * argon2id at the configured cost. The default (64 MiB, 3 passes, 4 lanes) is the library's own and
 * follows RFC 9106's second recommended option; tests run at the smallest cost the config allows
 * outside production. A stored hash carries its own parameters, so verifying never depends on the config.
 */
export const hashPassword = (plain: string) =>
  argon2.hash(plain, { type: argon2.argon2id, memoryCost: config.passwordHash.memoryKiB, timeCost: config.passwordHash.passes, parallelism: config.passwordHash.lanes });

let dummyHash: Promise<string> | undefined;

/** Verifies a password; with no stored hash it still spends the same time, so unknown e-mails are not revealed by timing. */
export async function verifyPassword(hash: string | undefined, plain: string): Promise<boolean> {
  if (!hash) {
    dummyHash ??= hashPassword('placard-timing-equaliser');
    await argon2.verify(await dummyHash, plain).catch(() => false);
    return false;
  }
  return argon2.verify(hash, plain).catch(() => false);
}
