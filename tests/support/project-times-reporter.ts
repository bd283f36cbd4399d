import type { Reporter, TestModule } from 'vitest/node';

/**
 * Prints, after the run, each test project's wall time (its first file's start to its last file's
 * end), files and tests, so a slow project shows at a glance.
 */
export default class ProjectTimesReporter implements Reporter {
  private readonly spans = new Map<string, { start: number; end: number; files: number; tests: number }>();

  onTestModuleStart(module: TestModule): void {
    const name = module.project.name || 'tests';
    const span = this.spans.get(name) ?? { start: Date.now(), end: Date.now(), files: 0, tests: 0 };
    this.spans.set(name, span);
  }

  onTestModuleEnd(module: TestModule): void {
    const span = this.spans.get(module.project.name || 'tests');
    if (!span) return;
    span.end = Date.now();
    span.files += 1;
    span.tests += [...module.children.allTests()].length;
  }

  onTestRunEnd(): void {
    if (!this.spans.size) return;
    const rows = [...this.spans].sort(([, a], [, b]) => a.start - b.start);
    const first = rows[0]![1].start;
    console.log('\nTime per test project (wall clock, from the first file of the run):');
    for (const [name, s] of rows) {
      console.log(`  ${name.padEnd(9)} ${((s.end - s.start) / 1000).toFixed(1).padStart(6)} s   from ${((s.start - first) / 1000).toFixed(1).padStart(5)} s   ${String(s.files).padStart(3)} files ${String(s.tests).padStart(4)} tests`);
    }
  }
}
