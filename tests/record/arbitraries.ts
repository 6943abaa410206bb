// Documents that compute: inputs with values in mixed US/SI units, formulas over them
// and checks between them, so a round trip can be compared on real results (the
// format's own generator mostly produces text that does not compute).

import fc from 'fast-check';
import type { CalcDocument, Cell } from '../../runtime/document';
import { meta } from '../format/arbitraries';

const LENGTH_UNITS = ['in', 'ft', 'mm', 'm'];
const STRESS_UNITS = ['psi', 'ksi', 'MPa', 'psf'];

const quantity = (units: string[]) =>
  fc.tuple(fc.double({ min: 0.01, max: 5000, noNaN: true }), fc.constantFrom(...units))
    .map(([n, u]) => `${Number(n.toPrecision(4))} ${u}`);

export const computingDocuments: fc.Arbitrary<CalcDocument> = fc
  .record({
    meta,
    lengths: fc.array(quantity(LENGTH_UNITS), { minLength: 2, maxLength: 4 }),
    stresses: fc.array(quantity(STRESS_UNITS), { minLength: 1, maxLength: 3 }),
    picks: fc.array(fc.tuple(fc.nat(), fc.nat(), fc.constantFrom('+', '-', 'max', 'min'), fc.constantFrom(...LENGTH_UNITS), fc.integer({ min: 1, max: 6 })), { minLength: 1, maxLength: 4 }),
    checks: fc.array(fc.tuple(fc.nat(), fc.nat(), fc.boolean()), { maxLength: 3 }),
  })
  .map(({ meta, lengths, stresses, picks, checks }) => {
    const cells: Cell[] = [{ id: 's1', kind: 'section', title: 'Generated' }];
    lengths.forEach((v, i) => cells.push({ id: `L${i}`, kind: 'input', name: `a${i}`, value: v, label: `length ${i}` }));
    stresses.forEach((v, i) => cells.push({ id: `S${i}`, kind: 'input', name: `f${i}`, value: v }));
    const lengthNames = lengths.map((_, i) => `a${i}`);
    picks.forEach(([p, q, op, unit, precision], j) => {
      const a = lengthNames[p % lengthNames.length];
      const b = lengthNames[q % lengthNames.length];
      const expr = op === '+' || op === '-' ? `${a} ${op} ${b}` : `${op}(${a}, ${b})`;
      cells.push({ id: `F${j}`, kind: 'formula', name: `b${j}`, expr, unit, precision });
      lengthNames.push(`b${j}`);
    });
    checks.forEach(([p, q, ge], k) => {
      const a = lengthNames[p % lengthNames.length];
      const b = lengthNames[q % lengthNames.length];
      cells.push({ id: `K${k}`, kind: 'check', expr: ge ? `${a} >= ${b}` : `${a} <= ${b}`, label: `check ${k}` });
    });
    cells.push({ id: 'K9', kind: 'check', expr: `f0 * a0 * a1 <= 1e9 kip`, clause: 'common practice' });
    return { meta, cells };
  });
