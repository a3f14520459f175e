import { describe, expect, it } from 'vitest';
import { deltaLine, percentChange, verdictOf } from '../../src/panels/variants/comparison';

describe('variants comparison text', () => {
  it('changes are plain percentages, never scientific notation (arithmetic)', () => {
    expect(percentChange(112.34, 100)).toBe('+12.3 %');
    expect(percentChange(99.6, 100)).toBe('−0.4 %');
    expect(percentChange(13.5, 1)).toBe('+1,250 %');
    expect(percentChange(1e6, 1e-6)).toBe('+99,999,999,999,900 %');
    expect(percentChange(1 + 1e-12, 1)).toBe('±0.0 %');
    expect(percentChange(5, 0)).toBe('');
    for (const [a, b] of [
      [1e-30, 3e-30],
      [7e20, 1e-3],
    ] as const) {
      expect(percentChange(a, b)).not.toMatch(/e[+-]?\d/);
    }
  });

  it('better or worse is said with an arrow and a word, not only a colour', () => {
    expect(verdictOf('lower', 90, 100, true)).toBe('better');
    expect(verdictOf('higher', 90, 100, true)).toBe('worse');
    expect(deltaLine(90, 100, 'better')).toBe('↓ −10.0 % · better');
    expect(deltaLine(120, 100, 'worse')).toBe('↑ +20.0 % · worse');
  });

  it('an empty variant (no usable bits) is neither better nor worse', () => {
    expect(verdictOf('lower', 0, 100, false)).toBe('none');
    expect(deltaLine(0, 100, 'none')).toBe('');
  });
});
