import { describe, expect, it } from 'vitest';
import { createEngine } from '../../runtime/engine';
import { emptyMeta, type CalcDocument, type Cell } from '../../runtime/document';

// The gravity functions called from formulas, through the engine's unit checks, in US and in SI.
let id = 0;
const input = (name: string, value: string): Cell => ({ kind: 'input', id: `gi${++id}`, name, value }) as Cell;
const formula = (name: string, expr: string, unit?: string): Cell =>
  ({ kind: 'formula', id: `gf${++id}`, name, expr, ...(unit ? { unit } : {}) }) as Cell;

async function values(cells: Cell[]) {
  const doc: CalcDocument = { meta: emptyMeta(), cells };
  const engine = createEngine(doc);
  await engine.settled();
  const out: Record<string, { value: unknown; error?: string; clauses: string[] }> = {};
  for (const c of engine.doc.cells) {
    const s = engine.state(c.id)!;
    out[(c as { name: string }).name] = { value: s.value, error: s.error?.message, clauses: s.clauses };
  }
  return out;
}

const calc = (len: string, area: string, press: string, bar: string) => [
  formula('b1', 'beta1(fc)'),
  formula('hmin', 'h_min_two_way(ln, "interior")', len),
  formula('L', 'live_reduced(Lo, AT, kll("interior-column"), 1)', press),
  formula('As', 'as_required(Mu, b, d, fc, fy)', area),
  formula('s', `bar_spacing(As / b, "${bar}", s_max_slab(h, "two-way"))`, len),
  formula('ok', 'tension_controlled(As, b, d, fc, fy)'),
];

describe('a slab strip through the engine', () => {
  it('US inputs', async () => {
    const v = await values([
      input('fc', '4000 psi'), input('fy', '60 ksi'), input('ln', '20 ft'), input('Lo', '50 psf'),
      input('AT', '400 ft^2'), input('Mu', '8 kip*ft'), input('b', '12 in'), input('d', '6.5 in'), input('h', '8 in'),
      ...calc('in', 'in^2', 'psf', '#4'),
    ]);
    for (const k of Object.keys(v)) expect(v[k].error).toBeUndefined();
    expect(v.b1.value).toBeCloseTo(0.85, 12); // ACI 318-19 Table 22.2.2.4.3
    expect(v.b1.clauses).toContain('ACI 318-19 Table 22.2.2.4.3');
    expect((v.hmin.value as number) / 0.0254).toBeCloseTo(240 / 33, 9); // ACI 318-19 Table 8.3.1.1
    expect((v.L.value as number) / 47.880259).toBeCloseTo(31.25, 4); // computed from ASCE 7-22 Eq. 4.7-1
    expect((v.As.value as number) / 0.0254 ** 2).toBeCloseTo(0.28253, 5); // hand calc in flexure.test.ts
    // common practice, 0.5 in steps: 0.20/0.28253·12 = 8.49 in → 8.0 in (≤ min(2h, 18 in) = 16 in)
    expect((v.s.value as number) / 0.0254).toBeCloseTo(8, 9);
    expect(v.ok.value).toBe(true);
  });

  it('SI inputs give the same answers for the same slab', async () => {
    // 4000 psi = 27.579 MPa, 60 ksi = 413.69 MPa, 20 ft = 6.096 m, 50 psf = 2.394 kPa, 400 ft² = 37.161 m²,
    // 8 kip·ft = 10.847 kN·m, 12 in = 304.8 mm, 6.5 in = 165.1 mm, 8 in = 203.2 mm (exact conversions, rounded)
    const v = await values([
      input('fc', '27.579 MPa'), input('fy', '413.69 MPa'), input('ln', '6.096 m'), input('Lo', '2.394 kPa'),
      input('AT', '37.161 m^2'), input('Mu', '10.847 kN*m'), input('b', '304.8 mm'), input('d', '165.1 mm'),
      input('h', '203.2 mm'), ...calc('mm', 'mm^2', 'kPa', '#13M'),
    ]);
    for (const k of Object.keys(v)) expect(v[k].error).toBeUndefined();
    expect(v.b1.value).toBeCloseTo(0.85, 12);
    expect((v.hmin.value as number) / 0.0254).toBeCloseTo(240 / 33, 4);
    expect((v.L.value as number) / 47.880259).toBeCloseTo(31.25, 2);
    expect((v.As.value as number) / 0.0254 ** 2).toBeCloseTo(0.28253, 4);
    // metric bars go in 25 mm steps: #13M 129/(182.3 mm²/0.3048 m) = 215.7 mm → 200 mm
    expect((v.s.value as number) * 1000).toBeCloseTo(200, 9);
  });

  it('a wrong unit is refused at compile time', async () => {
    const v = await values([input('fc', '4000 psi'), formula('x', 'beta1(8 in)'), formula('y', 'bar_area("#12")')]);
    expect(v.x.error).toMatch(/beta1/);
    expect(v.y.error).toMatch(/#12/);
  });
});
