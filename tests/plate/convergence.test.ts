// Mesh convergence: the error must fall as the grid refines, at the expected order.
// Conforming bicubic (Bogner–Fox–Schmit) rectangles on a uniform grid: nodal deflections
// converge like h⁴, and the moments recovered from nodal values and slopes likewise
// (runtime/plate/recover.ts). Expected order 4 (common practice for this element; measured).
import { describe, expect, it } from 'vitest';
import { parseEdges } from '../../runtime/plate/edges';
import { levyPanel } from '../../runtime/plate/levy';
import { levyPoint } from '../../runtime/plate/series';
import { solveUnitPlate } from '../../runtime/plate/unit';

const order = (eCoarse: number, eFine: number) => Math.log2(eCoarse / eFine);
const coefs = (code: string, r: number, ns: number[]) => ns.map((n) => solveUnitPlate(r, parseEdges(code), 0.3, n).coefficients);

describe('mesh convergence', () => {
  it('SSSS b/a = 1.5: centre w and Mx errors against the Lévy series fall like h⁴', () => {
    const exact = levyPoint(1.5, 0.3, 0.5, 0.75); // [COMPUTED] series, Timoshenko Table 8 values to 6 digits
    const c = coefs('SSSS', 1.5, [4, 8, 16]);
    for (const k of ['w', 'mx', 'my'] as const) {
      const e = c.map((v) => Math.abs(v[k] - exact[k]));
      expect(e[1]).toBeLessThan(e[0]);
      expect(e[2]).toBeLessThan(e[1]);
      for (const p of [order(e[0], e[1]), order(e[1], e[2])]) {
        expect(p).toBeGreaterThan(3.5);
        expect(p).toBeLessThan(4.6);
      }
    }
  });

  it('SSSF: deflection at the middle of the free edge converges like h⁴ to the Lévy series', () => {
    const exact = levyPanel(1, 'S', 'F', 0.3, 0.5, 1).w; // [COMPUTED]
    const e = coefs('SSSF', 1, [4, 8, 16]).map((c) => Math.abs(c.w_max - exact));
    expect(order(e[0], e[1])).toBeGreaterThan(3.5);
    expect(order(e[1], e[2])).toBeGreaterThan(3.5);
  });

  it('CCCC square: the clamped-edge moment settles like h⁴ (differences of successive meshes)', () => {
    const m = coefs('CCCC', 1, [8, 16, 32]).map((c) => c.mx_edge);
    const d1 = Math.abs(m[1] - m[0]), d2 = Math.abs(m[2] - m[1]);
    expect(order(d1, d2)).toBeGreaterThan(3.5);
    expect(order(d1, d2)).toBeLessThan(4.7);
    expect(Math.abs(m[2] - -0.05133) / 0.05133).toBeLessThan(0.0002); // Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells, Table 35 [COMPUTED]
  });
});
