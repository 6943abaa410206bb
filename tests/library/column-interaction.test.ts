// P–M interaction of a rectangular tied column by strain compatibility, checked against
// points worked by hand here (kip, in, ksi) with the ACI 318-19 §22.2 assumptions:
// εcu = 0.003 (§22.2.2.1), Es = 29,000 ksi (§20.2.2.2), 0.85 f'c over a = β1 c
// (ACI 318-19 §22.2.2.4.1), β1 = 0.80 at 5000 psi (Table 22.2.2.4.3,
// CONFIRMED), φ from εt by Table 21.2.2 (0.65 tied at εt ≤ εty, 0.90 at εt ≥ εty + 0.003;
// 318-14: 0.005; from memory), Pn,max = 0.80 Po (Table 22.4.2.1, CONFIRMED).

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { call, num } from './support-call';
import { momentStrengthAt, pmRatio, sectionOf } from '../../runtime/library/column-interaction';
import { axialLimits, strainPoint } from '../../runtime/library/column-section';
import { inch, kip, ksi, kN, mm, MPa, psi } from '../../runtime/units/si';

const kipIn = kip * inch, kipFt = kip * 0.3048;
// The section worked by hand: 20 × 20 in, #8 bars (0.79 in², ASTM A615), 3 on each face
// (8 bars), 2.5 in from the faces to the bar centres; f'c = 5000 psi, fy = 60 ksi.
const S = [5000 * psi, 60 * ksi, 20 * inch, 20 * inch, 3, 3, '#8', 2.5 * inch] as const;
// Rows: y = 2.5 in (3 bars, 2.37 in²), y = 10 in (2 bars, 1.58 in²), y = 17.5 in (3 bars, 2.37 in²).
const Es = 29000, eps_cu = 0.003, fcK = 5, fyK = 60, b = 20, beta1 = 0.8;
const rows = [{ y: 2.5, A: 2.37 }, { y: 10, A: 1.58 }, { y: 17.5, A: 2.37 }];

/** The hand calculation at neutral axis depth c (in): forces in kip, moment in kip·in about h/2 = 10 in. */
function byHand(c: number): { Pn: number; Mn: number; epsT: number } {
  const a = Math.min(beta1 * c, 20); // the block stops at the far face
  const Cc = 0.85 * fcK * a * b; // 0.85 f'c a b
  let Pn = Cc, Mn = Cc * (10 - a / 2);
  for (const r of rows) {
    const eps = (eps_cu * (c - r.y)) / c;
    const fs = Math.max(-fyK, Math.min(fyK, Es * eps));
    const F = r.A * (fs - (r.y < a ? 0.85 * fcK : 0)); // displaced concrete inside the block
    Pn += F;
    Mn += F * (10 - r.y);
  }
  return { Pn, Mn, epsT: (eps_cu * (17.5 - c)) / c };
}

