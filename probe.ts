import { createEngine } from './runtime/engine';
import { parse } from './runtime/format/index';
import { readFileSync } from 'node:fs';
import { setInputValueKeepUnit } from './runtime/edit/index';
const file = process.argv[2];
const { doc } = parse(readFileSync(file, 'utf8'));
for (const spec of process.argv.slice(3)) {
  const [name, v] = spec.split('=');
  const cell = doc.cells.find((c) => c.kind === 'input' && c.name === name)!;
  const d = setInputValueKeepUnit(doc, cell.id, v);
  const e = createEngine(d);
  await e.settled();
  const s = e.state(cell.id)!;
  const bad = d.cells.filter((c) => ['error', 'fail'].includes(e.state(c.id)?.status ?? '') && e.state(c.id)?.error?.kind !== 'upstream');
  const weird = d.cells.filter((c) => c.kind === 'check' && e.state(c.id)?.ratio !== undefined && (e.state(c.id)!.ratio! < 0));
  console.log(`${name} = ${v} -> ${s.status} ${s.display?.text ?? ''} ${s.error?.message ?? ''}`);
  for (const c of bad.slice(0, 4)) console.log('   ', (c as any).name ?? c.id, e.state(c.id)!.status, e.state(c.id)!.error?.message ?? '');
  for (const c of weird) console.log('   NEG RATIO', c.id, e.state(c.id)!.status, e.state(c.id)!.ratio);
  e.dispose();
}
