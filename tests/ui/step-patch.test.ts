// Finding the hand-calc steps in a cell's HTML (the sheet view keeps the nodes of the
// steps whose HTML did not change). The HTML here is what the cell kinds really make.

import { describe, expect, it } from 'vitest';
import { stepRanges } from '../../cells/step-patch';
import { handCalcHtml } from '../../runtime/present/tex-live';

const STEP_OPEN = '<span class="hc-step"';

function steps(html: string): string[] {
  return stepRanges(html).map((r) => html.slice(r.start, r.end));
}

describe('hand-calc steps in a cell\'s HTML', () => {
  const html = `<div class="cell-body"><div class="cell-math">${handCalcHtml(
    'M_{u}', [{ rel: '=', tex: '\\frac{w_{u} \\ell^{2}}{8}' }, { rel: '=', tex: '\\frac{(2\\,\\mathrm{klf})(20\\,\\mathrm{ft})^{2}}{8}' }, { rel: '=', tex: '100\\,\\mathrm{kip\\,ft}' }],
    'M_u = w_u * l^2 / 8 = 100 kip*ft',
  )}</div></div><div class="refs">ACI 318-19 §8.10</div>`;

  it('finds each step as one whole element, head then tail', () => {
    const found = steps(html);
    expect(found).toHaveLength(2);
    for (const s of found) {
      expect(s.startsWith(STEP_OPEN)).toBe(true);
      expect(s.endsWith('</span>')).toBe(true);
      // balanced: as many span tags open as close
      expect(s.split('<span').length).toBe(s.split('</span>').length);
      expect(s).toContain('katex');
    }
  });

  it('leaves everything else outside the steps', () => {
    const ranges = stepRanges(html);
    let rest = html;
    for (const r of [...ranges].reverse()) rest = rest.slice(0, r.start) + rest.slice(r.end);
    expect(rest).not.toContain('hc-step');
    expect(rest).not.toContain('katex');
    expect(rest).toContain('ACI 318-19 §8.10');
  });

  it('the symbolic step is the same HTML when only the values change', () => {
    const again = `<div class="cell-math">${handCalcHtml(
      'M_{u}', [{ rel: '=', tex: '\\frac{w_{u} \\ell^{2}}{8}' }, { rel: '=', tex: '\\frac{(3\\,\\mathrm{klf})(20\\,\\mathrm{ft})^{2}}{8}' }, { rel: '=', tex: '150\\,\\mathrm{kip\\,ft}' }],
      'M_u = w_u * l^2 / 8 = 150 kip*ft',
    )}</div>`;
    const [head1, tail1] = steps(html);
    const [head2, tail2] = steps(again);
    expect(head2).toBe(head1);
    expect(tail2).not.toBe(tail1);
  });

  it('no steps in plain HTML; a cut-off step is left alone', () => {
    expect(stepRanges('<p>note <span class="x">text</span></p>')).toEqual([]);
    const cut = steps(html)[0].slice(0, 200);
    expect(stepRanges(cut)).toEqual([]);
  });
});
