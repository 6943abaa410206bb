import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { supportFunctions } from '../../runtime/library/group-support';

const TYPES = new Set(['m', 'Pa', 'N', 'N*m', 'N/m', 'N/m^2', 'N/m^3', 'm^2', 'm^4', 'N*m^2', 'rad', '1', 'text', 'bool']);

describe('support group: the contract the engine relies on', () => {
  it('names are unique, lower_snake, and every function has a clause and doc', () => {
    const names = supportFunctions.map((f) => f.name);
    expect(new Set(names).size).toBe(names.length);
    for (const f of supportFunctions) {
      expect(f.name).toMatch(/^[a-z][a-z0-9_]*$/);
      expect(f.clause.length).toBeGreaterThan(10);
      expect(f.doc.length).toBeGreaterThan(10);
    }
  });

  it('every param and result has a known type; text params list their choices; optional fits', () => {
    for (const f of supportFunctions) {
      expect(TYPES.has(f.returns), `${f.name} returns ${f.returns}`).toBe(true);
      expect(f.optional ?? 0).toBeLessThanOrEqual(f.params.length);
      for (const p of f.params) {
        expect(TYPES.has(p.type), `${f.name}(${p.name}: ${p.type})`).toBe(true);
        expect(p.name, `${f.name} param name`).toMatch(/^[A-Za-z][A-Za-z0-9_]*$/);
        if (p.type === 'text') expect(p.choices?.length ?? 0, `${f.name}(${p.name}) choices`).toBeGreaterThan(0);
      }
      const names = f.params.map((p) => p.name);
      expect(new Set(names).size, `${f.name} duplicate param`).toBe(names.length);
    }
  });

  it('covers the support topics: punching, size effect, column, footing, soil', () => {
    const names = new Set(supportFunctions.map((f) => f.name));
    for (const n of ['bo_punch', 'lambda_s', 'vc_punch', 'vc_punch_governs', 'gamma_v', 'po_column', 'phi_pn_max',
      'a_req_footing', 'vc_oneway', 'ld_bottom', 'bn_bearing', 'nq_vesic', 'nc_terzaghi', 'qu_terzaghi', 'q_presumptive']) {
      expect(names.has(n), n).toBe(true);
    }
  });

  it('the support files stay DOM-free and do not reach into cells/', () => {
    const files = ['support-args', 'shear-size-effect', 'punching-perimeter', 'punching-stress', 'punching-drop-panel',
      'punching-moment-transfer', 'column-axial', 'column-slenderness', 'footing-area', 'footing-shear',
      'footing-flexure', 'footing-development', 'footing-bearing', 'footing-dowels', 'column-section',
      'column-interaction', 'column-biaxial', 'column-moment', 'column-position', 'soil-presumptive', 'soil-bearing-terzaghi',
      'soil-bearing-general', 'group-support'];
    for (const f of files) {
      const src = readFileSync(new URL(`../../runtime/library/${f}.ts`, import.meta.url), 'utf8');
      const code = src.replace(/\/\/.*$/gm, '').replace(/'[^'\n]*'|"[^"\n]*"|`[^`]*`/g, "''");
      expect(code, f).not.toMatch(/\b(document|window|localStorage|HTMLElement)\b/);
      expect(src, f).not.toMatch(/from '.*cells\//);
      expect(src.split('\n').length, `${f} under 400 lines`).toBeLessThan(400);
    }
  });
});
