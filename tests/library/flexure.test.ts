import { describe, expect, it } from 'vitest';
import fc_ from 'fast-check';
import { g, gn, expectLibError, expectRel } from './gravity-call';
import { inch, kip, ksi, mm, MPa, psi, lbf, kNm } from '../../runtime/units/si';

const in2 = inch * inch;
const lbIn = lbf * inch;
const fc = 4000 * psi;
const fy = 60 * ksi;

// Worked by hand (US): 12 in strip of an 8 in slab, d = 6.5 in, f'c = 4000 psi, fy = 60 ksi, Mu = 8 kip·ft.
// ACI 318-19 §22.2.2.4 stress block (0.85f'c over a = β1c, εcu = 0.003 by §22.2.2.1), φ = 0.90:
//   Rn = 96,000/(0.9·12·6.5²) = 210.39 psi
//   ρ = (0.85·4000/60,000)(1 − √(1 − 2·210.39/3400)) = 0.056667·(1 − 0.93608) = 0.0036222
//   As = 0.0036222·12·6.5 = 0.28253 in²
//   a = 0.28253·60,000/(0.85·4000·12) = 0.41549 in; c = a/0.85 = 0.48881 in; εt = 0.003(6.5 − 0.48881)/0.48881 = 0.03689
describe('Whitney block, US input', () => {
  it('As required for Mu', () => {
    expect(gn('as_required', 96000 * lbIn, 12 * inch, 6.5 * inch, fc, fy) / in2).toBeCloseTo(0.28253, 5);
  });

  it('εt, tension-controlled, and φMn of that steel gives Mu back', () => {
    const As = 0.28253 * in2;
    expect(gn('eps_t', As, 12 * inch, 6.5 * inch, fc, fy)).toBeCloseTo(0.03689, 4);
    expect(g('tension_controlled', As, 12 * inch, 6.5 * inch, fc, fy)).toBe(true);
    expectRel(gn('phi_mn', As, 12 * inch, 6.5 * inch, fc, fy) / lbIn, 96000, 2e-5);
  });

  it('φMn of #5 at 12 in (per foot)', () => {
    // by hand: a = 0.31·60/(0.85·4·12) = 0.45588 in; φMn = 0.9·0.31·60·(6.5 − 0.22794) = 104.99 kip·in = 8.7495 kip·ft/ft
    // (per unit width, kip·ft/ft has the dimension of kip)
    expect(gn('phi_mn_bars', '#5', 12 * inch, 6.5 * inch, fc, fy) / kip).toBeCloseTo(8.7495, 4);
    expect(gn('as_provided', '#5', 12 * inch) / (in2 / inch)).toBeCloseTo(0.31 / 12, 9);
  });

  it('minimum steel governs a lightly loaded strip', () => {
    // Mu = 2 kip·ft → As ≈ 0.069 in² < As,min = 0.0018·12·8 = 0.1728 in² (ACI 318-19 Table 7.6.1.1, from memory)
    expect(gn('as_slab', 24000 * lbIn, 12 * inch, 6.5 * inch, 8 * inch, fc, fy) / in2).toBeCloseTo(0.1728, 9);
    expect(gn('as_slab', 96000 * lbIn, 12 * inch, 6.5 * inch, 8 * inch, fc, fy) / in2).toBeCloseTo(0.28253, 5);
  });
});

describe('over-reinforced section: strain compatibility, φ = 0.65', () => {
  it('b = 12 in, d = 10 in, As = 6 in²', () => {
    // by hand, §22.2 with elastic steel: 34,680c² + 522,000c − 5,220,000 = 0 → c = 6.8671 in
    // fs = 29e6·0.003(10 − 6.8671)/6.8671 = 39,692 psi < fy; a = 5.8370 in; equilibrium 0.85f'c·a·b = As·fs = 238.15 kip
    // φMn = 0.65·6·39,692·(10 − 2.9185) = 1,096,197 lb·in = 91.35 kip·ft (Table 21.2.2 compression-controlled)
    const As = 6 * in2;
    expect(gn('eps_t', As, 12 * inch, 10 * inch, fc, fy)).toBeLessThan(60 / 29000);
    expect(gn('phi_mn', As, 12 * inch, 10 * inch, fc, fy) / (kip * 12 * inch)).toBeCloseTo(91.35, 2);
    expect(g('tension_controlled', As, 12 * inch, 10 * inch, fc, fy)).toBe(false);
  });
});