describe('interaction points worked by hand (ACI 318-19 §22.2)', () => {
  it('balanced point: c = 10.357 in, Pb = 699.0 kip, Mb = 6182.6 kip·in, φ = 0.65', () => {
    // εty = 60/29000 = 0.0020690; cb = 0.003·17.5/(0.003 + 0.0020690) = 0.0525/0.0050690 = 10.357 in; a = 0.8·10.357 = 8.286 in
    // Cc = 0.85·5·8.286·20 = 704.29 kip, arm 10 − 4.143 = 5.857 in → 4125.1 kip·in
    // top  y = 2.5:  ε = 0.003(10.357 − 2.5)/10.357 = 0.002276 > εty → 60 − 4.25 = 55.75 ksi · 2.37 = 132.13 kip, arm 7.5 → 990.97
    // mid  y = 10:   ε = 0.003(0.357)/10.357 = 0.0001034 → 3.00 ksi · 1.58 = 4.74 kip, arm 0
    // bot  y = 17.5: ε = −0.002069 → −60 ksi · 2.37 = −142.20 kip, arm −7.5 → +1066.5
    // Pn = 704.29 + 132.13 + 4.74 − 142.20 = 698.96 kip; Mn = 4125.1 + 991.0 + 1066.5 = 6182.6 kip·in
    const cb = (0.003 * 17.5) / (0.003 + 60 / 29000);
    expect(cb).toBeCloseTo(10.357, 3);
    const hand = byHand(cb);
    expect(hand.Pn).toBeCloseTo(698.96, 1);
    expect(hand.Mn).toBeCloseTo(6182.6, 0);
    expect(num('col_pb', ...S) / kip).toBeCloseTo(hand.Pn, 6);
    expect(num('col_mb', ...S) / kipIn).toBeCloseTo(hand.Mn, 4);
    // On the balanced line e = Mb/Pb = 8.845 in the design strength is φPb = 0.65·698.96 = 454.3 kip (Table 21.2.2)
    expect(num('col_phi_pn_e', (hand.Mn / hand.Pn) * inch, ...S) / kip).toBeCloseTo(0.65 * hand.Pn, 3);
  });

  it('pure bending: c = 2.989 in, Mn = 3109.1 kip·in, φ = 0.90, φMn = 233.2 kip·ft', () => {
    // Guess: top bars elastic and outside the block (a < 2.5), middle and bottom yield in tension.
    // 0.85·5·0.8c·20 + 2.37·87(c − 2.5)/c − 1.58·60 − 2.37·60 = 0 → 68c² − 30.81c − 515.475 = 0
    // c = (30.81 + √(30.81² + 4·68·515.475))/136 = (30.81 + 375.71)/136 = 2.9891 in; a = 2.391 in < 2.5 (guess holds)
    const c = (30.81 + Math.sqrt(30.81 ** 2 + 4 * 68 * 515.475)) / 136;
    expect(c).toBeCloseTo(2.9891, 3);
    const hand = byHand(c);
    expect(Math.abs(hand.Pn)).toBeLessThan(0.05); // Pn = 0 (kip)
    // Mn = 203.26·(10 − 1.196) + 2.37·14.23·7.5 + 142.2·7.5 = 1789.6 + 252.9 + 1066.5 = 3109.0 kip·in
    expect(hand.Mn).toBeCloseTo(3109.1, 0);
    // εt = 0.003(17.5 − 2.989)/2.989 = 0.01456 ≥ 0.00507: tension-controlled, φ = 0.90
    expect(hand.epsT).toBeGreaterThan(60 / 29000 + 0.003);
    expect(num('col_phi_mn', 0, ...S) / kipFt).toBeCloseTo((0.9 * hand.Mn) / 12, 1); // 233.2 kip·ft
    expect(num('col_phi_at', 0, ...S)).toBe(0.9);
  });

  it('any neutral axis depth: the library point equals the hand calculation', () => {
    for (const c of [1.5, 4, 7.5, 12, 17.5, 22, 40]) {
      const p = strainPoint(sectionOf(...S), c * inch);
      const hand = byHand(c);
      expect(p.pn / kip).toBeCloseTo(hand.Pn, 6);
      expect(p.mn / kipIn).toBeCloseTo(hand.Mn, 5);
      expect(p.epsT).toBeCloseTo(hand.epsT, 12);
    }
  });

  it('φ in the transition: linear in εt from εty to εty + 0.003 (318-19) or to 0.005 (318-14)', () => {
    // c = 6 in: εt = 0.003(17.5 − 6)/6 = 0.00575. 318-19: ≥ 0.002069 + 0.003 = 0.005069 → φ = 0.90.
    // c = 7 in: εt = 0.003·10.5/7 = 0.0045 → 318-19 φ = 0.65 + 0.25(0.0045 − 0.002069)/0.003 = 0.8526;
    // 318-14 φ = 0.65 + 0.25(0.0045 − 0.002069)/(0.005 − 0.002069) = 0.8574
    const s19 = sectionOf(...S), s14 = sectionOf(...S, '318-14');
    expect(strainPoint(s19, 6 * inch).phi).toBe(0.9);
    const ety = 60 / 29000;
    expect(strainPoint(s19, 7 * inch).phi).toBeCloseTo(0.65 + (0.25 * (0.0045 - ety)) / 0.003, 10);
    expect(strainPoint(s14, 7 * inch).phi).toBeCloseTo(0.65 + (0.25 * (0.0045 - ety)) / (0.005 - ety), 10);
  });
});

