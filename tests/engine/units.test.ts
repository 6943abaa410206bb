import { describe, expect, it } from 'vitest';
import { unitInfo, describeDims } from '../../runtime/units/dimension';
import * as si from '../../runtime/units/si';

// Exact definitions: NIST SP 811 (2008) Appendix B: 1 in = 0.0254 m exactly,
// 1 lbf = 4.4482216152605 N exactly; kip = 1000 lbf (common practice).
describe('trade units', () => {
  const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
  it('kip is exactly 1000 lbf (mathjs own kip is not)', () => {
    expect(rel(unitInfo('kip').factor, 1000 * 4.4482216152605)).toBeLessThan(1e-12);
    expect(rel(unitInfo('kips').factor, unitInfo('kip').factor)).toBeLessThan(1e-15);
  });
  it.each([
    ['ksi', si.ksi], ['psf', si.psf], ['ksf', si.ksf], ['pcf', si.pcf], ['plf', si.plf], ['klf', si.klf],
    ['kip*ft', si.kipFt], ['kipft', si.kipFt], ['kN', 1000], ['MPa', 1e6], ['kPa', 1000], ['kN/m^2', 1000], ['kN/m^3', 1000],
    ['in', 0.0254], ['ft', 0.3048], ['psi', si.psi],
  ])('%s has the SI factor of its definition', (unit, factor) => {
    // mathjs defines psi from its own lbf to ~1e-10; anything looser would be a wrong definition.
    expect(rel(unitInfo(unit).factor, factor)).toBeLessThan(1e-9);
  });
  it('names dimensions an engineer recognises', () => {
    expect(describeDims(unitInfo('kip*ft').dims)).toBe('moment');
    expect(describeDims(unitInfo('psf').dims)).toBe('stress or pressure');
    expect(describeDims(unitInfo('pcf').dims)).toBe('unit weight');
    expect(describeDims(unitInfo('klf').dims)).toBe('force per length');
  });
  it('refuses offset temperature units and junk', () => {
    expect(() => unitInfo('degC')).toThrow(/not a unit/);
    expect(() => unitInfo('foo')).toThrow(/not a unit/);
    expect(() => unitInfo('2 in')).toThrow(/not a unit/);
  });
});
