// Writes the record's static rendering of every template and test fixture to a folder,
// so a change to the presentation can be diffed byte for byte against the code before
// it: `npx tsx scripts/static-pages.ts OUT [--root CHECKOUT]` (--root renders with
// another checkout's runtime/, e.g. a worktree of main), then `diff -r OLD NEW`.
// Each document is rendered as written, with its first input made unreadable (error
// lines, upstream errors), and with every number in its inputs tripled (failing checks);
// each with the working of its library calls, as Export writes it.

import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { basename, join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

const args = process.argv.slice(2);
const out = resolve(args[0] ?? 'test-artifacts/static-pages');
const rootAt = args.indexOf('--root');
const root = resolve(rootAt >= 0 ? args[rootAt + 1] : '.');
const here = resolve(import.meta.dirname, '..');

const load = (path: string) => import(pathToFileURL(join(root, path)).href);
const { parse } = await load('runtime/format/index.ts');
const { createEngine } = await load('runtime/engine.ts');
const { staticHtml } = await load('runtime/record/static-html.ts');

type Doc = { meta: unknown; cells: { kind: string; value?: string }[] };

const files = [
  ...readdirSync(join(here, 'docs-templates')).filter((f) => f.endsWith('.lt')).map((f) => join(here, 'docs-templates', f)),
  ...readdirSync(join(here, 'tests/e2e/fixtures')).filter((f) => f.endsWith('.lt')).map((f) => join(here, 'tests/e2e/fixtures', f)),
];

const variants: Record<string, (d: Doc) => Doc> = {
  asis: (d) => d,
  bad: (d) => {
    const i = d.cells.findIndex((c) => c.kind === 'input' && !('choices' in c));
    return i < 0 ? d : { ...d, cells: d.cells.map((c, j) => (j === i ? { ...c, value: '3 psi psi (' } : c)) };
  },
  triple: (d) => ({
    ...d,
    cells: d.cells.map((c) => (c.kind === 'input' && !('choices' in c) && c.value
      ? { ...c, value: c.value.replace(/\d+(?:\.\d+)?/g, (n) => String(Number(n) * 3)) } : c)),
  }),
};

mkdirSync(out, { recursive: true });
for (const file of files) {
  const doc = parse(readFileSync(file, 'utf8')).doc as Doc;
  for (const [name, vary] of Object.entries(variants)) {
    const d = vary(doc);
    const engine = createEngine(d);
    await engine.settled();
    const html = staticHtml(d, (id: string) => engine.state(id), {
      digest: '0'.repeat(64), exportedAt: '2026-01-01T00:00:00Z', calls: (id: string) => engine.libraryCalls?.(id) ?? [],
    });
    engine.dispose();
    writeFileSync(join(out, `${basename(file, '.lt')}.${name}.html`), html);
  }
}
console.log(`${files.length * Object.keys(variants).length} static pages in ${out} (runtime from ${root})`);