describe('fy capped where the code caps it (ACI 318-19 Table 20.2.2.4(a), from memory)', () => {
  it('flexure takes fy ≤ 100 ksi in 318-19, ≤ 80 ksi in 318-14; shear reinforcement ≤ 60 ksi', () => {
    expect(gn('fy_design', 120000 * psi) / psi).toBeCloseTo(100000, 6);
    expect(gn('fy_design', 120000 * psi, 'flexure', '318-14') / psi).toBeCloseTo(80000, 6);
    expect(gn('fy_design', 80000 * psi, 'shear') / psi).toBeCloseTo(60000, 6);
    expect(gn('fy_design', 60000 * psi) / psi).toBeCloseTo(60000, 6);
  });

  it('φMn of As = 1 in², b = 12 in, d = 10 in, 5000 psi with 120 ksi bars is that of 100 ksi bars', () => {
    // fy = 100 ksi: a = 1·100,000/(0.85·5000·12) = 1.961 in; c = a/0.80 = 2.451 in (β1, Table 22.2.2.4.3);
    // εt = 0.003(10 − 2.451)/2.451 = 0.00924 ≥ εty + 0.003 = 0.00645 → φ = 0.90 (Table 21.2.2);
    // φMn = 0.9·1·100,000·(10 − 0.980) = 811,765 lb·in.
    const a = 100000 / (0.85 * 5000 * 12);
    const expected = 0.9 * 100000 * (10 - a / 2);
    expect(gn('phi_mn', 1 * in2, 12 * inch, 10 * inch, 5000 * psi, 120000 * psi) / (lbf * inch)).toBeCloseTo(expected, 3);
    expect(gn('phi_mn', 1 * in2, 12 * inch, 10 * inch, 5000 * psi, 100000 * psi) / (lbf * inch)).toBeCloseTo(expected, 3);
    // 318-14 caps at 80 ksi: a = 1.569 in, φMn = 0.9·80,000·(10 − 0.784) = 663,529 lb·in (εt = 0.0123 ≥ 0.005).
    const a14 = 80000 / (0.85 * 5000 * 12);
    expect(gn('phi_mn', 1 * in2, 12 * inch, 10 * inch, 5000 * psi, 120000 * psi, '318-14') / (lbf * inch)).toBeCloseTo(0.9 * 80000 * (10 - a14 / 2), 3);
    // as_required: the inverse on the capped fy.
    expect(gn('as_required', expected * lbf * inch, 12 * inch, 10 * inch, 5000 * psi, 120000 * psi) / in2).toBeCloseTo(1, 6);
  });
});

