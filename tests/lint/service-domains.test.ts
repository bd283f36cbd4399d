import { mkdtempSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { findCircle, serviceFolderGraph } from '../support/service-graph';

// server/services/ is a folder per domain; a write that spans domains is a command in
// services/commands/, which may call any domain and which no domain imports. No two domains
// may import each other, however far round the circle goes.
describe('service domains', () => {
  it('import each other in no circle', () => {
    const graph = serviceFolderGraph('server/services');
    expect([...graph.keys()]).toEqual(expect.arrayContaining(['accounts', 'builds', 'media', 'shows', 'entries', 'show-day', 'judging', 'results', 'public', 'commands']));
    expect(findCircle(graph)).toBeNull();
    // Commands are the top: nothing imports them.
    expect([...graph].filter(([, uses]) => uses.has('commands')).map(([folder]) => folder)).toEqual([]);
  });

  it('are reported when two of them import each other, even through a third', () => {
    const root = mkdtempSync(path.join(tmpdir(), 'placard-domains-'));
    try {
      for (const [folder, body] of [
        ['shows', "import { publish } from '../results/publish';\nexport const step = publish;\n"],
        ['results', "import { judged } from '../judging/judged';\nexport const publish = judged;\n"],
        ['judging', "import { step } from '../shows/step';\nexport const judged = step;\n"],
        ['media', "export const photo = 1;\n"],
      ] as const) {
        mkdirSync(path.join(root, folder));
        writeFileSync(path.join(root, folder, 'index.ts'), body);
      }
      const circle = findCircle(serviceFolderGraph(root));
      // Found from whichever folder comes first; it closes on itself and names the three, not media.
      expect(circle).toHaveLength(4);
      expect(circle![0]).toBe(circle![3]);
      expect(new Set(circle)).toEqual(new Set(['shows', 'results', 'judging']));
    } finally {
      rmSync(root, { recursive: true, force: true });
    }
  });
});
