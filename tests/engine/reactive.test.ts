import { describe, expect, it } from 'vitest';
import type { CalcDocument } from '../../runtime/document';
import { deleteCell, renameCell, setExpr, setInputValue, insertCell } from '../../runtime/edit';
import type { LibFunction } from '../../runtime/library/types';
import { doc, formula, input, run } from './helpers';

function counter() {
  const calls: Record<string, number> = {};
  const fn: LibFunction = {
    name: 'tick', params: [{ name: 'tag', type: 'text' }, { name: 'x', type: '1' }], returns: '1',
    clause: 'test probe', doc: 'counts its calls',
    fn: (tag: string, x: number) => {
      calls[tag] = (calls[tag] ?? 0) + 1;
      return x;
    },
  };
  return { calls, fn };
}

describe('reactive graph', () => {
  it('an edit recomputes only what depends on it', async () => {
    const { calls, fn } = counter();
    const d = doc(
      input('a', '1'), input('b', '2'),
      formula('x', 'tick("x", a * 2)'), formula('y', 'tick("y", b * 3)'), formula('z', 'tick("z", x + 1)'),
    );
    const { engine, byName } = await run(d, [fn]);
    expect(calls).toEqual({ x: 1, y: 1, z: 1 });
    engine.update(setInputValue(engine.doc, d.cells[0].id, '5'));
    await engine.settled();
    expect(calls).toEqual({ x: 2, y: 1, z: 2 });
    expect(byName('z').value).toBe(11);
  });

  it('subscribers hear exactly the cells whose state changed, plus readers of them', async () => {
    const d = doc(input('a', '1'), input('b', '2'), formula('x', 'a * 2'), formula('y', 'b * 3'), formula('m', 'max(x, 100)'));
    const { engine } = await run(d);
    const heard: string[][] = [];
    engine.subscribe((ids) => heard.push(ids.sort()));
    engine.update(setInputValue(engine.doc, d.cells[0].id, '3'));
    await engine.settled();
    // m keeps its value (100) but re-shows the new x it substitutes.
    expect(heard).toEqual([[d.cells[0].id, d.cells[2].id, d.cells[4].id].sort()]);
  });

  it('adds, renames, redefines and deletes cells while running', async () => {
    const d = doc(input('w', '2 klf'), input('span', '20 ft'), formula('M', 'w * span^2 / 8', 'kip*ft'));
    const { engine, byName } = await run(d);
    expect(byName('M').display?.text).toBe('100 kip*ft');

    // add: a cell that reads M
    let next: CalcDocument = insertCell(engine.doc, { kind: 'formula', id: 'new1', name: 'Mu', expr: '1.6 * M', unit: 'kip*ft' });
    engine.update(next);
    await engine.settled();
    expect(byName('Mu').display?.text).toBe('160 kip*ft');

    // rename span → ln rewrites the formula that reads it
    next = renameCell(engine.doc, d.cells[1].id, 'ln');
    expect((next.cells[2] as { expr: string }).expr).toBe('w * ln^2 / 8');
    engine.update(next);
    await engine.settled();
    expect(byName('M').display?.text).toBe('100 kip*ft');

    // redefine
    engine.update(setExpr(engine.doc, d.cells[2].id, 'w * ln^2 / 10'));
    await engine.settled();
    expect(byName('Mu').display?.text).toBe('128 kip*ft');

    // delete an upstream cell: its reader says so
    engine.update(deleteCell(engine.doc, d.cells[0].id));
    await engine.settled();
    expect(byName('M').error?.kind).toBe('unknown-name');
    expect(byName('Mu').error).toMatchObject({ kind: 'upstream', upstream: 'M' });

    // and bring it back under the same name: everything recovers
    engine.update(insertCell(engine.doc, { kind: 'input', id: 'w2', name: 'w', value: '1 klf' }, 0));
    await engine.settled();
    expect(byName('Mu').display?.text).toBe('64 kip*ft');
    engine.dispose();
  });

  it('a type change upstream re-checks readers', async () => {
    const d = doc(input('a', '2 in'), formula('b', 'a * 2', 'in'));
    const { engine, byName } = await run(d);
    engine.update(setInputValue(engine.doc, d.cells[0].id, '2 kip'));
    await engine.settled();
    expect(byName('b').error?.kind).toBe('unit');
  });

  it('a bad input value is reported while the last good value keeps computing', async () => {
    const d = doc(input('h', '10 in'), formula('d', 'h - 1 in', 'in'));
    const { engine, byName } = await run(d);
    engine.update(setInputValue(engine.doc, d.cells[0].id, '10 inn'));
    await engine.settled();
    expect(byName('h').status).toBe('error');
    expect(byName('h').display?.text).toBe('10 in');
    expect(byName('d').display?.text).toBe('9 in');
    expect((engine.doc.cells[0] as { value: string }).value).toBe('10 inn'); // nothing typed is lost
    engine.update(setInputValue(engine.doc, d.cells[0].id, '12 in'));
    await engine.settled();
    expect(byName('h').status).toBe('ok');
    expect(byName('d').display?.text).toBe('11 in');
  });

  it('fixing a loop recovers every member', async () => {
    const d = doc(formula('a', 'b + 1'), formula('b', 'a + 1'));
    const { engine, byName } = await run(d);
    expect(byName('a').error?.kind).toBe('cycle');
    engine.update(setExpr(engine.doc, d.cells[1].id, '1'));
    await engine.settled();
    expect(byName('a').value).toBe(2);
    expect(byName('b').value).toBe(1);
  });

  it('dispose frees everything and stops updates', async () => {
    const { engine } = await run(doc(input('a', '1'), formula('b', 'a + 1')));
    let heard = 0;
    engine.subscribe(() => heard++);
    engine.dispose();
    expect(engine.state(engine.doc.cells[0].id)).toBeUndefined();
    await expect(engine.settled()).resolves.toBeUndefined();
    expect(() => engine.update(engine.doc)).toThrow(/disposed/);
    expect(heard).toBe(0);
  });
});
