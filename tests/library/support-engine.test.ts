import { describe, expect, it } from 'vitest';
import { createEngine } from '../../runtime/engine';
import { emptyMeta, type CalcDocument, type Cell } from '../../runtime/document';

// The support functions called from formulas, through the engine's unit and type checks, in US and SI.
let id = 0;
const input = (name: string, value: string): Cell => ({ kind: 'input', id: `si${++id}`, name, value }) as Cell;
const formula = (name: string, expr: string, unit?: string): Cell =>
  ({ kind: 'formula', id: `sf${++id}`, name, expr, ...(unit ? { unit } : {}) }) as Cell;

async function values(cells: Cell[]) {
  const doc: CalcDocument = { meta: emptyMeta(), cells };
  const engine = createEngine(doc);
  await engine.settled();
  const out: Record<string, { value: unknown; error?: string }> = {};
  for (const c of engine.doc.cells) {
    const s = engine.state(c.id)!;
    out[(c as { name: string }).name] = { value: s.value, error: s.error?.message };
  }
  engine.dispose();
  return out;
}

const chain = (len: string, force: string, press: string) => [
  formula('bo', 'bo_punch(cc, cc, dd, "interior")', len),
  formula('Vc', 'vn_punch(fc, cc, cc, dd, "interior")', force),
  formula('gov', 'vc_punch_governs(fc, cc, cc, dd, "interior")'),
  formula('Pmax', 'phi_pn_max(fcc, Ag, Ast, fy, "tied")', force),
  formula('Nq', 'nq_vesic(phis)'),
  formula('qult', 'qu_terzaghi(0 Pa, 0 Pa, gs, Bf, phis, "strip")', press),
  formula('rok', 'rho_g_ok(Ast, Ag)'),
];

describe('support functions through the engine', () => {
  it('US inputs: e.8 interior punching, e.4 column, b.2/b.3 bearing factors', async () => {
    const v = await values([
      input('fc', '5000 psi'), input('cc', '16 in'), input('dd', '7 in'), input('fcc', '5000 psi'),
      input('Ag', '324 in^2'), input('Ast', '8 in^2'), input('fy', '60 ksi'), input('phis', '30 deg'),
      input('gs', '114.6 lbf/ft^3'), input('Bf', '6.5617 ft'),
      ...chain('in', 'kip', 'psf'),
    ]);
    for (const k of Object.keys(v)) expect(v[k].error, k).toBeUndefined();
    expect((v.bo.value as number) / 0.0254).toBeCloseTo(92, 9); // hand calculation from ACI 318-19 Table 22.6.5.2 [COMPUTED]
    expect(Math.abs((v.Vc.value as number) / 4448.2216 - 182.2)).toBeLessThan(0.06); // e.8 [COMPUTED]
    expect(v.gov.value).toMatch(/\(a\)/); // e.8: 4λs√f'c governs
    expect(Math.abs((v.Pmax.value as number) / 4448.2216 - 948)).toBeLessThan(0.5); // e.4 [COMPUTED]
    expect(Math.abs((v.Nq.value as number) - 18.4)).toBeLessThan(0.02); // b.2 [CONFIRMED]
    // strip, c = q = 0: 0.5·γ·B·Nγ with Das Table 3.1 Nγ(30°) = 19.13 [CONFIRMED-indirect];
    // 114.6 pcf = 18.00 kN/m³, 6.5617 ft = 2.000 m → 0.5·18·2·19.13 = 344.3 kPa
    expect((v.qult.value as number) / 1000).toBeCloseTo(344.3, 0);
    expect(v.rok.value).toBe(true); // §10.6.1.1: 8/324 = 0.025 [CONFIRMED]
  });

  it('SI inputs give the same answers', async () => {
    // 5000 psi = 34.474 MPa, 16 in = 406.4 mm, 7 in = 177.8 mm, 324 in² = 209032 mm², 8 in² = 5161.3 mm²,
    // 60 ksi = 413.69 MPa (exact conversions, rounded)
    const v = await values([
      input('fc', '34.474 MPa'), input('cc', '406.4 mm'), input('dd', '177.8 mm'), input('fcc', '34.474 MPa'),
      input('Ag', '209032 mm^2'), input('Ast', '5161.3 mm^2'), input('fy', '413.69 MPa'), input('phis', '30 deg'),
      input('gs', '18 kN/m^3'), input('Bf', '2 m'),
      ...chain('mm', 'kN', 'kPa'),
    ]);
    for (const k of Object.keys(v)) expect(v[k].error, k).toBeUndefined();
    expect(Math.abs((v.Vc.value as number) / 4448.2216 - 182.2)).toBeLessThan(0.06);
    expect(Math.abs((v.Pmax.value as number) / 4448.2216 - 948)).toBeLessThan(0.5);
    expect((v.qult.value as number) / 1000).toBeCloseTo(344.3, 0);
  });

  it('a refused argument comes back as an error at the calling cell', async () => {
    const v = await values([
      input('cc', '16 in'), input('dd', '-7 in'),
      formula('bo', 'bo_punch(cc, cc, dd, "interior")', 'in'),
    ]);
    expect(v.bo.error).toMatch(/d must be greater than 0 \(it is negative\)/);
  });
});
