// The import graph of the project's own TypeScript files, read from their text:
// every `import … from`, `export … from`, `import type` and `import('…')` of a
// relative path. Used by the layout test and scripts/import-cycles.ts.

import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { findCycles } from '../../runtime/graph/cycles';

const ROOTS = ['runtime', 'cells', 'tests', 'bench', 'scripts', 'types'];
const SPEC = /(?:^|[\s;])(?:import|export)\s+(?:type\s+)?(?:[^'";]*?\sfrom\s+)?['"](\.{1,2}\/[^'"]+)['"]|import\(\s*['"](\.{1,2}\/[^'"]+)['"]\s*\)/g;

/** Every .ts file under the project's source folders, relative to `root`. */
export function sourceFiles(root: string): string[] {
  const out: string[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const path = join(dir, name);
      if (statSync(path).isDirectory()) {
        if (name !== 'node_modules') walk(path);
      } else if (/\.ts$/.test(name)) out.push(relative(root, path));
    }
  };
  for (const r of ROOTS) if (existsSync(join(root, r))) walk(join(root, r));
  return out.sort();
}

function resolveSpec(root: string, from: string, spec: string): string | undefined {
  const base = resolve(root, dirname(from), spec);
  for (const candidate of [base, `${base}.ts`, join(base, 'index.ts')]) {
    if (existsSync(candidate) && statSync(candidate).isFile() && candidate.endsWith('.ts')) return relative(root, candidate);
  }
  return undefined;
}

/** file → the project files it imports (type-only imports included). */
export function importGraph(root: string): Map<string, string[]> {
  const graph = new Map<string, string[]>();
  for (const file of sourceFiles(root)) {
    const text = readFileSync(join(root, file), 'utf8').replace(/\/\*[\s\S]*?\*\/|\/\/[^\n]*/g, '');
    const deps = new Set<string>();
    for (const m of text.matchAll(SPEC)) {
      const target = resolveSpec(root, file, m[1] ?? m[2]);
      if (target) deps.add(target);
    }
    graph.set(file, [...deps]);
  }
  return graph;
}

/** The files of each cycle: every strongly connected group of two or more files, or a file importing itself. */
export function importCycles(root: string, graph: Map<string, string[]> = importGraph(root)): string[][] {
  return findCycles(graph.keys(), (f) => graph.get(f) ?? []).map((group) => group.sort());
}
