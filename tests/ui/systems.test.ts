import { describe, expect, it } from 'vitest';
import { create, all } from 'mathjs';
import type { CalcDocument } from '../../runtime/document';
import { emptyMeta } from '../../runtime/document';
import { createEngine } from '../../runtime/engine';
import {
  canonicalUnit, counterpart, sheetSystem, switchSystem, systemOf, typedUnit, unitPairs,
} from '../../runtime/units/systems';

// A private mathjs instance with the trade units, only to compare dimensions.
const math = create(all);
// kip = 1000 lbf, ksi = 1000 psi, psf = lbf/ft², ksf = kip/ft², pcf = lbf/ft³,
// plf = lbf/ft, klf = kip/ft (common practice)
math.createUnit('kip', { definition: '1000 lbf' }, { override: true });
math.createUnit('ksi', '1000 psi');
math.createUnit('psf', '1 lbf/ft^2');
math.createUnit('ksf', '1000 lbf/ft^2');
math.createUnit('pcf', '1 lbf/ft^3');
math.createUnit('plf', '1 lbf/ft');
math.createUnit('klf', '1000 lbf/ft');

function sameDimension(a: string, b: string): boolean {
  return (math.unit(`1 ${a}`) as any).equalBase(math.unit(`1 ${b}`));
}

function doc(cells: CalcDocument['cells']): CalcDocument {
  return { meta: emptyMeta(), cells };
}

describe('unit systems table', () => {
  it('pairs units of the same physical quantity', () => {
    for (const [us, si] of unitPairs()) {
      expect(sameDimension(us, si), `${us} ↔ ${si}`).toBe(true);
      expect(systemOf(us)).toBe('US');
      expect(systemOf(si)).toBe('SI');
    }
  });

  it('maps the trade units both ways', () => {
    const expected: [string, string][] = [
      ['in', 'mm'], ['ft', 'm'], ['psi', 'MPa'], ['ksi', 'MPa'], ['psf', 'kPa'], ['ksf', 'kPa'],
      ['kip', 'kN'], ['kip*ft', 'kN*m'], ['pcf', 'kN/m^3'], ['plf', 'kN/m'], ['klf', 'kN/m'],
      ['in^2', 'mm^2'], ['ft^2', 'm^2'],
    ];
    for (const [us, si] of expected) expect(counterpart(us, 'SI')).toBe(si);
    expect(counterpart('mm', 'US')).toBe('in');
    expect(counterpart('kN*m', 'US')).toBe('kip*ft');
    expect(counterpart('kPa', 'US')).toBe('psf');
    // already in the target system, or shared: unchanged
    expect(counterpart('mm', 'SI')).toBe('mm');
    expect(counterpart('deg', 'SI')).toBe('deg');
  });

  it('reads other spellings of the same unit', () => {
    expect(canonicalUnit('kip ft')).toBe('kip*ft');
    expect(canonicalUnit('kip-ft')).toBe('kip*ft');
    expect(canonicalUnit(' kN / m ^ 3 ')).toBe('kN/m^3');
    expect(counterpart('lbf/ft^2', 'SI')).toBe('kPa');
    expect(systemOf('rad')).toBeUndefined();
    expect(systemOf('')).toBeUndefined();
  });

  it('finds the unit typed in an input value', () => {
    expect(typedUnit('18 in')).toBe('in');
    expect(typedUnit('450 mm')).toBe('mm');
    expect(typedUnit('5000 psi')).toBe('psi');
    expect(typedUnit(`1'-6"`)).toBe('in');
    expect(typedUnit('0.75')).toBeUndefined();
    expect(typedUnit('interior')).toBeUndefined();
  });
});

