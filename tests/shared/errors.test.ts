import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { fieldsFromIssues } from '@shared/errors';

describe('fieldsFromIssues', () => {
  it('names an unknown key called __proto__ or constructor like any other (the hostile-input tests found them left unnamed)', () => {
    const body = JSON.parse('{"__proto__": {"isSiteAdmin": true}, "constructor": 1, "title": "x"}') as unknown;
    const result = z.object({ title: z.string() }).strict().safeParse(body);
    expect(result.success).toBe(false);
    const fields = fieldsFromIssues(result.error!.issues);
    expect(Object.keys(fields).sort()).toEqual(['__proto__', 'constructor']);
    expect(JSON.parse(JSON.stringify({ fields })).fields).toEqual(fields);
    expect(Object.getPrototypeOf(fields)).toBe(Object.prototype);
  });

  it('keeps the first message of each field', () => {
    expect(fieldsFromIssues([{ path: ['a'], message: 'first' }, { path: ['a'], message: 'second' }, { path: [], message: 'whole' }])).toEqual({ a: 'first', _: 'whole' });
  });
});
