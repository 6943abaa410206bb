import { describe, expect, it } from 'vitest';
import { BuildingInputError } from '../../runtime/building/issues';
import { prepareStoreys, storeyIssues, type StoreyInput } from '../../runtime/building/storeys';
import { baseWithOverride, takedown } from '../../runtime/building/takedown';
import { colDead, colLive, colPu, colPs } from '../../runtime/library/loads-accumulation';
import { ft, inch, kN, kPa, lbf, pcf, psf } from '../../runtime/units/si';

const ft2 = ft * ft;
const wc = 150 * pcf;

function floor(level: string, Lo: number, more: Partial<StoreyInput> = {}): StoreyInput {
  return { level, height: 10 * ft, slab: 9 * inch, sdl: 25 * psf, live: Lo, occupancy: 'general', reducible: true, snow: 0, ...more };
}
const roof = (more: Partial<StoreyInput> = {}) => floor('Roof', 20 * psf, { sdl: 20 * psf, ...more });
const col = (AT: number, KLL = 4) => ({ AT, KLL, c1: 20 * inch, c2: 20 * inch });

describe('live load reduction down the column, ASCE 7-22 §4.7.2 Eq. 4.7-1 (L = Lo(0.25 + 15/√(KLL·AT)), AT summed over the floors carried)', () => {
  // interior column, KLL = 4 (Table 4.7-1), AT = 24 × 22 = 528 ft² a floor, Lo = 40 psf on 12 floors
  const levels = [roof(), ...Array.from({ length: 12 }, (_, k) => floor(`L${13 - k}`, 40 * psf))];
  const rows = takedown(prepareStoreys(levels, wc), col(528 * ft2), wc);
  const Lpsf = (k: number) => rows[k].L / lbf;

  it('one floor: the 0.50 limit does not govern', () => {
    // KLL·AT = 4 × 528 = 2112 ft²; 0.25 + 15/√2112 = 0.25 + 15/45.957 = 0.57640 ≥ 0.50
    // L = 0.57640 × 40 psf × 528 ft² = 12,173.5 lb
    expect(Lpsf(1)).toBeCloseTo(0.576396 * 40 * 528, 0);
  });

  it('two floors: AT summed over both', () => {
    // AT = 2 × 528 = 1056 ft², KLL·AT = 4224; 0.25 + 15/√4224 = 0.25 + 15/64.992 = 0.48080 ≥ 0.40
    // L = 0.48080 × 40 × 1056 = 20,308.9 lb
    expect(Lpsf(2)).toBeCloseTo(0.480797 * 40 * 1056, 0);
  });

  it('twelve floors: the 0.40 limit for members carrying two or more floors governs', () => {
    // AT = 12 × 528 = 6336 ft², KLL·AT = 25,344; 0.25 + 15/√25344 = 0.25 + 0.09422 = 0.34422 < 0.40
    // L = 0.40 × 40 × 6336 = 101,376 lb
    expect(Lpsf(12)).toBeCloseTo(101376, 3);
    expect(rows[12].Lo / lbf).toBeCloseTo(40 * 6336, 3);
  });

  it('the 0.50 limit for one floor, and no reduction below KLL·AT = 400 ft²', () => {
    // one floor, AT = 30 × 30 = 900 ft²: KLL·AT = 3600, 0.25 + 15/60 = 0.50 exactly → L = 0.5 × 40 × 900
    const big = takedown(prepareStoreys([roof(), floor('L2', 40 * psf)], wc), col(900 * ft2), wc);
    expect(big[1].L / lbf).toBeCloseTo(0.5 * 40 * 900, 6);
    // AT = 10 × 9 = 90 ft²: KLL·AT = 360 < 400 → not reduced (§4.7.2)
    const small = takedown(prepareStoreys([roof(), floor('L2', 40 * psf)], wc), col(90 * ft2), wc);
    expect(small[1].L / lbf).toBeCloseTo(40 * 90, 6);
  });

  it('SI input: the same equation in its SI form', () => {
    // SI form L = Lo(0.25 + 4.57/√(KLL·AT)), AT in m² (from memory; 4.57 = 15/√10.764):
    // Lo = 2.4 kPa, AT = 60 m², one floor: 2.4(0.25 + 4.57/√240) = 1.30798 kPa × 60 m² = 78.479 kN
    const si = takedown(prepareStoreys([roof(), floor('L2', 2.4 * kPa)], wc), col(60), wc);
    expect(Math.abs(si[1].L / kN - 78.479) / 78.479).toBeLessThan(5e-4);
  });
});

