// The P–M interaction figure: well-formed SVG whose curves, cap, balanced point and demand
// sit where the calc puts them, for the 20 × 20 in column (3 #8 on each face, d_s = 2.5 in,
// f'c = 5000 psi, fy = 60 ksi) worked by hand in tests/library/column-interaction.test.ts.

import { describe, expect, it } from 'vitest';
import { interactionDiagram } from '../../runtime/figures/functions';
import { renderFigure } from '../../runtime/figures/render';
import { inch, kip, ksi, psi } from '../../runtime/units/si';
import { checkXml, type XmlElement } from './xml';

const kipFt = kip * 0.3048;
const SEC = [5000 * psi, 60 * ksi, 20 * inch, 20 * inch, 3, 3, '#8', 2.5 * inch] as const;

function draw(pu: number, mu: number, units: Record<string, string> = { Pu: 'kip', Mu: 'kip*ft' }) {
  const spec = { ...interactionDiagram(pu, mu, ...SEC), units };
  const { problems, elements } = checkXml(renderFigure(spec));
  expect(problems).toEqual([]);
  const svg = elements[0];
  const num = (k: string) => Number(svg.attrs[k]);
  // Drawing coordinates back to forces: x = x0 + M·kx, y = y0 − P·ky (SI), two decimals in the file.
  const toM = (x: number) => (x - num('data-x0')) / num('data-kx');
  const toP = (y: number) => (num('data-y0') - y) / num('data-ky');
  const role = (r: string) => elements.filter((e) => e.attrs['data-role'] === r);
  const points = (e: XmlElement) => (e.attrs.d.match(/-?[0-9.]+/g) ?? []).map(Number)
    .reduce<[number, number][]>((a, v, i, all) => (i % 2 ? a : [...a, [toM(v), toP(all[i + 1])]]), []);
  return { spec, elements, role, points, toM, toP, tolP: 0.02 / num('data-ky'), tolM: 0.02 / num('data-kx') };
}

describe('interaction figure', () => {
  it('draws the design curve flat at φPn,max = 0.52·Po = 1067.2 kip and the nominal curve up to Po', () => {
    // Po = 0.85·5·(400 − 6.32) + 60·6.32 = 2052.34 kip (ACI 318-19 Eq. 22.4.2.2); φPn,max = 0.65·0.80·Po (Table 22.4.2.1)
    const f = draw(550 * kip, 60 * kipFt);
    const design = f.points(f.role('design')[0]);
    const top = Math.max(...design.map(([, p]) => p));
    expect(Math.abs(top - 1067.217 * kip)).toBeLessThanOrEqual(f.tolP);
    // Several points sit on the cap: the flat top.
    expect(design.filter(([, p]) => Math.abs(p - top) <= f.tolP).length).toBeGreaterThan(3);
    const nominal = f.points(f.role('nominal')[0]);
    // At c = 60 h every bar has yielded (strain ≥ 0.003·(60·20 − 17.5)/(60·20) = 0.00296 > εty): Pn = Po
    expect(Math.abs(Math.max(...nominal.map(([, p]) => p)) - 2052.34 * kip)).toBeLessThanOrEqual(f.tolP + 0.01 * kip);
    // Pure tension: −fy·Ast = −60·6.32 = −379.2 kip nominal, −0.9·379.2 = −341.28 kip design (φ = 0.90)
    expect(Math.abs(Math.min(...nominal.map(([, p]) => p)) + 379.2 * kip)).toBeLessThanOrEqual(f.tolP);
    expect(Math.abs(Math.min(...design.map(([, p]) => p)) + 341.28 * kip)).toBeLessThanOrEqual(f.tolP);
  });

  it('marks the balanced point at Mb = 6182.6 kip·in, Pb = 698.96 kip (worked by hand)', () => {
    const f = draw(550 * kip, 60 * kipFt);
    const [b] = f.role('balanced');
    expect(Math.abs(f.toM(Number(b.attrs.cx)) - 6182.56 * kip * inch)).toBeLessThanOrEqual(f.tolM);
    expect(Math.abs(f.toP(Number(b.attrs.cy)) - 698.953 * kip)).toBeLessThanOrEqual(f.tolP);
  });

  it('puts the demand at (Mu, Pu), with its load line and φMn at Pu; a passing demand is green', () => {
    const f = draw(550 * kip, 60 * kipFt);
    const [dot] = f.role('demand');
    expect(Math.abs(f.toM(Number(dot.attrs.cx)) - 60 * kipFt)).toBeLessThanOrEqual(f.tolM);
    expect(Math.abs(f.toP(Number(dot.attrs.cy)) - 550 * kip)).toBeLessThanOrEqual(f.tolP);
    expect(dot.attrs.fill).toBe('#2e7d4f');
    const [line] = f.role('phi-mn-at-pu');
    expect(Math.abs(f.toM(Number(line.attrs.x2)) - f.spec.phiMnAtPu)).toBeLessThanOrEqual(f.tolM);
    expect(f.role('load-line')).toHaveLength(1);
    const text = f.elements.map((e) => e.text).join('|');
    expect(text).toContain('Pu = 550 kip');
    expect(text).toContain('Mu = 60 kip*ft');
    expect(text).toMatch(/ratio 0\.\d+ ≤ 1/);
  });

  it('a demand beyond the curve is red and says so; above φPn,max there is no φMn', () => {
    const f = draw(1100 * kip, 10 * kipFt);
    expect(f.role('demand')[0].attrs.fill).toBe('#b0261e');
    expect(f.role('phi-mn-at-pu')).toHaveLength(0);
    const text = f.elements.map((e) => e.text).join('|');
    expect(text).toContain('Pu above φPn,max');
    expect(text).toMatch(/ratio 1\.\d+ > 1/);
  });

  it('sketches the section with its 8 bars and labels in SI when asked', () => {
    const f = draw(2000e3, 100e3, { Pu: 'kN', Mu: 'kN*m' });
    expect(f.role('bar')).toHaveLength(8);
    const text = f.elements.map((e) => e.text).join('|');
    expect(text).toContain('Pu = 2000 kN');
    expect(text).toContain('moment (kN*m)');
  });
});
