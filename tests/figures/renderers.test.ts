// Figure renderers (runtime/figures): well-formed SVG, drawn to scale, matching the
// values the calc uses, and no markup from a document ever reaching the drawing.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boPunch } from '../../runtime/library/punching-perimeter';
import { plateShare } from '../../runtime/library/plate';
import { footingDrawing, loadPath, plateMap, punchingPlan } from '../../runtime/figures/functions';
import { renderFigure, renderSweep } from '../../runtime/figures/render';
import { barPositions } from '../../runtime/figures/footing';
import type { SweepResult } from '../../runtime/figures/spec';
import { checkXml, pathLength, type XmlElement } from './xml';

const IN = 0.0254, FT = 0.3048, KSF = 47880.26, PSF = 47.88026, KIP = 4448.222;

function wellFormed(svg: string): XmlElement[] {
  const { problems, elements } = checkXml(svg);
  expect(problems).toEqual([]);
  expect(elements[0].name).toBe('svg');
  return elements;
}

const byRole = (els: XmlElement[], role: string) => els.filter((e) => e.attrs['data-role'] === role);
const scaleOf = (els: XmlElement[]) => Number(els[0].attrs['data-scale']);
/** Drawing coordinates carry two decimals: a length of k segments is good to k·0.01 px. */
const tol = (els: XmlElement[], segments: number) => (segments * 0.01) / scaleOf(els);

describe('punching plan', () => {
  it('the drawn critical perimeter is bo_punch, for interior, edge and corner columns', () => {
    // bo = 2(c1 + d) + 2(c2 + d) interior; 2(c1 + d/2) + (c2 + d) edge; (c1 + d/2) + (c2 + d/2) corner: ACI 318-19 §22.6.4.1
    const cases: [number, number, number, 'interior' | 'edge' | 'corner', number][] = [
      [20 * IN, 20 * IN, 7.75 * IN, 'interior', 4 * 27.75 * IN],
      [20 * IN, 20 * IN, 7.75 * IN, 'edge', (2 * 23.875 + 27.75) * IN],
      [24 * IN, 16 * IN, 8 * IN, 'corner', (28 + 20) * IN],
    ];
    for (const [c1, c2, d, pos, hand] of cases) {
      const els = wellFormed(renderFigure(punchingPlan(c1, c2, d, pos)));
      const [crit] = byRole(els, 'critical-perimeter');
      const drawn = pathLength(crit.attrs.d) / scaleOf(els);
      expect(Math.abs(drawn - boPunch(c1, c2, d, pos))).toBeLessThanOrEqual(tol(els, 8));
      expect(Math.abs(drawn - hand)).toBeLessThanOrEqual(tol(els, 8)); // hand calc above
    }
  });

  it('holds for any column and depth (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 1.2, noNaN: true }), fc.double({ min: 0.2, max: 1.2, noNaN: true }),
        fc.double({ min: 0.1, max: 0.6, noNaN: true }), fc.constantFrom('interior', 'edge', 'corner'),
        (c1, c2, d, pos) => {
          const els = wellFormed(renderFigure(punchingPlan(c1, c2, d, pos)));
          const drawn = pathLength(byRole(els, 'critical-perimeter')[0].attrs.d) / scaleOf(els);
          expect(Math.abs(drawn - boPunch(c1, c2, d, pos))).toBeLessThanOrEqual(tol(els, 8)); // ACI 318-19 §22.6.4.1
          // The column is drawn c2 wide and c1 deep, to the same scale.
          const [col] = byRole(els, 'column');
          expect(Math.abs(Number(col.attrs.width) / scaleOf(els) - c2)).toBeLessThanOrEqual(tol(els, 2));
          expect(Math.abs(Number(col.attrs.height) / scaleOf(els) - c1)).toBeLessThanOrEqual(tol(els, 2));
        },
      ),
      { numRuns: 60 },
    );
  });

  it('draws the drop panel and the second section outside it at d_slab/2', () => {
    // Interior: bo,outer = 2(x1 + d_slab) + 2(x2 + d_slab), ACI 318-19 §22.6.4.1 with the drop as the support
    const spec = punchingPlan(20 * IN, 20 * IN, 12.25 * IN, 'interior', 84 * IN, 84 * IN, 7.75 * IN);
    const els = wellFormed(renderFigure(spec));
    const outer = pathLength(byRole(els, 'outer-perimeter')[0].attrs.d) / scaleOf(els);
    expect(Math.abs(outer - 4 * (84 + 7.75) * IN)).toBeLessThanOrEqual(tol(els, 8)); // = 367 in
    const [drop] = byRole(els, 'drop-panel');
    expect(Math.abs(Number(drop.attrs.width) / scaleOf(els) - 84 * IN)).toBeLessThanOrEqual(tol(els, 2));
    expect(() => punchingPlan(20 * IN, 20 * IN, 12 * IN, 'interior', 20 * IN, 84 * IN, 7 * IN)).toThrow(/drop panel must reach past/);
  });

  it('labels dimensions in the units of the cells given', () => {
    const spec = { ...punchingPlan(0.5, 0.5, 0.2, 'interior'), units: { c1: 'mm', c2: 'mm', d: 'mm' }, system: 'SI' as const };
    const text = wellFormed(renderFigure(spec)).map((e) => e.text).join('|');
    expect(text).toContain('c1 = 500 mm');
    expect(text).toContain('d/2 = 100 mm');
    expect(text).toContain('bo = 2800 mm'); // 4 × (500 + 200) mm
  });
});

