import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

/** Show-side paths: anything about one show or one entry. */
const SHOW_SIDE_PATH = /^\/(events|entries)\/:id(\/|$)/;
/** What only load-for.ts may use: a route that reaches for these decides access on its own. */
const OWN_ACCESS = /\b(actorInEvent|authorizeEntry|canEvent|canEntry)\b|\bauthorizeEvent\(\s*\w+,\s*'(?!create')/;

/**
 * Every show-side route of one router file that does not load its show or entry through
 * loadEventFor/loadEntryFor, and every line that decides access outside load-for.ts.
 */
export function routeShapeProblems(file: string, source: string): string[] {
  const problems: string[] = [];
  const handlers = source.split(/\n(?=\s*\w+Router\.(?:get|post|put|patch|delete)\()/);
  for (const handler of handlers) {
    const head = /\w+Router\.(get|post|put|patch|delete)\(\s*['`]([^'`]+)['`]/.exec(handler);
    if (!head || !SHOW_SIDE_PATH.test(head[2]!)) continue;
    if (!/\bload(Event|Entry)For\(req, /.test(handler)) problems.push(`${file}: ${head[1]!.toUpperCase()} ${head[2]} does not load through loadEventFor/loadEntryFor`);
  }
  source.split('\n').forEach((line, i) => {
    if (!line.trimStart().startsWith('import') && OWN_ACCESS.test(line)) problems.push(`${file}:${i + 1}: decides access itself: ${line.trim()}`);
  });
  return problems;
}

/** The problems of every router file in a folder (load-for.ts itself excepted). */
export function routeFolderProblems(folder: string): { files: number; problems: string[] } {
  const files = readdirSync(folder).filter((f) => f.endsWith('.ts') && f !== 'load-for.ts');
  return { files: files.length, problems: files.flatMap((f) => routeShapeProblems(f, readFileSync(path.join(folder, f), 'utf8'))) };
}
