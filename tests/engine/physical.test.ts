// Values that make no physical sense are errors, not passes (issue 15, items 9 and 10).
import { describe, expect, it } from 'vitest';
import { cellsInError, inErrorText } from '../../runtime/graph/in-error';
import { check, doc, formula, input, run } from './helpers';

describe('a check whose demand or capacity is negative', () => {
  it('is an error, not a pass with a negative ratio (a negative allowable soil pressure)', async () => {
    // Service bearing check, q ≤ q_allow (common practice): with q_allow = −4000 psf the
    // ratio 3000 / −4000 = −0.75 would read as a pass.
    const k = check('q <= q_allow');
    const { state, engine } = await run(doc(input('q', '3000 psf'), input('q_allow', '-4000 psf'), k));
    expect(state(k).status).toBe('error');
    expect(state(k).error?.message).toBe('the capacity is negative (−4000 psf); a demand/capacity check needs both at least zero: look at the inputs it reads');
    engine.dispose();
  });

  it('a negative demand is an error too (a bar count of −1 gives a negative steel area)', async () => {
    const k = check('As >= As_min');
    // As = n · Ab with a #5 bar, Ab = 0.31 in² (ASTM A615 nominal area): −1 × 0.31 = −0.31 in².
    const { state, engine } = await run(doc(
      input('n', '-1'), formula('As', 'n * 0.31 in^2', 'in^2'), input('As_min', '0.2 in^2'), k,
    ));
    expect(state(k).status).toBe('error');
    expect(state(k).error?.message).toMatch(/^the capacity is negative \(−0\.31 in\^2\)/);
    engine.dispose();
  });

  it('zero demand still passes with ratio 0', async () => {
    const k = check('V <= phiV');
    const { state, engine } = await run(doc(input('V', '0 kip'), input('phiV', '10 kip'), k));
    expect(state(k).status).toBe('ok');
    expect(state(k).ratio).toBe(0);
    engine.dispose();
  });
});

describe('typed values beyond any physical quantity', () => {
  it.each([
    ['1e308', /larger than any quantity/],
    ['1e-320 ft', /smaller than any quantity/],
    ['-1e20 psf', /larger than any quantity/],
  ])('%s is refused at the input', async (value, message) => {
    const { byName, engine } = await run(doc(input('x', value)));
    expect(byName('x').status).toBe('error');
    expect(byName('x').error?.message).toMatch(message);
    engine.dispose();
  });

  it('an exact zero is still a value', async () => {
    const { byName, engine } = await run(doc(input('x', '0 ft')));
    expect(byName('x').status).toBe('ok');
    engine.dispose();
  });
});

describe('every cell in error is counted', () => {
  it('a broken formula that no check reads is listed, its own error before those it causes', async () => {
    const d = doc(
      input('a', '2 ft'), formula('bad', 'a + 1 psi', 'ft'), formula('after', 'bad * 2', 'ft'),
      check('a <= 3 ft'),
    );
    const { engine } = await run(d);
    const list = cellsInError(d, (id) => engine.state(id));
    expect(list.map((c) => [c.title, c.source])).toEqual([['bad', true], ['after', false]]);
    expect(inErrorText(list)).toBe('2 cells in error, 1 at its source');
    engine.dispose();
  });
});
