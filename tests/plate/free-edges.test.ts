// Free and clamped edges: exact beam cases, the general Lévy series, and sense checks.
import { describe, expect, it } from 'vitest';
import { LibraryError } from '../../runtime/library/types';
import { parseEdges } from '../../runtime/plate/edges';
import { levyPanel } from '../../runtime/plate/levy';
import { solveUnitPlate } from '../../runtime/plate/unit';

const solve = (code: string, r: number, nu: number, n?: number) => solveUnitPlate(r, parseEdges(code), nu, n);

describe('exact cylindrical bending (ν = 0, beam theory)', () => {
  it('SFSF: two opposite free edges bend as a simply supported beam', () => {
    // With ν = 0 the beam deflection satisfies My = 0 and Vy = 0 on the free edges exactly:
    // w = 5qa⁴/384D, Mx = qa²/8, My = 0 (beam theory, common practice; Timoshenko Table 8, b/a = ∞).
    const s = solve('SFSF', 1.3, 0, 6);
    const { w, mx, my } = s.fields;
    const c = s.coefficients;
    expect(c.w).toBeCloseTo(5 / 384, 12);
    expect(c.w_max).toBeCloseTo(5 / 384, 12);
    expect(c.mx).toBeCloseTo(1 / 8, 10);
    for (let p = 0; p < my.length; p++) expect(Math.abs(my[p])).toBeLessThan(1e-9);
    // uniform across y: every grid row equals the first
    const nx = s.mesh.nx;
    for (let p = 0; p < w.length; p++) expect(w[p]).toBeCloseTo(w[p % (nx + 1)], 12);
    expect(mx[0]).toBeCloseTo(0, 10); // simply supported end
    expect(s.reactions.edges.map((e) => e.share)).toEqual([0.5, 0, 0.5, 0].map((v) => expect.closeTo(v, 12)));
  });

  it('CFFF: cantilever plate, tip deflection qa⁴/8D and root moment −qa²/2', () => {
    // Cantilever beam under uniform load (beam theory, common practice).
    const c = solve('CFFF', 0.7, 0, 4).coefficients;
    expect(c.w_max).toBeCloseTo(1 / 8, 12);
    expect(c.mx_edge).toBeCloseTo(-1 / 2, 10);
    expect(c.share_x).toBeCloseTo(1, 12);
  });
});

describe('free and clamped edges against the Lévy series (ν = 0.3) [COMPUTED]', () => {
  // Lévy single series with its four constants per term solved from the edge conditions
  // (Timoshenko & Woinowsky-Krieger §§45–47 method); an independent solution of the same problem.
  const cases: [string, number][] = [['SSSF', 1], ['SFSF', 1], ['SCSF', 1.5], ['SSSC', 2], ['SCSC', 1]];
  for (const [code, r] of cases) {
    it(`${code}, b/a = ${r}`, () => {
      const s = solve(code, r, 0.3);
      const { nx, ny, hx, hy } = s.mesh;
      const e = parseEdges(code);
      const peakW = Math.abs(levyPanel(r, e[1], e[3], 0.3, 0.5, r).w) + Math.abs(levyPanel(r, e[1], e[3], 0.3, 0.5, r / 2).w);
      const peakM = 0.15;
      for (const [ix, iy] of [[nx / 2, ny / 2], [nx / 2, ny], [nx / 2, 0], [nx / 4, ny / 4], [nx / 4, ny], [0, ny / 2]]) {
        const L = levyPanel(r, e[1], e[3], 0.3, ix * hx, iy * hy);
        const p = iy * (nx + 1) + ix;
        expect(Math.abs(s.fields.w[p] - L.w)).toBeLessThan(1e-5 * peakW);
        expect(Math.abs(s.fields.mx[p] - L.mx)).toBeLessThan(1e-4 * peakM);
        expect(Math.abs(s.fields.my[p] - L.my)).toBeLessThan(1e-4 * peakM);
        expect(Math.abs(s.fields.mxy[p] - L.mxy)).toBeLessThan(1e-4 * peakM);
      }
    });
  }
});

describe('sense of a panel with a free edge', () => {
  it('SSSF deflects more than SSSS, most at the middle of the free edge, and the free edge carries nothing', () => {
    const sf = solve('SSSF', 1, 0.3), ss = solve('SSSS', 1, 0.3);
    expect(sf.coefficients.w_max).toBeGreaterThan(2 * ss.coefficients.w_max); // common practice: losing an edge support
    const { nx, ny } = sf.mesh;
    expect(sf.fields.w[ny * (nx + 1) + nx / 2]).toBeCloseTo(sf.coefficients.w_max, 14); // peak on the free edge
    const shares = sf.reactions.edges.map((e) => e.share);
    expect(shares[3]).toBe(0); // free edge y = b
    expect(shares[0]).toBeCloseTo(shares[2], 12); // symmetry about x = a/2
    expect(shares[0] + shares[1] + shares[2] + shares[3]).toBeCloseTo(1, 10); // vertical equilibrium
    expect(shares[1]).toBeGreaterThan(0.25); // the edge opposite the free one takes more than a quarter
  });

  it('a panel held by one edge only is refused, not solved', () => {
    for (const code of ['SFFF', 'FFSF', 'FFFF']) {
      expect(() => solve(code, 1, 0.3, 8)).toThrow(LibraryError);
    }
    expect(() => solve('SSFF', 1, 0.3, 8)).not.toThrow(); // two adjacent supported edges do hold it
  });
});
