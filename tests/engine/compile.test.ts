import { describe, expect, it } from 'vitest';
import { check, doc, formula, input, run } from './helpers';

describe('formulas and units', () => {
  it('mixes US and SI inputs in one document', async () => {
    const { byName } = await run(doc(
      input('b', '300 mm'), input('h', '12 in'),
      formula('A', 'b*h', 'in^2'),
    ));
    // 300 mm = 11.811 in; 11.811 × 12 = 141.73 in² (arithmetic)
    expect(byName('A').display?.text).toBe('141.7 in^2');
    expect(byName('A').value as number).toBeCloseTo(0.3 * 0.3048, 12);
  });

  it('shows a drifting product in its display unit (120 psf + 9 in × 150 pcf) × 24 ft', async () => {
    // 9 in × 150 pcf = 112.5 psf; (120 + 112.5) × 24 = 5580 plf = 5.58 klf (arithmetic)
    const { byName } = await run(doc(formula('w', '(120 psf + 9 in * 150 pcf) * 24 ft', 'klf')));
    expect(byName('w').display?.text).toBe('5.58 klf');
  });

  it('formats 12 in as 12, not 11.999999999999998', async () => {
    const { byName } = await run(doc(formula('x', '1 ft', 'in')));
    expect(byName('x').display?.text).toBe('12 in');
  });

  it('reads feet-inch notation in inputs', async () => {
    const { byName } = await run(doc(input('h', `1'-6"`, { unit: 'in' } as never)));
    expect(byName('h').display?.text).toBe('18 in');
  });

  it('an undefined L never becomes litres', async () => {
    const { byName } = await run(doc(input('w', '2 klf'), formula('M', 'w * L^2 / 8', 'kip*ft')));
    expect(byName('M').status).toBe('error');
    expect(byName('M').error?.kind).toBe('unknown-name');
    expect(byName('M').error?.message).toMatch(/"L" is not the name of any cell/);
  });

  it('a cell named like a unit wins over the unit', async () => {
    const { byName } = await run(doc(input('L', '20 ft'), input('w', '2 klf'), formula('M', 'w * L^2 / 8', 'kip*ft')));
    // wL²/8 = 2 × 400 / 8 = 100 kip·ft (arithmetic)
    expect(byName('M').display?.text).toBe('100 kip*ft');
  });

  it('units after a number: 150 lbf/ft^3, 5 kip ft, 2 kN*m, (1/2) in', async () => {
    const { byName } = await run(doc(
      formula('g', '150 lbf/ft^3', 'pcf'), formula('m1', '5 kip ft', 'kip*ft'),
      formula('m2', '2 kN*m', 'kN*m'), formula('t', '(1/2) in', 'in'),
    ));
    expect(byName('g').display?.text).toBe('150 pcf');
    expect(byName('m1').display?.text).toBe('5 kip*ft');
    expect(byName('m2').display?.text).toBe('2 kN*m');
    expect(byName('t').display?.text).toBe('0.5 in');
  });

  it('a unit mismatch names both units', async () => {
    const { byName } = await run(doc(input('P', '100 kip'), input('h', '12 in'), formula('x', 'P + h', 'kip')));
    const e = byName('x').error!;
    expect(e.kind).toBe('unit');
    expect(e.message).toMatch(/force \(kip\)/);
    expect(e.message).toMatch(/length \(in\)/);
  });

  it('the display unit fixes the dimension a formula must have', async () => {
    const { byName } = await run(doc(input('P', '100 kip'), formula('x', 'P * 2', 'psi')));
    expect(byName('x').error?.kind).toBe('unit');
    expect(byName('x').error?.message).toMatch(/force.*psi.*stress/);
  });

  it('a dimensional result without a display unit asks for one', async () => {
    const { byName } = await run(doc(input('P', '100 kip'), formula('x', 'P * 2')));
    expect(byName('x').error?.message).toMatch(/give the cell a display unit/);
  });

  it('square roots carry units: sqrt(fc * 1 psi) is a stress', async () => {
    const { byName } = await run(doc(input('fc', '4000 psi'), formula('r', 'sqrt(fc * 1 psi)', 'psi')));
    expect(byName('r').value).toBeCloseTo(Math.sqrt(4000) * 6894.757, 0);
    expect(byName('r').display?.text).toBe('63.25 psi');
  });

  it('text choices and conditions', async () => {
    const { byName } = await run(doc(
      input('pos', 'edge', { choices: ['interior', 'edge', 'corner'] } as never),
      formula('as_pos', 'pos == "interior" ? 40 : (pos == "edge" ? 30 : 20)'),
    ));
    // αs = 40 / 30 / 20 for interior / edge / corner columns: ACI 318-19 §22.6.5.3
    expect(byName('as_pos').value).toBe(30);
  });

  it('rounds up to a whole number of steps', async () => {
    const { byName } = await run(doc(input('B', '7.1 ft'), formula('B2', 'ceil_to(B, 3 in)', 'ft')));
    expect(byName('B2').display?.text).toBe('7.25 ft');
  });
});

describe('checks', () => {
  it('demand <= capacity gives the ratio, and capacity >= demand the same', async () => {
    const { state, engine } = await run(doc(
      input('Vu', '120 kip'), input('phiVc', '150 kip'),
      check('Vu <= phiVc'), check('phiVc >= Vu'), check('Vu <= 100 kip'),
    ));
    const [a, b, c] = engine.doc.cells.slice(2);
    expect(state(a).ratio).toBeCloseTo(0.8, 12);
    expect(state(a).status).toBe('ok');
    expect(state(a).demand?.text).toBe('120 kip');
    expect(state(a).capacity?.text).toBe('150 kip');
    expect(state(b).ratio).toBeCloseTo(0.8, 12);
    expect(state(c).status).toBe('fail');
    expect(state(c).ratio).toBeCloseTo(1.2, 12);
  });
  it('a condition passes or fails without a ratio', async () => {
    const { state, engine } = await run(doc(input('r', '1.4'), check('r >= 1 and r <= 2')));
    expect(state(engine.doc.cells[1]).status).toBe('ok');
    expect(state(engine.doc.cells[1]).ratio).toBeUndefined();
  });
  it('a named check can be read by other cells', async () => {
    const { byName } = await run(doc(input('a', '2 kip'), input('b', '4 kip'), check('a <= b', { name: 'u1' } as never), formula('twice', 'u1 * 2')));
    expect(byName('twice').value).toBeCloseTo(1, 12);
  });
  it('a check whose sides disagree in units is an error at the check', async () => {
    const { state, engine } = await run(doc(input('a', '2 kip'), input('b', '4 in'), check('a <= b')));
    expect(state(engine.doc.cells[2]).error?.kind).toBe('unit');
  });
});

describe('check display units', () => {
  it('a check between expressions shows the usual unit of its dimension', async () => {
    const { state, engine } = await run(doc(input('a', '2 in'), input('b', '3 in'), check('a * b <= 2 * b * b')));
    // a·b = 6 in², 2b² = 18 in² (arithmetic); no cell names the unit, so the sheet's usual area unit
    expect(state(engine.doc.cells[2]).demand?.text).toBe('6 in^2');
    expect(state(engine.doc.cells[2]).capacity?.text).toBe('18 in^2');
  });
  it('a quantity typed on one side gives its unit', async () => {
    const { state, engine } = await run(doc(input('P', '80 kN'), check('2 * P <= 200 kN')));
    expect(state(engine.doc.cells[1]).demand?.text).toBe('160 kN');
  });
});
