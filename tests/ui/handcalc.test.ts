import { describe, expect, it } from 'vitest';
import katex from 'katex';
import fc from 'fast-check';
import type { CellState, DisplayValue } from '../../runtime/engine-types';
import {
  checkTex, formulaTex, nameTex, numberTex, quantityTex, ratioText, unitTex, type HandCalcScope,
} from '../../runtime/handcalc/index';

function renders(tex: string): void {
  expect(() => katex.renderToString(tex, { throwOnError: true, strict: 'ignore', trust: false, displayMode: true }), tex)
    .not.toThrow();
}

function dv(value: number | string | boolean, unit: string, text: string): DisplayValue {
  return { value, unit, text };
}

function ok(id: string, display: DisplayValue, extra: Partial<CellState> = {}): CellState {
  return { id, status: 'ok', display, clauses: [], reads: [], ...extra };
}

/** A scope over a few cells of a flat-plate punching check (values as an engine would display them). */
function scope(states: Record<string, CellState>): HandCalcScope {
  return { isCell: (n) => n in states, state: (n) => states[n] };
}

const cells: Record<string, CellState> = {
  D: ok('i1', dv(120, 'psf', '120 psf')),
  L: ok('i2', dv(50, 'psf', '50 psf')),
  l_n: ok('i3', dv(22, 'ft', '22 ft')),
  w_u: ok('f1', dv(224, 'psf', '224 psf')),
  f_c: ok('i4', dv(5000, 'psi', '5000 psi')),
  b_o: ok('f2', dv(88, 'in', '88 in')),
  d: ok('i5', dv(7.5, 'in', '7.5 in')),
  V_u: ok('f3', dv(120.5, 'kip', '120.5 kip')),
  phi_Vc: ok('f4', dv(140, 'kip', '140 kip')),
  lambda_s: ok('f5', dv(1, '', '1')),
  position: ok('i6', dv('interior', '', 'interior')),
  T: ok('i7', dv(-3.5, 'kip', '−3.5 kip')),
};
const sc = scope(cells);

describe('nameTex', () => {
  it('writes names as a hand calc does', () => {
    expect(nameTex('M_u')).toBe('{M_{\\mathrm{u}}}');
    expect(nameTex('phi_Vc')).toBe('{\\phi V_{\\mathrm{c}}}');
    expect(nameTex('phi_Mn')).toBe('{\\phi M_{\\mathrm{n}}}');
    expect(nameTex('beta1')).toBe('{\\beta_{1}}');
    expect(nameTex('lambda_s')).toBe('{\\lambda_{\\mathrm{s}}}');
    expect(nameTex('alpha')).toBe('{\\alpha}');
    expect(nameTex('fc')).toBe("{f'_{\\mathrm{c}}}");
    expect(nameTex('c1')).toBe('{c_{1}}');
    expect(nameTex('Vu')).toBe('{V_{\\mathrm{u}}}');
    expect(nameTex('Ast')).toBe('{A_{\\text{st}}}');
    expect(nameTex('DL')).toBe('{\\text{DL}}');
    expect(nameTex('span')).toBe('{\\text{span}}');
    expect(nameTex('q_allow_net')).toBe('{q_{\\text{allow},\\text{net}}}');
    expect(nameTex('d_avg')).toBe('{d_{\\text{avg}}}');
    expect(nameTex('b')).toBe('{b}');
  });

  it('always gives TeX that KaTeX sets, for any valid name (300 runs)', () => {
    fc.assert(fc.property(fc.stringMatching(/^[A-Za-z_][A-Za-z0-9_]{0,12}$/), (name) => {
      renders(`${nameTex(name)} = 1\\cdot${nameTex(name)}`);
    }), { numRuns: 300 });
  });
});