describe('footing drawing', () => {
  const B = 9.5 * FT, L = 11 * FT, h = 24 * IN, c1 = 20 * IN, c2 = 16 * IN, d = 20 * IN, s = 10 * IN;
  const spec = footingDrawing(B, L, h, c1, c2, d, '#7', s, 4.4 * KSF);
  const els = wellFormed(renderFigure(spec));
  const k = scaleOf(els);
  const size = (e: XmlElement) => [Number(e.attrs.width) / k, Number(e.attrs.height) / k];

  it('plan and section are to one scale: footing L × B and h, column c1 × c2', () => {
    const [plan] = byRole(els, 'footing-plan');
    const [sec] = byRole(els, 'footing-section');
    const [col] = byRole(els, 'column-plan');
    const t = tol(els, 2);
    expect(Math.abs(size(plan)[0] - L)).toBeLessThanOrEqual(t);
    expect(Math.abs(size(plan)[1] - B)).toBeLessThanOrEqual(t);
    expect(Math.abs(size(sec)[0] - L)).toBeLessThanOrEqual(t);
    expect(Math.abs(size(sec)[1] - h)).toBeLessThanOrEqual(t);
    expect(Math.abs(size(col)[0] - c1)).toBeLessThanOrEqual(t);
    expect(Math.abs(size(col)[1] - c2)).toBeLessThanOrEqual(t);
  });

  it('shear sections: two-way at d/2 from the faces, one-way at d from the faces', () => {
    // Two-way: (c1 + d) × (c2 + d), ACI 318-19 §22.6.4.1; one-way at d from the face, §13.2.7.2 / §7.4.3.2
    const [two] = byRole(els, 'two-way-section');
    const t = tol(els, 2);
    expect(Math.abs(size(two)[0] - (c1 + d))).toBeLessThanOrEqual(t);
    expect(Math.abs(size(two)[1] - (c2 + d))).toBeLessThanOrEqual(t);
    const [col] = byRole(els, 'column-plan');
    const centre = Number(col.attrs.x) + Number(col.attrs.width) / 2;
    const xs = byRole(els, 'one-way-section').filter((e) => e.attrs.x1 === e.attrs.x2).map((e) => Math.abs(Number(e.attrs.x1) - centre) / k);
    expect(xs).toHaveLength(2);
    for (const x of xs) expect(Math.abs(x - (c1 / 2 + d))).toBeLessThanOrEqual(t);
  });

  it('bars each way at their spacing, inside 3 in cover (ACI 318-19 Table 20.5.1.3.1)', () => {
    const along = byRole(els, 'bar-l');
    expect(along).toHaveLength(barPositions(B, s).length);
    // (9.5 ft − 2 × 3 in) / 10 in = 10.8 → 10 spaces, 11 bars: hand count
    expect(along).toHaveLength(11);
    const ys = along.map((e) => Number(e.attrs.y1)).sort((a, b) => a - b);
    for (let i = 1; i < ys.length; i++) expect(Math.abs((ys[i] - ys[i - 1]) / k - s)).toBeLessThanOrEqual(tol(els, 2));
  });

  it('writes the soil pressure in the unit of the cell, else the system unit', () => {
    const text = els.map((e) => e.text).join('|');
    expect(text).toContain('qu = 4.4 ksf');
    const si = { ...spec, units: { qu: 'kPa', B: 'm' }, system: 'SI' as const };
    const t2 = wellFormed(renderFigure(si)).map((e) => e.text).join('|');
    expect(t2).toContain('qu = 210.7 kPa'); // 4.4 ksf × 47.88 kPa/ksf
    expect(t2).toContain('B = 2.896 m'); // 9.5 ft × 0.3048
  });
});