describe('the exclusions of ASCE 7-22 §4.7.3–4.7.5 and the roof (from memory, as live_reduced)', () => {
  const AT = 528 * ft2;
  const run = (levels: StoreyInput[]) => takedown(prepareStoreys(levels, wc), col(AT), wc);

  it('Lo > 100 psf: not reduced on one floor; at most 20 % on two or more (§4.7.3)', () => {
    const r = run([roof(), floor('L3', 125 * psf), floor('L2', 125 * psf)]);
    expect(r[1].L / lbf).toBeCloseTo(125 * 528, 6);
    // two floors: Eq. 4.7-1 gives 0.4808 but the reduction stops at 20 % → 0.8 × 125 × 1056
    expect(r[2].L / lbf).toBeCloseTo(0.8 * 125 * 1056, 6);
  });

  it('passenger-vehicle garages (§4.7.4), assembly (§4.7.5), and a floor the engineer marks not reducible', () => {
    const g = run([roof(), floor('P2', 40 * psf, { occupancy: 'garage' }), floor('P1', 40 * psf, { occupancy: 'garage' })]);
    expect(g[1].L / lbf).toBeCloseTo(40 * 528, 6);
    expect(g[2].L / lbf).toBeCloseTo(0.8 * 40 * 1056, 6);
    const a = run([roof(), floor('Hall', 100 * psf, { occupancy: 'assembly' }), floor('L2', 50 * psf)]);
    // assembly unreduced, 100 × 528 = 52,800 lb; the office floor below alone in its group:
    // KLL·AT = 2112 → 0.57640 × 50 × 528 = 15,216.9 lb
    expect(a[2].L / lbf).toBeCloseTo(52800 + 0.576396 * 50 * 528, 0);
    const n = run([roof(), floor('L2', 50 * psf, { reducible: false })]);
    expect(n[1].L / lbf).toBeCloseTo(50 * 528, 6);
  });

  it('roof live load and snow stay at the roof, unreduced', () => {
    const r = run([roof({ snow: 30 * psf }), floor('L2', 40 * psf)]);
    expect(r[0].L).toBe(0);
    expect(r[0].Lr / lbf).toBeCloseTo(20 * 528, 6);
    expect(r[1].S / lbf).toBeCloseTo(30 * 528, 6);
  });
});

describe('a whole takedown by hand: roof and two floors', () => {
  // AT = 400 ft², KLL = 4, 20 × 20 in column, wc = 150 pcf, 9 in slab, storeys 10 ft,
  // SDL 25 psf (floors) / 20 psf (roof), Lo = 80 psf, Lr = 20 psf.
  // column weight (20/12)² × 150 = 416.67 plf → 4,166.7 lb a storey
  // floor dead 0.75 × 150 + 25 = 137.5 psf; roof dead 112.5 + 20 = 132.5 psf
  const levels = [roof(), floor('L3', 80 * psf), floor('L2', 80 * psf)];
  const rows = takedown(prepareStoreys(levels, wc), col(400 * ft2), wc);
  const lb = (v: number) => v / lbf;

  it('roof row: 1.2D + 1.6Lr governs (ASCE 7-22 §2.3.1 comb. 3)', () => {
    // D = 400 × 132.5 + 4,166.7 = 57,166.7 lb; Lr = 400 × 20 = 8,000 lb
    // 1.4D = 80,033; 1.2D + 0.5Lr = 72,600; 1.2D + 1.6Lr = 68,600 + 12,800 = 81,400 lb
    expect(lb(rows[0].D)).toBeCloseTo(57166.67, 1);
    expect(lb(rows[0].Pu)).toBeCloseTo(81400, 1);
    expect(rows[0].combo).toBe('1.2D + (1.6Lr or 1.0S or 1.6R) + L'); // ASCE 7-22 §2.3.1 comb. 3, in 7-22's words
    // service: D + Lr = 65,166.7 lb (ASCE 7-22 §2.4.1)
    expect(lb(rows[0].Ps)).toBeCloseTo(65166.67, 1);
  });

  it('one floor down: 1.2D + 1.6L + 0.5Lr governs', () => {
    // D = 57,166.7 + 400 × 137.5 + 4,166.7 = 116,333.3 lb
    // KLL·AT = 1600 → 0.25 + 15/40 = 0.625 → L = 0.625 × 80 × 400 = 20,000 lb
    // 1.4D = 162,866.7; 1.2D + 1.6L + 0.5Lr = 139,600 + 32,000 + 4,000 = 175,600 lb
    expect(lb(rows[1].D)).toBeCloseTo(116333.33, 1);
    expect(lb(rows[1].L)).toBeCloseTo(20000, 1);
    expect(lb(rows[1].Pu)).toBeCloseTo(175600, 1);
    expect(rows[1].combo).toBe('1.2D + 1.6L + (0.5Lr or 0.3S or 0.5R)'); // ASCE 7-22 §2.3.1 comb. 2
  });

  it('at the footing: two floors', () => {
    // D = 116,333.3 + 55,000 + 4,166.7 = 175,500 lb
    // KLL·AT = 3200 → 0.25 + 15/56.569 = 0.515165 → L = 0.515165 × 80 × 800 = 32,970.6 lb
    // Pu = 1.2 × 175,500 + 1.6 × 32,970.6 + 0.5 × 8,000 = 210,600 + 52,753.0 + 4,000 = 267,353.0 lb
    // Ps = D + L = 208,470.6 lb (> D + 0.75(L + Lr) = 206,228.0)
    expect(lb(rows[2].D)).toBeCloseTo(175500, 1);
    expect(lb(rows[2].L)).toBeCloseTo(32970.6, 0);
    expect(lb(rows[2].Pu)).toBeCloseTo(267353.0, 0);
    expect(lb(rows[2].Ps)).toBeCloseTo(208470.6, 0);
  });

  it('the same numbers as the single-column template (col_dead, col_live, col_pu, col_ps) on equal storeys', () => {
    const c = { floors: 2, AT: 400 * ft2, Dfloor: 137.5 * psf, Lfloor: 80 * psf, Droof: 132.5 * psf, Lroof: 20 * psf, wCol: (20 * inch) ** 2 * wc, hStorey: 10 * ft, KLL: 4 };
    for (const floors of [0, 1, 2]) {
      const r = rows[floors];
      expect(r.D).toBeCloseTo(colDead({ ...c, floors }), 6);
      expect(r.L).toBeCloseTo(colLive({ ...c, floors }), 6);
      expect(r.Pu).toBeCloseTo(colPu({ ...c, floors }), 6);
      expect(r.Ps).toBeCloseTo(colPs({ ...c, floors }), 6);
    }
  });

  it('loads given by the engineer replace the computed ones at the base and are combined again', () => {
    // D = 200 kip, L = 40 kip, Lr = 8 kip → 1.2 × 200 + 1.6 × 40 + 0.5 × 8 = 308 kip
    const o = baseWithOverride(rows[2], { D: 200000 * lbf, L: 40000 * lbf });
    expect(lb(o.Pu)).toBeCloseTo(308000, 3);
    expect(baseWithOverride(rows[2], {})).toBe(rows[2]);
  });
});

