import { describe, expect, it } from 'vitest';
import { lightFormat, plainWords, safeLink } from '@shared/build-log/light-format';

describe('light formatting of posts and answers', () => {
  it('splits paragraphs at blank lines and keeps single line breaks', () => {
    expect(lightFormat('First line\nsecond line\n\n\nNext paragraph')).toEqual([
      [[{ kind: 'text', text: 'First line' }], [{ kind: 'text', text: 'second line' }]],
      [[{ kind: 'text', text: 'Next paragraph' }]],
    ]);
  });

  it('reads *emphasis* and leaves lone stars as they are', () => {
    expect(lightFormat('It is *very* loud * at idle')[0]![0]).toEqual([
      { kind: 'text', text: 'It is ' },
      { kind: 'em', text: 'very' },
      { kind: 'text', text: ' loud * at idle' },
    ]);
  });

  it('links http and https addresses only, without the sentence’s full stop', () => {
    expect(lightFormat('See https://example.test/sheet?a=1. Then javascript:alert(1) and ftp://x.test')[0]![0]).toEqual([
      { kind: 'text', text: 'See ' },
      { kind: 'link', text: 'https://example.test/sheet?a=1', href: 'https://example.test/sheet?a=1' },
      { kind: 'text', text: '. Then javascript:alert(1) and ftp://x.test' },
    ]);
    expect(safeLink('javascript:alert(1)')).toBeNull();
    expect(safeLink('http://')).toBeNull();
  });

  it('keeps markup as plain text for the screen to escape', () => {
    expect(lightFormat('<b>hi</b> <a href="x">')[0]![0]).toEqual([{ kind: 'text', text: '<b>hi</b> <a href="x">' }]);
  });

  it('gives the plain words for a card line', () => {
    expect(plainWords('The *first* fire-up.\n\nIt ran.')).toBe('The first fire-up. It ran.');
  });
});
