import argon2 from 'argon2';
import { describe, expect, it } from 'vitest';
import { loadConfig, PASSWORD_HASH_DEFAULTS } from '@server/config';
import { hashPassword, verifyPassword } from '@server/auth/passwords';

const PRODUCTION = { NODE_ENV: 'production', SESSION_SECRET: 'x'.repeat(32), PUBLIC_BASE_URL: 'https://cards.example.test', PAYMENTS_ONLINE: 'false' };

// The production cost is argon2's own default, RFC 9106 section 4's second recommended option
// (argon2id, 64 MiB, 3 passes, 4 lanes); tests hash at the cheapest cost so that signing in stays fast.
describe('password hash cost', () => {
  it('is the RFC 9106 setting in production and development, and the cheapest under test', () => {
    expect(PASSWORD_HASH_DEFAULTS).toEqual({ memoryKiB: 65_536, passes: 3, lanes: 4 });
    expect(loadConfig(PRODUCTION).passwordHash).toEqual(PASSWORD_HASH_DEFAULTS);
    expect(loadConfig({}).passwordHash).toEqual(PASSWORD_HASH_DEFAULTS);
    expect(loadConfig({ NODE_ENV: 'test' }).passwordHash).toEqual({ memoryKiB: 1024, passes: 1, lanes: 1 });
  });

  it('refuses a weak cost in production, naming the variable', () => {
    expect(() => loadConfig({ ...PRODUCTION, PASSWORD_HASH_MEMORY_KIB: '1024' })).toThrow(/PASSWORD_HASH_MEMORY_KIB/);
    expect(() => loadConfig({ ...PRODUCTION, PASSWORD_HASH_PASSES: '1' })).toThrow(/PASSWORD_HASH_PASSES/);
    expect(loadConfig({ ...PRODUCTION, PASSWORD_HASH_MEMORY_KIB: '131072' }).passwordHash.memoryKiB).toBe(131_072);
  });

  it('verifies a hash made at the production cost, whatever the running cost', async () => {
    const production = await argon2.hash('correct horse battery', { type: argon2.argon2id, memoryCost: 65_536, timeCost: 3, parallelism: 4 });
    expect(production).toMatch(/^\$argon2id\$v=19\$m=65536,t=3,p=4\$/);
    expect(await verifyPassword(production, 'correct horse battery')).toBe(true);
    expect(await verifyPassword(production, 'correct horse batterY')).toBe(false);
  });

  it('hashes new passwords at the running cost', async () => {
    const hash = await hashPassword('long enough password');
    expect(hash).toMatch(/^\$argon2id\$v=19\$m=1024,t=1,p=1\$/);
    expect(await verifyPassword(hash, 'long enough password')).toBe(true);
  });
});
