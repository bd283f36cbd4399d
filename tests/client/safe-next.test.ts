import { describe, expect, it } from 'vitest';
import { safeNext } from '@client/features/session/safe-next';

// After sign-in the client follows ?next= only within the site; anything a browser would read as
// another origin falls back to the account page.
describe('safeNext', () => {
  it('keeps same-site paths with their query and hash', () => {
    expect(safeNext('/builds/12')).toBe('/builds/12');
    expect(safeNext('/builds/12/card?paper=a4#qr')).toBe('/builds/12/card?paper=a4#qr');
  });

  it('falls back for nothing, relative paths and other origins', () => {
    for (const next of [null, '', 'builds', 'https://elsewhere.example', '//elsewhere.example', 'javascript:alert(1)']) {
      expect(safeNext(next), String(next)).toBe('/builds');
    }
  });

  it('falls back for paths whose dot segments resolve to "//host" (plain or percent-encoded)', () => {
    for (const next of ['/.//elsewhere.example', '/..//elsewhere.example', '/%2e//elsewhere.example', '/%2E%2E//elsewhere.example', '/builds/..//elsewhere.example']) {
      expect(safeNext(next), next).toBe('/builds');
    }
    // A double slash further along is an ordinary same-site path.
    expect(safeNext('/builds/./12')).toBe('/builds/12');
  });

  it('falls back for paths a browser turns into another origin (backslashes, tabs, newlines)', () => {
    for (const next of ['/\\elsewhere.example', '/\\/elsewhere.example', '/\t/elsewhere.example', '/\n/elsewhere.example', '\\\\elsewhere.example']) {
      expect(safeNext(next), JSON.stringify(next)).toBe('/builds');
    }
  });
});
