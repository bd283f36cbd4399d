import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

// .env.example must name every variable the server reads, so a deployment can see them all.
describe('.env.example', () => {
  it('names every variable of server/config.ts', () => {
    const config = readFileSync('server/config.ts', 'utf8');
    const schema = config.slice(config.indexOf('const EnvSchema'), config.indexOf('});', config.indexOf('const EnvSchema')));
    const read = [...schema.matchAll(/^\s{2}([A-Z][A-Z0-9_]+):/gm)].map((m) => m[1]);
    const example = readFileSync('.env.example', 'utf8');
    expect(read.length).toBeGreaterThan(10);
    expect(read.filter((name) => !new RegExp(`^# ${name}=`, 'm').test(example))).toEqual([]);
  });
});
