// Groundwater and an eccentric load in the bearing capacity of the templates, and IBC's least
// presumptive value. Das, Principles of Foundation Engineering (water-table cases; Meyerhof's
// effective width B' = B − 2e): section numbers from memory. Hand calculations in lb, ft, psf, pcf.

import { describe, expect, it } from 'vitest';
import { near, runTemplate } from './helpers';

const gw = 62.428; // pcf, ρw g (common practice)
// Terzaghi factors at φ = 30°: Nc = 37.162, Nq = 22.456 (closed forms, Terzaghi 1943), Nγ = 19.13 (Das Table 3.1).
const Nc = 37.162, Nq = 22.456, Ng = 19.13;

describe('load-path.lt: water above the footing base and a 12 in eccentricity', () => {
  it("submerged weight in q and in the γ term, B' = 12 ft, and the area check on B' × B fails", async () => {
    const run = await runTemplate('load-path.lt', { Dw: '2 ft', e_f: '12 in' });
    try {
      // γ' = 130 − 62.43 = 67.57 pcf; q = 120·2 + 67.57·(4.5 − 2) = 408.9 psf; γ term on γ' (water above the base).
      const sub = 130 - gw;
      const q = 120 * 2 + sub * 2.5;
      near(run.num('q_over'), q, 1e-4);
      near(run.num('gamma_b'), sub, 1e-4);
      near(run.num('B_eff'), 12);
      // Effective rectangle 12 × 14 ft, Terzaghi's lower factors (c = 0): qu = q Nq + 0.4 γ' B' Nγ
      // = 408.9·22.456 + 0.4·67.57·12·19.13 = 9183 + 6205 = 15,388 psf.
      near(run.num('qu_soil'), (q * Nq + 0.4 * sub * 12 * Ng) / 1000, 1e-3);
      // A_req = 182.5 ft² (load-path.test.ts) on B' × B = 168 ft²: 1.086 > 1 (ACI 318-19 §13.3.1.1).
      expect(run.state('area_ok').status).toBe('fail');
      near(run.ratio('area_ok'), run.num('A_req') / 168);
    } finally {
      run.dispose();
    }
  });

  it('an allowable pressure below 1500 psf says a soils investigation may be required (IBC 2021 §1806.2)', async () => {
    const run = await runTemplate('load-path.lt', { q_allow: '1200 psf' });
    try {
      expect(run.val('soil_note')).toMatch(/^Below 1500 psf/);
    } finally {
      run.dispose();
    }
  });
});

describe('bearing-capacity.lt: water table 1 ft below the base, e = 1 ft', () => {
  it("γ̄ = γ' + (Dw − Df)/B·(γ − γ'), B' = 6 ft, Terzaghi on the effective rectangle", async () => {
    const run = await runTemplate('bearing-capacity.lt', { Dw: '5 ft', e: '1 ft' });
    try {
      // γ' = 125 − 62.43 = 62.57 pcf; γ̄ = 62.57 + (5 − 4)/8·(118 − 62.57) = 69.50 pcf; q = 118·4 = 472 psf.
      const sub = 125 - gw;
      const gBar = sub + (1 / 8) * (118 - sub);
      near(run.num('q'), 472);
      near(run.num('gamma_b'), gBar, 1e-4);
      near(run.num('B_eff'), 6);
      // qu = c Nc + q Nq + 0.4 γ̄ B' Nγ = 250·37.16 + 472·22.456 + 0.4·69.50·6·19.13 = 23,081 psf.
      near(run.num('qu_T'), (250 * Nc + 472 * Nq + 0.4 * gBar * 6 * Ng) / 1000, 1e-3);
      // Gross pressure on the effective area: 150,000/(6·8) + 2·150 + 2·118 = 3661 psf.
      near(run.num('q_applied'), 150000 / 48 + 300 + 236);
    } finally {
      run.dispose();
    }
  });
});