describe('design strengths from the curve', () => {
  it('Pn,max cap: φPn,max = 0.65·0.80·Po = 1067.2 kip; no moment strength above it', () => {
    // Po = 0.85·5·(400 − 6.32) + 60·6.32 = 1673.14 + 379.20 = 2052.34 kip (Eq. 22.4.2.2)
    const po = 0.85 * 5 * (400 - 6.32) + 60 * 6.32;
    expect(po).toBeCloseTo(2052.34, 2);
    expect(num('col_pm_ratio', 800 * kip, 0, ...S)).toBeCloseTo(800 / (0.52 * po), 9);
    expect(num('col_phi_mn', 1100 * kip, ...S)).toBe(0);
    expect(num('col_phi_pn_e', 0, ...S) / kip).toBeCloseTo(0.52 * po, 6);
    // Just below the cap the section still has some moment strength.
    expect(num('col_phi_mn', 1060 * kip, ...S)).toBeGreaterThan(0);
  });

  it('φMn at Pu lands on the point whose φPn is Pu, below the balanced point too', () => {
    // At Pu = φPb = 454.32 kip the point is the balanced one: φMn = 0.65·6182.6 = 4018.7 kip·in (hand above)
    const phiPb = 0.65 * byHand((0.003 * 17.5) / (0.003 + 60 / 29000)).Pn;
    expect(num('col_phi_mn', phiPb * kip, ...S) / kipIn).toBeCloseTo(0.65 * 6182.56, 0);
    // At Pu = 200 kip (between pure bending and balanced): the point's φPn is 200 kip by construction.
    const mn = num('col_phi_mn', 200 * kip, ...S);
    const phi = num('col_phi_at', 200 * kip, ...S);
    expect(phi).toBeGreaterThan(0.65);
    expect(phi).toBeLessThanOrEqual(0.9);
    expect(mn / kipFt).toBeGreaterThan(233.2); // more moment than pure bending below the balanced load (common practice)
  });

  it('the ratio along the load line is 1 on the curve and scales with the demand', () => {
    // On the balanced line: (Pu, Mu) = (φPb, φMb) gives 1; half of it gives 0.5.
    const Pb = 698.9532, Mb = 6182.558;
    expect(num('col_pm_ratio', 0.65 * Pb * kip, 0.65 * Mb * kipIn, ...S)).toBeCloseTo(1, 4);
    expect(num('col_pm_ratio', 0.325 * Pb * kip, 0.325 * Mb * kipIn, ...S)).toBeCloseTo(0.5, 4);
    // Pure bending: Mu/φMn0 = 100·12/(0.9·3109.12) (hand above)
    expect(num('col_pm_ratio', 0, 100 * kipFt, ...S)).toBeCloseTo(1200 / (0.9 * 3109.12), 3);
  });

  it('the capacity is the inner envelope: no point of the design curve is judged safe (property)', () => {
    // Where φ falls through its transition faster than Pn grows, φPn dips and the curve folds
    // (e.g. 10 × 10 in, 4 + 2 #8 per face, 8000 psi): the least strength is kept (conservative).
    fc.assert(fc.property(
      fc.double({ min: 10, max: 40, noNaN: true }), fc.double({ min: 10, max: 40, noNaN: true }),
      fc.integer({ min: 2, max: 5 }), fc.integer({ min: 2, max: 5 }), fc.constantFrom('#6', '#8', '#10'),
      fc.constantFrom(4000, 6000, 8000), fc.constantFrom(60, 80),
      (bIn, hIn, nB, nH, bar, fcPsi, fyKsi) => {
        let s;
        try {
          s = sectionOf(fcPsi * psi, fyKsi * ksi, bIn * inch, hIn * inch, nB, nH, bar, 2.5 * inch);
        } catch {
          return; // bars that do not fit are refused (tested below)
        }
        const limits = axialLimits(s);
        // Points of the curve at depths clear of the steps where the block reaches a row
        // (a load line through a step's end only touches the curve there).
        for (let i = 0; i < 24; i++) {
          const p = strainPoint(s, ((i + 0.37) / 24) * 1.6 * s.h);
          if (!(p.phiPn > 0 && p.phiPn < limits.phiPnMax && p.phiMn > 0)) continue;
          const m = momentStrengthAt(s, p.phiPn);
          expect(m.point!.phiPn / p.phiPn).toBeCloseTo(1, 9); // lands on φPn = Pu
          expect(m.phiMn).toBeLessThanOrEqual(p.phiMn * (1 + 1e-9));
          expect(pmRatio(s, p.phiPn, p.phiMn)).toBeGreaterThanOrEqual(1 - 1e-6);
        }
      }), { numRuns: 15 });
  });

  it('SI input gives the same section strength (500 × 500 mm, 8 × 510 mm², 35 MPa, 420 MPa)', () => {
    const si = [35 * MPa, 420 * MPa, 500 * mm, 500 * mm, 3, 3, '#25M', 65 * mm] as const;
    // Po = 0.85·35·(250000 − 4080) + 420·4080 = 7316120 + 1713600 = 9029720 N → φPn,max = 0.52·9029.72 = 4695.45 kN
    expect(num('col_pm_ratio', 4695.45 * kN, 0, ...si)).toBeCloseTo(1, 4);
    // β1 at 35 MPa = 0.85 − 0.05(5076.3 − 4000)/1000 = 0.7962 (Table 22.2.2.4.3); balanced c = 0.003·435/(0.003 + 420/199948) = 255.9 mm
    const p = strainPoint(sectionOf(...si), 255.9 * mm);
    expect(p.phi).toBeCloseTo(0.65, 2);
  });

  it('refuses sections that cannot be built', () => {
    expect(() => call('col_phi_mn', 0, ...S.slice(0, 4), 1, 3, '#8', 2.5 * inch)).toThrow(/n_b must be a whole number of bars from 2/);
    expect(() => call('col_phi_mn', 0, ...S.slice(0, 4), 3, 3, '#8', 11 * inch)).toThrow(/must sit inside the section/);
    expect(() => call('col_phi_mn', 0, 5000 * psi, 120 * ksi, ...S.slice(2))).toThrow(/fy above 100 ksi/);
    expect(() => call('col_phi_mn', 0, 5000 * psi, 90 * ksi, ...S.slice(2), '318-14')).toThrow(/fy above 80 ksi/);
    expect(() => call('col_phi_mn', 0, ...S.slice(0, 6), '#5x', 2.5 * inch)).toThrow(/unknown bar/);
    expect(() => call('col_phi_mn', -2000 * kip, ...S)).toThrow(/tension beyond/);
  });
});