describe('switchSystem', () => {
  const us = doc([
    { id: 'a', kind: 'input', name: 'h', value: '9 in' },
    { id: 'b', kind: 'input', name: 'fc', value: '5000 psi' },
    { id: 'c', kind: 'input', name: 'fy', value: '60 ksi', unit: 'ksi' },
    { id: 'd', kind: 'formula', name: 'Mu', expr: '1', unit: 'kip*ft' },
    { id: 'e', kind: 'formula', name: 'r', expr: '1' },
    { id: 'f', kind: 'input', name: 'pos', value: 'interior', choices: ['interior', 'edge'] },
    { id: 'g', kind: 'note', text: 'in and psi' },
  ]);

  it('maps display units and keeps values as typed', () => {
    const { doc: si } = switchSystem(us, 'SI');
    const byId = Object.fromEntries(si.cells.map((c) => [c.id, c]));
    expect(byId.a).toMatchObject({ value: '9 in', unit: 'mm' });
    expect(byId.b).toMatchObject({ value: '5000 psi', unit: 'MPa' });
    expect(byId.c).toMatchObject({ value: '60 ksi', unit: 'MPa' });
    expect(byId.d).toMatchObject({ unit: 'kN*m' });
    expect(byId.e).toBe(us.cells[4]); // no unit: untouched
    expect(byId.f).toBe(us.cells[5]);
    expect(byId.g).toBe(us.cells[6]);
    expect(sheetSystem(us)).toBe('US');
    expect(sheetSystem(si)).toBe('SI');
    expect(us.cells[0]).not.toHaveProperty('unit'); // the input is not mutated
  });

  it('comes back to the units it left', () => {
    const there = switchSystem(us, 'SI');
    const back = switchSystem(there.doc, 'US', there.memory);
    const units = back.doc.cells.map((c) => ('unit' in c ? c.unit : undefined));
    expect(units).toEqual(['in', 'psi', 'ksi', 'kip*ft', undefined, undefined, undefined]);
    // without the memory, MPa goes back to the first US pair
    const plain = switchSystem(there.doc, 'US');
    expect((plain.doc.cells[2] as { unit?: string }).unit).toBe('psi');
  });

  it('returns the same sheet when nothing changes', () => {
    const { doc: si } = switchSystem(us, 'SI');
    expect(switchSystem(si, 'SI').doc).toBe(si);
  });
});

describe('checks follow the sheet\'s unit system', () => {
  // 1 lbf = 4.448222 N, 1 in = 25.4 mm, 1 ft = 0.3048 m (NIST SP 811, App. B);
  // kip = 1000 lbf (common practice)
  const sheet = doc([
    { id: 'a', kind: 'input', name: 'A', value: '100 in^2' },
    { id: 'v', kind: 'formula', name: 'Vu', expr: '100 kip', unit: 'kip' },
    { id: 'p', kind: 'formula', name: 'phiVc', expr: '150 kip', unit: 'kip' },
    { id: 'k1', kind: 'check', expr: 'Vu <= phiVc' }, // a named cell's unit
    { id: 'k2', kind: 'check', expr: '3 ft <= 40 in' }, // the unit typed in a quantity
    { id: 'k3', kind: 'check', expr: 'sqrt(A) <= 2 * sqrt(A)' }, // no unit written: the usual one
  ]);

  async function shown(d: CalcDocument, engine = createEngine(d)) {
    engine.update(d);
    await engine.settled();
    const dc = (id: string) => `${engine.state(id)?.demand?.text} / ${engine.state(id)?.capacity?.text}`;
    return { engine, k1: dc('k1'), k2: dc('k2'), k3: dc('k3') };
  }

  it('shows demand and capacity in SI after a switch to SI, and in US after the switch back', async () => {
    const us = await shown(sheet);
    expect([us.k1, us.k2, us.k3]).toEqual(['100 kip / 150 kip', '3 ft / 3.333 ft', '10 in / 20 in']);

    const there = switchSystem(sheet, 'SI');
    const si = await shown(there.doc, us.engine);
    expect(si.k1).toBe('444.8 kN / 667.2 kN');
    expect(si.k2).toBe('0.9144 m / 1.016 m');
    expect(si.k3).toBe('254 mm / 508 mm');

    const back = await shown(switchSystem(there.doc, 'US', there.memory).doc, us.engine);
    expect([back.k1, back.k2, back.k3]).toEqual([us.k1, us.k2, us.k3]);
    us.engine.dispose();
  });

  it('takes a new display unit of a cell it names', async () => {
    const first = await shown(sheet);
    const lbf = { ...sheet, cells: sheet.cells.map((c) => (c.id === 'v' ? { ...c, unit: 'lbf' } : c)) };
    const next = await shown(lbf, first.engine);
    expect(next.k1).toBe('100000 lbf / 150000 lbf');
    first.engine.dispose();
  });
});