describe('numbers and units', () => {
  it('sets numbers, exponents and minus signs', () => {
    expect(numberTex('12.5')).toBe('12.5');
    expect(numberTex('−1.5')).toBe('-1.5');
    expect(numberTex('2.4e−5')).toBe('2.4\\times10^{-5}');
    expect(numberTex('1,250')).toBe('1{,}250');
    expect(numberTex('∞')).toBe('\\infty');
    expect(numberTex('yes')).toBe('\\text{yes}');
  });

  it('sets units upright with dots and powers', () => {
    expect(unitTex('in')).toBe('\\mathrm{in}');
    expect(unitTex('kip*ft')).toBe('\\mathrm{kip}\\cdot \\mathrm{ft}');
    expect(unitTex('kN/m^3')).toBe('\\mathrm{kN}/\\mathrm{m}^{3}');
    expect(unitTex('in^2')).toBe('\\mathrm{in}^{2}');
    expect(unitTex('')).toBe('');
    expect(quantityTex(dv(12.5, 'in', '12.5 in'))).toBe('12.5\\,\\mathrm{in}');
    expect(quantityTex(dv(0.85, '', '0.85'))).toBe('0.85');
    expect(quantityTex(dv('interior', '', 'interior'))).toBe('\\text{interior}');
    for (const u of ['kip*ft', 'kN*m', 'lbf/ft^2', 'psf', 'kN/m^3', 'mm^2', 'ft^-1', 'kip / (ft*in)', 'weird$unit']) renders(unitTex(u));
  });
});

describe('formulaTex', () => {
  it('gives symbol = formula = values = result', () => {
    const t = formulaTex('w_u', '1.2 D + 1.6 L', cells.w_u, sc);
    expect(t.symbol).toBe('{w_{\\mathrm{u}}}');
    expect(t.symbolic).toBe('1.2~{D}+1.6~{L}');
    expect(t.substituted).toBe('1.2~\\left(120\\,\\mathrm{psf}\\right)+1.6~\\left(50\\,\\mathrm{psf}\\right)');
    expect(t.result).toBe('224\\,\\mathrm{psf}');
    expect(t.line).toBe(`${t.symbol} = ${t.symbolic} = ${t.substituted} = ${t.result}`);
    expect(t.aligned).toContain('\\begin{aligned}');
    renders(t.line);
    renders(t.aligned);
  });

  it('sets units in a formula upright and library calls as operator names', () => {
    const t = formulaTex('x', 'punch_bo(c1, c2, d) + 4 in', undefined, sc);
    expect(t.symbolic).toContain('\\operatorname{punch\\_bo}(');
    expect(t.symbolic).toContain('{\\mathrm{in}}');
    expect(t.result).toBeUndefined();
    renders(t.line);
  });

  it('brackets a value only where it would read wrong without', () => {
    const t = formulaTex('v', '4 * lambda_s * sqrt(f_c) * T', undefined, sc);
    expect(t.substituted).toContain('4\\cdot{1}'); // a pure number as a factor
    expect(t.substituted).toContain('\\left(-3.5\\,\\mathrm{kip}\\right)'); // a factor with a unit
    expect(t.substituted).toContain('\\sqrt{{5000\\,\\mathrm{psi}}}'); // a function argument
    renders(t.line);
    const sum = formulaTex('x', 'd - D + T', undefined, sc);
    expect(sum.substituted).toBe('{7.5\\,\\mathrm{in}}-{120\\,\\mathrm{psf}}+\\left(-3.5\\,\\mathrm{kip}\\right)');
    const call = formulaTex('x', 'punch_bo(d, d) + max(d, D)', undefined, sc);
    expect(call.substituted).toBe('\\operatorname{punch\\_bo}({7.5\\,\\mathrm{in}},\\allowbreak\\,{7.5\\,\\mathrm{in}})+\\operatorname{max}({7.5\\,\\mathrm{in}},\\allowbreak\\,{120\\,\\mathrm{psf}})');
    renders(call.line);
  });

  it('leaves out parts that repeat', () => {
    const copy = formulaTex('d2', 'd', ok('x', dv(7.5, 'in', '7.5 in')), sc);
    expect(copy.parts).toEqual(['{d}', '7.5\\,\\mathrm{in}']);
    const constant = formulaTex('h', '9 in', ok('x', dv(9, 'in', '9 in')), sc);
    expect(constant.substituted).toBeUndefined();
    expect(constant.parts.length).toBe(2);
  });

  it('survives text that does not parse', () => {
    const t = formulaTex('bad', '1.2 * (D +', { id: 'x', status: 'error', clauses: [], reads: [], error: { kind: 'syntax', message: 'x', column: 10 } }, sc);
    expect(t.symbolic).toBe('\\text{1.2 * (D +}');
    renders(t.line);
  });

  it('gives TeX that KaTeX sets for many formula shapes', () => {
    const exprs = [
      'w_u * l_n^2 / 8', 'min(phi_Vc, 2 V_u)', 'position == "interior" ? 40 : 30', '-D^2', 'D/L/d',
      'max(D, L) * 24 ft', 'sqrt(f_c) * b_o * d', '(1.2 D + 1.6 L) * 24 ft', 'abs(T) + 1e-3 kip', 'pi * d^2 / 4',
    ];
    for (const e of exprs) {
      const t = formulaTex('y', e, ok('y', dv(1.5, 'kip*ft', '1.5 kip*ft')), sc);
      renders(t.line);
      renders(t.aligned);
    }
  });
});

