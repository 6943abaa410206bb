// The two-way split: share of the load reaching each edge.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseEdges, type EdgeCondition } from '../../runtime/plate/edges';
import { levyPoint, levyShares } from '../../runtime/plate/series';
import { solveUnitPlate } from '../../runtime/plate/unit';

const shares = (code: string, r: number, n?: number) =>
  solveUnitPlate(r, parseEdges(code), 0.3, n).reactions.edges.map((e) => e.share);

describe('two-way split', () => {
  it('a square panel simply supported or clamped all round sends 25 % to each edge', () => {
    // Symmetry of the square (common practice).
    for (const code of ['SSSS', 'CCCC']) {
      for (const s of shares(code, 1)) expect(s).toBeCloseTo(0.25, 12);
    }
  });

  it('SSSS shares match the integrated Lévy edge reactions [COMPUTED]', () => {
    for (const r of [1.5, 2, 3]) {
      const fe = shares('SSSS', r), L = levyShares(r, 0.3);
      expect(fe[0]).toBeCloseTo(L.x0, 3);
      expect(fe[1]).toBeCloseTo(L.y0, 3);
    }
  });

  it('a long panel (b/a = 3) sends most of the load across the short span, to the long edges', () => {
    const s = shares('SSSS', 3);
    expect(s[0] + s[2]).toBeGreaterThan(0.8); // series: 0.819 [COMPUTED]; one-way action (common practice)
    const c = shares('CCCC', 3);
    expect(c[0] + c[2]).toBeGreaterThan(0.8);
  });

  it('a clamped edge draws more load than the simply supported edge opposite it', () => {
    const s = shares('CSSS', 1); // common practice: stiffer support attracts load
    expect(s[0]).toBeGreaterThan(s[2]);
  });

  it('shares sum to 1, free edges carry 0 (any panel that is held); a loose panel is refused', () => {
    // A panel is held against rigid motion w = c0 + c1 x + c2 y by one clamped edge or by
    // two supported edges (common practice).
    const cond = fc.constantFrom<EdgeCondition>('S', 'C', 'F');
    fc.assert(
      fc.property(fc.tuple(cond, cond, cond, cond), fc.constantFrom(0.5, 1, 1.7), (code, r) => {
        const held = code.includes('C') || code.filter((c) => c === 'S').length >= 2;
        if (!held) {
          expect(() => shares(code.join(''), r, 6)).toThrow(/rigid body/);
          return;
        }
        const s = shares(code.join(''), r, 6);
        expect(s.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 9); // vertical equilibrium
        code.forEach((c, i) => { if (c === 'F') expect(s[i]).toBe(0); });
      }),
      { numRuns: 40 },
    );
  });
});

describe('corner forces', () => {
  it('SSSS corners are held down by 2 Mxy, as the Lévy series gives [COMPUTED]', () => {
    for (const r of [1, 2]) {
      const s = solveUnitPlate(r, parseEdges('SSSS'), 0.3);
      const L = 2 * levyPoint(r, 0.3, 0, 0).mxy; // Timoshenko & Woinowsky-Krieger §31: R = 2 Mxy
      for (const v of Object.values(s.reactions.corners)) expect(v).toBeCloseTo(-L, 4);
      // the nodal support force at the corner tends to the same value as the mesh refines
      const err = (n: number) => Math.abs(solveUnitPlate(r, parseEdges('SSSS'), 0.3, n).reactions.cornerNodes.x0y0 + L);
      expect(err(16)).toBeLessThan(err(8));
    }
  });

  it('clamped corners carry no corner force', () => {
    const s = solveUnitPlate(1, parseEdges('CCCC'), 0.3);
    for (const v of Object.values(s.reactions.corners)) expect(Math.abs(v)).toBe(0); // Mxy = 0 on a clamped edge
  });
});