describe('the ASCE 7 edition of the combinations (snow at the roof is where they differ)', () => {
  // AT = 400 ft², roof only: D = 400 × 132.5 + 4,166.7 = 57,166.7 lb; Lr = 8,000 lb; S = 400 × 30 = 12,000 lb
  const st = prepareStoreys([roof({ snow: 30 * psf })], wc);
  const lb = (v: number) => v / lbf;

  it('ASCE 7-22 §2.3.1: 1.2D + 1.0S (strength-level snow, from memory) against 1.2D + 1.6Lr; §2.4.1: D + 0.7S', () => {
    // 1.4D = 80,033.3; comb. 3 leading roof load max(1.6 × 8,000, 1.0 × 12,000) = 12,800 → 68,600 + 12,800 = 81,400 lb
    const [r] = takedown(st, col(400 * ft2), wc, '7-22');
    expect(lb(r.Pu)).toBeCloseTo(81400, 1);
    expect(r.combo).toBe('1.2D + (1.6Lr or 1.0S or 1.6R) + L');
    // ASD: roof load max(Lr, 0.7S) = max(8,000, 8,400) = 8,400 → D + 8,400 = 65,566.7 lb
    expect(lb(r.Ps)).toBeCloseTo(65566.67, 1);
  });

  it('ASCE 7-16 §2.3.2: 1.2D + 1.6S (service-level snow); §2.4.1: D + S', () => {
    // comb. 3: max(1.6 × 8,000, 1.6 × 12,000) = 19,200 → 68,600 + 19,200 = 87,800 lb
    const [r] = takedown(st, col(400 * ft2), wc, '7-16');
    expect(lb(r.Pu)).toBeCloseTo(87800, 1);
    expect(r.combo).toBe('1.2D + 1.6(Lr or S or R) + L');
    // ASD: D + S = 57,166.7 + 12,000 = 69,166.7 lb
    expect(lb(r.Ps)).toBeCloseTo(69166.67, 1);
    // an override at the base is combined again in the same edition: D = 50 kip,
    // 1.2 × 50 + 1.6 × 12 = 79.2 kip > 1.4 × 50 = 70 kip (7-22 would give 60 + max(12.8, 12) = 72.8)
    expect(lb(baseWithOverride(r, { D: 50000 * lbf, L: 0 }, '7-16').Pu)).toBeCloseTo(79200, 1);
    expect(lb(baseWithOverride(r, { D: 50000 * lbf, L: 0 }, '7-22').Pu)).toBeCloseTo(72800, 1);
  });
});

describe('storey rows are checked, each problem at its row and column', () => {
  it('names what is wrong', () => {
    const bad = [roof({ height: 0 }), floor('L2', -1), floor('L2', 40 * psf, { snow: 5 * psf })];
    const issues = storeyIssues(bad);
    expect(issues).toContainEqual({ table: 'storeys', row: 1, column: 'height', message: 'storey height must be greater than 0 (got 0)' });
    expect(issues).toContainEqual(expect.objectContaining({ row: 2, column: 'live' }));
    expect(issues).toContainEqual({ table: 'storeys', row: 3, column: 'level', message: 'level "L2" is already row 2' });
    expect(issues).toContainEqual(expect.objectContaining({ row: 3, column: 'snow' }));
    expect(storeyIssues(Array.from({ length: 61 }, (_, k) => floor(`L${k}`, 40 * psf)))).toContainEqual(expect.objectContaining({ message: 'give 1 to 60 storeys, roof first (there are 61)' }));
    expect(() => prepareStoreys(bad, wc)).toThrow(BuildingInputError);
  });
});
