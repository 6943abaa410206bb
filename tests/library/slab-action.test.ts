import { describe, expect, it } from 'vitest';
import { g, expectLibError } from './gravity-call';
import { ft } from '../../runtime/units/si';

// Classification: ℓlong/ℓshort > 2 → one-way (textbook convention, from memory);
// the 2.0 limit is the DDM ratio of ACI 318-19 §8.10.2.3.
describe('one-way or two-way by proportions (US input)', () => {
  it('30 ft × 12 ft on four sides: ratio 2.5 → one-way', () => {
    expect(g('slab_action', 30 * ft, 12 * ft, 'four-sides')).toBe('one-way');
    expect(g('slab_action_reason', 30 * ft, 12 * ft, 'four-sides')).toBe(
      'supported on four sides, ℓlong/ℓshort = 2.50 > 2: one-way, spanning the short direction',
    );
  });

  it('20 ft × 15 ft on columns: ratio 1.33 → two-way; order of spans does not matter', () => {
    expect(g('slab_action', 20 * ft, 15 * ft, 'columns')).toBe('two-way');
    expect(g('slab_action', 15 * ft, 20 * ft, 'columns')).toBe('two-way');
    expect(g('slab_action_reason', 15 * ft, 20 * ft, 'columns')).toBe('supported on columns, ℓlong/ℓshort = 1.33 ≤ 2: two-way');
  });

  it('exactly 2 is still two-way (ratio ≤ 2)', () => {
    expect(g('slab_action', 24 * ft, 12 * ft, 'four-sides')).toBe('two-way');
  });
});

describe('supports decide before proportions', () => {
  it('two opposite sides or one side: one-way even for a square panel (SI input)', () => {
    // common practice: with no support on the other pair of edges the load can only span one way
    expect(g('slab_action', 5, 5, 'two-opposite-sides')).toBe('one-way');
    expect(g('slab_action_reason', 5, 5, 'two-opposite-sides')).toMatch(/two opposite sides only/);
    expect(g('slab_action', 1.5, 6, 'one-side')).toBe('one-way');
    expect(g('slab_action', 7.5, 3, 'four-sides')).toBe('one-way');
  });
});

describe('bad arguments', () => {
  it('refuses a zero span and unknown supports', () => {
    expectLibError(() => g('slab_action', 0, 5, 'four-sides'), /l_a must be positive/);
    expectLibError(() => g('slab_action', 5, 5, 'three-sides'), /unknown supports "three-sides"/);
  });
});
