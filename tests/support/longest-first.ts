import { BaseSequencer, type TestSpecification } from 'vitest/node';

/**
 * The order files are handed to the two workers. Within a group (`sequence.groupOrder`) the files
 * wait in one queue, so the last file to start decides how long the other worker waits at the end:
 * - the isolated and unit projects go first (each isolated file starts a process of its own; at the
 *   end of the group they left one worker idle while the other started the next), the api files after;
 * - within a project, the longest file first: vitest's cache of the last run when it has one, else the
 *   seconds below (a fresh checkout, as on CI, has no cache; vitest would then take the largest file first).
 */
const SECONDS_WITHOUT_CACHE: Record<string, number> = {
  'tests/e2e/accessibility.test.ts': 50,
  'tests/e2e/bulk-print.test.ts': 35,
  'tests/e2e/build-editor-autosave.test.ts': 30,
  'tests/e2e/build-editor.test.ts': 25,
  'tests/server/scale/worker-stops.test.ts': 32,
  'tests/server/cards/layout-data-sheet.test.ts': 31,
  'tests/server/cards/layout-poster.test.ts': 27,
  'tests/server/resilience/page-cache-two-processes.test.ts': 20,
  'tests/server/api/results-publishing.test.ts': 32,
  'tests/server/api/judging.test.ts': 24,
  'tests/server/api/figures-agree.test.ts': 20,
  'tests/server/api/text-fields.property.test.ts': 19,
  'tests/server/mail/server-with-catcher-port-taken.test.ts': 11,
};

const PROJECT_FIRST: Record<string, number> = { isolated: 0, unit: 1, api: 2 };

export default class LongestFirstSequencer extends BaseSequencer {
  override async sort(files: TestSpecification[]): Promise<TestSpecification[]> {
    const root = this.ctx.config.root;
    const relative = (spec: TestSpecification) => spec.moduleId.slice(root.length + 1);
    const seconds = (spec: TestSpecification) => {
      const cached = this.ctx.cache.getFileTestResults(`${spec.project.name}:${relative(spec)}`);
      return cached ? cached.duration / 1000 : (SECONDS_WITHOUT_CACHE[relative(spec)] ?? 0);
    };
    const failed = (spec: TestSpecification) => Boolean(this.ctx.cache.getFileTestResults(`${spec.project.name}:${relative(spec)}`)?.failed);
    const sorted = await super.sort(files);
    const at = new Map(sorted.map((spec, i) => [spec, i]));
    return [...sorted].sort(
      (a, b) =>
        a.project.config.sequence.groupOrder - b.project.config.sequence.groupOrder ||
        (PROJECT_FIRST[a.project.name] ?? 9) - (PROJECT_FIRST[b.project.name] ?? 9) ||
        a.project.name.localeCompare(b.project.name) ||
        Number(failed(b)) - Number(failed(a)) ||
        seconds(b) - seconds(a) ||
        at.get(a)! - at.get(b)!,
    );
  }
}
