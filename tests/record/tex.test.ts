// The static rendering's MathML (runtime/record/tex.ts): KaTeX's, shorter. That it sets
// the same in a browser is checked in tests/e2e/static-math.test.ts; here, what goes.

import { describe, expect, it } from 'vitest';
import { slim, texHtml } from '../../runtime/record/tex';

describe('slim MathML', () => {
  it('drops a row that holds the whole equation, and keeps rows that do not', () => {
    expect(slim('<math><mrow><mi>a</mi><mo>+</mo><mrow><mi>b</mi></mrow></mrow></math>'))
      .toBe('<math><mi>a</mi><mo>+</mo><mrow><mi>b</mi></mrow></math>');
    const two = '<math><mrow><mi>a</mi></mrow><mo>+</mo><mrow><mi>b</mi></mrow></math>';
    expect(slim(two)).toBe(two);
    const display = '<math display="block"><mrow><mi>a</mi></mrow><mrow><mi>b</mi></mrow></math>';
    expect(slim(display)).toBe(display);
  });

  it('drops empty spaces and keeps sized ones', () => {
    expect(slim('<math><mi>a</mi><mo separator="true">,</mo><mspace></mspace><mspace width="2em"/><mi>b</mi></math>'))
      .toBe('<math><mi>a</mi><mo separator="true">,</mo><mspace width="2em"/><mi>b</mi></math>');
  });

  it('gives KaTeX\'s MathML with no wrapper, annotation, empty space or whole-equation row', () => {
    const html = texHtml('f(a,\\allowbreak\\, b) = \\mathrm{ft}', true); // as runtime/handcalc/formula.ts joins arguments
    expect(html).toMatch(/^<math display="block"><mi>f<\/mi>/);
    expect(html).not.toMatch(/<span|<semantics|<annotation|xmlns|<mspace><\/mspace>/);
    expect(html).toContain('<mi>ft</mi>');
  });
});