describe('plate map', () => {
  it('labels each edge with its share of the load: a quarter each on a square simply supported panel', () => {
    const spec = plateMap(6, 6, 'SSSS', 'w');
    const els = wellFormed(renderFigure(spec));
    const labels = byRole(els, 'edge-share').map((e) => e.text);
    expect(labels).toHaveLength(4);
    // By symmetry each edge of a square panel supported all round takes 25 % (common practice; T&W §31 statics)
    for (const l of labels) expect(l).toMatch(/: 25\.0 % of the load$/);
    // Largest deflection coefficient α = 0.00406 at the centre (Timoshenko & Woinowsky-Krieger Table 8, b/a = 1)
    expect(Math.abs(spec.max.value - 0.00406) / 0.00406).toBeLessThan(0.01);
    expect(Math.abs(spec.max.x - 3)).toBeLessThan(1e-9);
    expect(Math.abs(spec.max.y - 3)).toBeLessThan(1e-9);
  });

  it('a long panel: the labels are the solver’s shares and most load goes to the long edges', () => {
    const spec = plateMap(4, 8, 'SSSS', 'mx', 10e3);
    const labels = byRole(wellFormed(renderFigure(spec)), 'edge-share').map((e) => e.text);
    for (const [i, edge] of (['x0', 'y0', 'xa', 'yb'] as const).entries()) {
      expect(labels[i]).toContain(`${(plateShare(4, 8, 'SSSS', edge) * 100).toFixed(1)} %`);
    }
    expect(spec.shares[0] + spec.shares[2]).toBeGreaterThan(0.5); // b/a = 2: most of the load spans the short way (common practice)
    // Mx at the centre, b/a = 2: β = 0.1017 (Timoshenko & Woinowsky-Krieger Table 8; as converted from Roark's Formulas for Stress and Strain),
    // M = β q a² = 0.1017 × 10 kPa × 16 m² = 16.27 kN·m/m
    expect(Math.abs(spec.max.value - 0.1017 * 10e3 * 16) / (0.1017 * 10e3 * 16)).toBeLessThan(0.01);
  });

  it('contours lie strictly inside the range of the field', () => {
    const spec = plateMap(5, 5, 'CCCC', 'mx');
    const levels = byRole(wellFormed(renderFigure(spec)), 'contours').length;
    expect(levels).toBe(1);
    const lo = Math.min(...spec.values), hi = Math.max(...spec.values);
    const els = wellFormed(renderFigure(spec)).filter((e) => e.attrs['data-level'] !== undefined);
    expect(els.length).toBeGreaterThan(2);
    for (const e of els) {
      const v = Number(e.attrs['data-level']);
      expect(v > lo && v < hi).toBe(true);
    }
  });
});

describe('load path', () => {
  it('writes the accumulated factored and service load at every level, the roof storey as a hand calculation gives it', () => {
    const args = [3, 40, 6.5e3, 2.4e3, 5e3, 1e3, 6e3, 3.6, 4] as const;
    const spec = loadPath(...args);
    expect(spec.levels.map((l) => l.name)).toEqual(['Roof', 'Level 4', 'Level 3', 'Level 2']);
    const labels = byRole(wellFormed(renderFigure({ ...spec, system: 'SI' })), 'level-load').map((e) => e.text);
    expect(labels).toHaveLength(4);
    // Each level carries every one above it: the loads grow down the column.
    spec.levels.slice(1).forEach((lv, k) => expect(lv.Pu).toBeGreaterThan(spec.levels[k].Pu));
    // Roof storey by hand: D = 40 m² × 5 kPa + 6 kN/m × 3.6 m = 221.6 kN, Lr = 40 kN;
    // 1.2D + 1.6Lr = 329.9 kN governs 1.4D = 310.2 kN (ASCE 7-22 §2.3.1 comb. 3 with L = 0)
    expect(labels[0]).toContain('Pu = 329.9 kN');
    expect(Math.abs(spec.levels[0].Pu - 329_920)).toBeLessThan(1);
    // Service D + Lr = 221.6 + 40 = 261.6 kN (ASCE 7-22 §2.4.1, comb. D + (Lr or S or R)).
    expect(Math.abs(spec.levels[0].Ps - 261_600)).toBeLessThan(1);
  });
});

describe('no markup from a document reaches a drawing', () => {
  const hostile = '"><script>alert(1)</script><img src=x onerror=alert(2)>&amp';

  it('hostile labels, names and units are escaped', () => {
    const sweep: SweepResult = {
      input: hostile, unit: hostile, xs: [0, 1, 2], current: 1,
      series: [{ name: hostile, kind: 'ratio', unit: hostile, values: [0.5, 1.5, null], pass: [true, false, null], errors: { 2: hostile }, firstFail: 1, crossings: [0.5] }],
    };
    const svgs = [
      renderSweep(sweep, hostile),
      renderFigure({ ...punchingPlan(0.5, 0.5, 0.2, 'edge'), units: { c1: hostile, d: hostile } }),
      renderFigure({ ...footingDrawing(3, 3, 0.6, 0.5, 0.5, 0.5, '#7', 0.25, 1e5), bar: hostile, units: { qu: hostile } }),
      renderFigure({ ...plateMap(4, 5, 'SCSF', 'my', 1e4), edges: 'S<x>' }),
      renderFigure({ ...loadPath(2, 30, 5e3, 2e3, 4e3, 1e3, 5e3, 3.5, 4), levels: [{ name: hostile, Pu: 1e6, Ps: 7e5 }] }),
    ];
    for (const svg of svgs) {
      const els = wellFormed(svg);
      expect(els.some((e) => e.name === 'script' || e.name === 'img')).toBe(false);
      expect(svg).not.toMatch(/<script|<img/i);
      expect(els.flatMap((e) => Object.keys(e.attrs)).filter((a) => /^on/i.test(a))).toEqual([]);
    }
    // The text still reads as typed, once decoded.
    expect(checkXml(svgs[0]).elements.find((e) => e.name === 'title')!.text).toBe(hostile);
  });
});

// Conversions used above: 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 ksf = 47.88 kPa, 1 psf = 47.88 Pa, 1 kip = 4.448 kN (NIST SP 811).
void PSF;
void KIP;
