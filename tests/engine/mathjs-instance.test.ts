// What the slim mathjs instance (runtime/units/math.ts: parser + Unit class on number-only
// arithmetic) must still do for the engine: read the trade units and convert them exactly
// as before, parse formulas and quantities with units, stay on plain numbers, and refuse
// everything the lock-down blocks.
//
// Exact definitions: NIST SP 811 (2008) Appendix B: 1 lbf = 4.4482216152605 N,
// 1 in = 0.0254 m, 1 ft = 0.3048 m, all exactly; kip = 1000 lbf (common practice).

import { describe, expect, it } from 'vitest';
import { CellError } from '../../runtime/formula/cell-error';
import { parseQuantityText } from '../../runtime/formula/input-value';
import { isUnitName, unitInfo } from '../../runtime/units/dimension';
import { math } from '../../runtime/units/math';

const m = math as any;
const LBF = 4.4482216152605;
const FT = 0.3048;
const IN = 0.0254;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('trade units on the slim instance', () => {
  it('1 kip is 4448.2216152605 N exactly (1000 lbf)', () => {
    expect(m.unit('1 kip').value).toBe(4448.2216152605);
    expect(unitInfo('kip').factor).toBe(4448.2216152605);
    expect(unitInfo('kips').factor).toBe(4448.2216152605);
    expect(m.unit('2 kip').toNumber('kN')).toBeCloseTo(8.896443230521, 12);
  });

  it('1 ksi is 6.894757293168361 MPa (1000 lbf/in^2) to the precision of mathjs psi', () => {
    // mathjs's psi is 6894.75729276459 Pa, 6e-11 (relative) short of lbf/in^2; ksi is
    // defined on it (trade.ts), so it agrees with the exact value to 1e-10 and is
    // exactly 1000 of mathjs's psi.
    expect(1000 * LBF / (IN * IN) / 1e6).toBeCloseTo(6.894757293168361, 15);
    expect(rel(m.unit('1 ksi').toNumber('MPa'), 6.894757293168361)).toBeLessThan(1e-10);
    expect(rel(unitInfo('ksi').factor / unitInfo('MPa').factor, 6.894757293168361)).toBeLessThan(1e-10);
    expect(unitInfo('ksi').factor).toBe(1000 * m.Unit.UNITS.psi.value);
  });

  it.each([
    ['psf', LBF / FT ** 2, [1, -1, -2]],
    ['ksf', 1000 * LBF / FT ** 2, [1, -1, -2]],
    ['pcf', LBF / FT ** 3, [1, -2, -2]],
    ['plf', LBF / FT, [1, 0, -2]],
    ['klf', 1000 * LBF / FT, [1, 0, -2]],
    ['kipft', 1000 * LBF * FT, [1, 2, -2]],
    ['kip*ft', 1000 * LBF * FT, [1, 2, -2]],
  ] as const)('%s is its lbf/ft definition in SI, with its dimension', (unit, si, dims) => {
    const info = unitInfo(unit);
    expect(rel(info.factor, si)).toBeLessThan(1e-14);
    expect(info.dims).toEqual([...dims, 0, 0, 0, 0, 0, 0]);
  });

  it('converts trade units into one another and into SI', () => {
    expect(m.unit('1 kipft').toNumber('kN m')).toBeCloseTo(1000 * LBF * FT / 1000, 12);
    expect(m.unit('1 ksf').toNumber('psf')).toBeCloseTo(1000, 10);
    expect(m.unit('12 in').toNumber('ft')).toBeCloseTo(1, 14);
    expect(() => m.unit('2 ksi').to('m')).toThrow(/do not match/);
  });

  it('knows unit names, and keeps offset temperatures out', () => {
    for (const name of ['kip', 'kips', 'ksi', 'psf', 'ksf', 'pcf', 'plf', 'klf', 'kipft', 'psi', 'lbf', 'kN', 'MPa', 'ft', 'in']) {
      expect(isUnitName(name), name).toBe(true);
    }
    expect(isUnitName('degF')).toBe(false);
    expect(isUnitName('fc')).toBe(false);
  });
});

describe('formulas and quantities with units', () => {
  it('parses a formula with a unit after a number into a tree of plain numbers', () => {
    const node = m.parse('1.2 * D + 1.6 * 40 psf');
    expect(node.type).toBe('OperatorNode');
    const constants = node.filter((n: any) => n.type === 'ConstantNode').map((n: any) => n.value);
    expect(constants).toEqual([1.2, 1.6, 40]);
    expect(constants.every((v: unknown) => typeof v === 'number')).toBe(true);
    const symbols = node.filter((n: any) => n.type === 'SymbolNode').map((n: any) => n.name);
    expect(symbols).toEqual(['D', 'psf']);
    expect(m.parse('6 in <= d_f').toString()).toBe('6 in <= d_f');
  });

  it.each([
    ['5000 psi', 5000 * m.Unit.UNITS.psi.value],
    [`1'-6"`, 18 * IN],
    ['150 pcf', 150 * LBF / FT ** 3],
    ['2 kip*ft', 2000 * LBF * FT],
    ['60 ksi', 60000 * m.Unit.UNITS.psi.value],
    ['3 klf', 3000 * LBF / FT],
    ['12 kips', 12000 * LBF],
  ] as const)('reads the quantity %s in SI', (text, si) => {
    expect(rel(parseQuantityText(text).si, si)).toBeLessThan(1e-14);
  });

  it('reports a name that is no unit', () => {
    expect(() => parseQuantityText('5 kipz')).toThrow(CellError);
  });
});

describe('the lock-down of the slim instance', () => {
  it.each([
    'import', 'createUnit', 'evaluate', 'compile', 'simplify', 'simplifyConstant', 'simplifyCore',
    'derivative', 'resolve', 'reviver', 'replacer', 'config', 'chain', 'rationalize', 'parser',
    'leafCount', 'symbolicEqual', 'help',
  ])('%s refuses', (name) => {
    expect(() => m[name]('1')).toThrow(/not available in Loadtrace formulas/);
  });

  it('cannot redefine a unit', () => {
    expect(() => m.createUnit('kip', '1 lbf', { override: true })).toThrow(/not available/);
    expect(unitInfo('kip').factor).toBe(4448.2216152605);
  });
});
