// The layer rules of eslint.config.js, each shown failing on a wrong import and passing on a right one,
// so a rule that stops firing (a typo in a zone, a resolver that no longer resolves) fails here.
import { ESLint } from 'eslint';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
let eslint: ESLint;

beforeAll(() => {
  eslint = new ESLint({ cwd: ROOT });
});

/** The messages ESLint gives for `code` as if it were the file at `file` (the file need not exist). */
async function lintAs(file: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(`${code}\n`, { filePath: path.join(ROOT, file) });
  return (result?.messages ?? []).map((m) => `${m.ruleId}: ${m.message}`);
}

describe('layer rules', () => {
  it('keep shared/ free of server, client, Node and other packages', async () => {
    const messages = await lintAs('shared/probe.ts', [
      "import { config } from '@server/config';",
      "import { apiFetch } from '@client/lib/api';",
      "import { readFileSync } from 'node:fs';",
      "import { useState } from 'react';",
      'export const all = [config, apiFetch, readFileSync, useState];',
    ].join('\n'));
    expect(messages).toContainEqual(expect.stringMatching(/no-restricted-paths: .*"@server\/config".*shared\/ is pure/));
    expect(messages).toContainEqual(expect.stringMatching(/no-restricted-paths: .*"@client\/lib\/api".*shared\/ is pure/));
    expect(messages).toContainEqual(expect.stringMatching(/no-nodejs-modules: .*"node:fs"/));
    expect(messages).toContainEqual(expect.stringMatching(/no-restricted-imports: 'react' .*shared\/ imports only itself and zod/));
    expect(await lintAs('shared/probe.ts', "import { z } from 'zod';\nimport { convert } from '../shared/calc';\nimport { SECTION_KINDS } from '@shared/schemas/build-sections';\nexport const all = [z, convert, SECTION_KINDS];")).toEqual([]);
  });

  it('keep client/ out of server/ and templates/ and off Node', async () => {
    const messages = await lintAs('client/src/probe.ts', [
      "import { config } from '@server/config';",
      "import { User } from '../../server/models/user';",
      "import { CardDocument } from '@templates/cards/card-document';",
      "import { join } from 'node:path';",
      'export const all = [config, User, CardDocument, join];',
    ].join('\n'));
    expect(messages.filter((m) => /no-restricted-paths: .*client\/ never imports server\//.test(m))).toHaveLength(2);
    expect(messages).toContainEqual(expect.stringMatching(/no-restricted-paths: .*"@templates\/cards\/card-document".*client\/ never imports templates\//));
    expect(messages).toContainEqual(expect.stringMatching(/no-nodejs-modules: .*"node:path"/));
    // templates/charts are the one part of templates/ the browser draws too; they stay off Node.
    expect(await lintAs('client/src/probe.ts', "import { DynoChart } from '@templates/charts/dyno-chart';\nexport const all = [DynoChart];")).toEqual([]);
    expect(await lintAs('templates/charts/probe.ts', "import { readFileSync } from 'node:fs';\nexport const all = [readFileSync];")).toContainEqual(expect.stringMatching(/no-nodejs-modules: .*"node:fs"/));
  });

  it('keep routes and pages away from models, the database and storage', async () => {
    const messages = await lintAs('server/routes/probe.ts', [
      "import { User } from '../models/user';",
      "import type { Build } from '@server/models/build';",
      "import { sequelize } from '../db/sequelize';",
      "import { storage } from '../storage/index';",
      'export const all = [User, sequelize, storage];',
      'export type B = Build;',
    ].join('\n'));
    expect(messages.filter((m) => /no-restricted-paths: .*Routes and pages never touch models/.test(m))).toHaveLength(4);
    const page = await lintAs('server/pages/probe.ts', "import { Build } from '../models/build';\nexport const all = [Build];");
    expect(page).toContainEqual(expect.stringMatching(/Routes and pages never touch models/));
    expect(await lintAs('server/routes/probe.ts', "import { findBuild } from '../services/builds/builds';\nimport { presentPhoto } from '../presenters/photo';\nexport const all = [findBuild, presentPhoto];")).toEqual([]);
  });

  it('keep presenters to picking fields: no services, model types only', async () => {
    const messages = await lintAs('server/presenters/probe.ts', [
      "import { findBuild } from '../services/builds/builds';",
      "import { User } from '../models/user';",
      "import { storage } from '../storage/index';",
      'export const all = [findBuild, User, storage];',
    ].join('\n'));
    expect(messages).toContainEqual(expect.stringMatching(/no-restricted-paths: .*"\.\.\/services\/builds\/builds".*Presenters only pick fields/));
    expect(messages).toContainEqual(expect.stringMatching(/no-restricted-imports: '\.\.\/models\/user' .*import type/));
    expect(messages).toContainEqual(expect.stringMatching(/no-restricted-paths: .*"\.\.\/storage\/index".*storage key and URL shapes/));
    expect(await lintAs('server/presenters/probe.ts', "import type { Build } from '../models/build';\nimport { mediaUrl } from '../storage/keys';\nexport type B = Build;\nexport const all = [mediaUrl];")).toEqual([]);
  });

  it('keep services from presenting', async () => {
    const messages = await lintAs('server/services/probe.ts', "import { presentPhoto } from '../presenters/photo';\nexport const all = [presentPhoto];");
    expect(messages).toContainEqual(expect.stringMatching(/no-restricted-paths: .*Services do not import presenters/));
  });

  it('keep templates free of server and client code', async () => {
    const messages = await lintAs('templates/cards/probe.ts', "import { config } from '@server/config';\nimport { queryClient } from '@client/lib/query-client';\nexport const all = [config, queryClient];");
    expect(messages.filter((m) => /no-restricted-paths: .*templates\/ import no server or client code/.test(m))).toHaveLength(2);
  });

  it('refuse an import the rules cannot resolve, so none slips past them', async () => {
    const messages = await lintAs('server/routes/probe.ts', "import { x } from '../modelz/user';\nexport const all = [x];");
    expect(messages).toContainEqual(expect.stringMatching(/no-unresolved: Unable to resolve path to module '\.\.\/modelz\/user'/));
  });
});