describe('checkTex', () => {
  const state = ok('k1', dv(true, '', 'yes'), {
    demand: dv(120.5, 'kip', '120.5 kip'), capacity: dv(140, 'kip', '140 kip'), ratio: 120.5 / 140,
  });

  it('shows condition, demand against capacity, ratio and verdict', () => {
    const t = checkTex('V_u <= phi_Vc', state, sc);
    expect(t.condition).toBe('{V_{\\mathrm{u}}}\\leq{\\phi V_{\\mathrm{c}}}');
    expect(t.substituted).toBe('120.5\\,\\mathrm{kip} \\le 140\\,\\mathrm{kip}');
    expect(t.ratio).toBe('\\dfrac{{V_{\\mathrm{u}}}}{{\\phi V_{\\mathrm{c}}}} = 0.86');
    expect(t.verdict).toBe('\\text{OK}');
    renders(t.line);
  });

  it('reads capacity >= demand the other way round', () => {
    const t = checkTex('phi_Vc >= V_u', { ...state, status: 'fail', ratio: 1.2 }, sc);
    expect(t.substituted).toBe('140\\,\\mathrm{kip} \\ge 120.5\\,\\mathrm{kip}');
    expect(t.ratio).toBe('\\dfrac{{V_{\\mathrm{u}}}}{{\\phi V_{\\mathrm{c}}}} = 1.20');
    expect(t.verdict).toBe('\\text{NOT OK}');
    renders(t.line);
  });

  it('sets a plain condition with its values, and a pending one without', () => {
    const t = checkTex('position == "interior" and d > 6 in', ok('k2', dv(true, '', 'yes')), sc);
    expect(t.ratio).toBeUndefined();
    expect(t.substituted).toContain('\\text{interior}');
    renders(t.line);
    const pending = checkTex('V_u <= phi_Vc', { id: 'k1', status: 'pending', clauses: [], reads: [] }, sc);
    expect(pending.verdict).toBeUndefined();
    expect(pending.line).toBe(pending.condition);
  });

  it('prints the ratio to two decimals', () => {
    expect(ratioText(0.8607)).toBe('0.86');
    expect(ratioText(1)).toBe('1.00');
    expect(ratioText(Infinity)).toBe('∞');
  });
});

describe('nameTex on run-together trade names', () => {
  it('reads a Greek word run into a capital, and capital heads with subscripts', () => {
    expect(nameTex('phiVc')).toBe('{\\phi V_{\\mathrm{c}}}');
    expect(nameTex('phiVc_f')).toBe('{\\phi V_{\\mathrm{c},\\mathrm{f}}}');
    expect(nameTex('Vu_slab')).toBe('{V_{\\mathrm{u},\\text{slab}}}');
    expect(nameTex('chk_w')).toBe('{\\text{chk}_{\\mathrm{w}}}');
    expect(nameTex('Lo')).toBe('{L_{\\mathrm{o}}}');
    expect(nameTex('floors')).toBe('{\\text{floors}}');
  });
});
