import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';

/** Which service folders each service folder imports from (`from '../<folder>/…'`), read from the files. */
export function serviceFolderGraph(root: string): Map<string, Set<string>> {
  const graph = new Map<string, Set<string>>();
  for (const folder of readdirSync(root).filter((f) => statSync(path.join(root, f)).isDirectory())) {
    const uses = new Set<string>();
    for (const file of readdirSync(path.join(root, folder)).filter((f) => /\.tsx?$/.test(f))) {
      const text = readFileSync(path.join(root, folder, file), 'utf8');
      for (const m of text.matchAll(/from\s+['"]\.\.\/([\w-]+)\//g)) if (m[1] !== folder) uses.add(m[1]!);
      for (const m of text.matchAll(/import\(\s*['"]\.\.\/([\w-]+)\//g)) if (m[1] !== folder) uses.add(m[1]!);
    }
    graph.set(folder, uses);
  }
  return graph;
}

/** The first import circle between folders, as the folders around it (`a → b → a`), or null. */
export function findCircle(graph: Map<string, Set<string>>): string[] | null {
  const state = new Map<string, 'open' | 'done'>();
  const trail: string[] = [];
  const visit = (node: string): string[] | null => {
    if (state.get(node) === 'done') return null;
    if (state.get(node) === 'open') return [...trail.slice(trail.indexOf(node)), node];
    state.set(node, 'open');
    trail.push(node);
    for (const next of graph.get(node) ?? []) {
      const circle = visit(next);
      if (circle) return circle;
    }
    trail.pop();
    state.set(node, 'done');
    return null;
  };
  for (const node of graph.keys()) {
    const circle = visit(node);
    if (circle) return circle;
  }
  return null;
}