describe('SI input', () => {
  it('1 m strip, d = 160 mm, f\'c = 30 MPa, fy = 420 MPa, Mu = 40 kN·m', () => {
    // by hand: Rn = 40e6/(0.9·1000·160²) = 1.7361 MPa; ρ = (25.5/420)(1 − √(1 − 2·1.7361/25.5))
    //   = 0.060714·(1 − √0.863834) = 0.060714·(1 − 0.929427) = 0.0042848; As = 0.0042848·1000·160 = 685.6 mm²/m
    expect(gn('as_required', 40 * kNm, 1, 160 * mm, 30 * MPa, 420 * MPa) / (mm * mm)).toBeCloseTo(685.6, 1);
  });

  it('US and SI give the same section strength for the same physical section', () => {
    // 8 in = 203.2 mm etc.: COMPUTED consistency of the unit conversions
    const us = gn('phi_mn', 0.31 * in2, 12 * inch, 6.5 * inch, 4000 * psi, 60000 * psi);
    const si = gn('phi_mn', 200.0 * mm * mm, 304.8 * mm, 165.1 * mm, 27.579 * MPa, 413.69 * MPa);
    expectRel(si, us, 0.006); // 0.31 in² = 200.0 mm² within 0.03 %; the rest is rounding of the SI inputs
  });

  it('as_required inverts phi_mn over tension-controlled sections (property, 100 runs)', () => {
    // COMPUTED: §22.2.2.4 closed form vs. equilibrium of the same block, φ = 0.90
    fc_.assert(
      fc_.property(
        fc_.double({ min: 0.1, max: 0.8, noNaN: true }), // share of the tension-controlled capacity
        fc_.double({ min: 0.1, max: 0.6, noNaN: true }), // d
        fc_.constantFrom(21, 28, 35, 50),
        (share, d, f) => {
          const b = 1;
          const cap = gn('phi_mn', gn('as_max_tc', b, d, f * MPa, 420 * MPa), b, d, f * MPa, 420 * MPa);
          const Mu = share * cap;
          const As = gn('as_required', Mu, b, d, f * MPa, 420 * MPa);
          return Math.abs(gn('phi_mn', As, b, d, f * MPa, 420 * MPa) / Mu - 1) < 1e-9;
        },
      ),
      { numRuns: 100 },
    );
  });
});

describe('bar spacing for a required area (rounded down, common practice)', () => {
  it('US bars: 0.5 in steps, capped by s_max', () => {
    // #4: 0.20/0.28·12 = 8.57 in → 8.5 in; #5: 0.31/0.28·12 = 13.29 → 13.0 in; s_max 12 in caps it
    const req = (0.28 * in2) / (12 * inch);
    expect(gn('bar_spacing', req, '#4', 16 * inch) / inch).toBeCloseTo(8.5, 9);
    expect(gn('bar_spacing', req, '#5', 16 * inch) / inch).toBeCloseTo(13, 9);
    expect(gn('bar_spacing', req, '#5', 12 * inch) / inch).toBeCloseTo(12, 9);
  });

  it('metric bars: 25 mm steps', () => {
    // D12: 113.1/600·1000 = 188.5 mm → 175 mm; #16M: 199/600·1000 = 331.7 → 325 mm, capped at 300 mm
    expect(gn('bar_spacing', 600 * mm * mm / 1, 'D12', 400 * mm) / mm).toBeCloseTo(175, 9);
    expect(gn('bar_spacing', 600 * mm * mm / 1, '#16M', 300 * mm) / mm).toBeCloseTo(300, 9);
  });

  it('the spacing chosen always provides the area required', () => {
    // COMPUTED: area/s ≥ As_req after rounding down
    for (const req of [150, 333, 600, 1000, 1500]) {
      const s = gn('bar_spacing', req * mm * mm, 'D16', 450 * mm);
      expect(gn('as_provided', 'D16', s)).toBeGreaterThanOrEqual(req * mm * mm);
    }
  });
});

describe('bad arguments', () => {
  it('refuses an overloaded section, h < d, a bar too small, unknown bar', () => {
    expectLibError(() => g('as_required', 2000 * kNm, 1, 0.15, 30 * MPa, 420 * MPa), /deepen the section/);
    expectLibError(() => g('as_slab', 10 * kNm, 1, 0.2, 0.15, 30 * MPa, 420 * MPa), /h must not be less than d/);
    expectLibError(() => g('bar_spacing', 5000 * mm * mm, 'D10', 0.3), /use a larger bar/);
    expectLibError(() => g('bar_spacing', 500 * mm * mm, 'D11', 0.3), /unknown bar "D11"/);
    expectLibError(() => g('phi_mn', -1, 1, 0.15, 30 * MPa, 420 * MPa), /As must be positive/);
  });
});
