import argon2 from 'argon2';

// argon2id with the library's defaults (64 MiB, 3 passes), which follow RFC 9106's second recommended option.
export const hashPassword = (plain: string) => argon2.hash(plain, { type: argon2.argon2id });

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
