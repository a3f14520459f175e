import { describe, expect, it } from 'vitest';
import { micrometreLabel, niceStep, ticksBetween } from '../../src/canvas/rulerMath';

describe('grid and ruler steps', () => {
  it.each([
    [0.7, 1],
    [1, 1],
    [1.2, 2],
    [3, 5],
    [7, 10],
    [0.013, 0.02],
    [4e-6, 5e-6],
  ])('nice step for at least %d is %d', (minimum, step) => {
    expect(niceStep(minimum)).toBeCloseTo(step, 15);
  });

  it('lists ticks between two positions', () => {
    expect(ticksBetween(-3, 11, 5)).toEqual([-0, 5, 10]);
    expect(ticksBetween(1, 2, 0)).toEqual([]);
  });

  it.each([
    [120e-6, 10e-6, '120'],
    [1.5e-6, 0.5e-6, '1.5'],
    [0.25e-6, 0.05e-6, '0.25'],
    [-2e-6, 1e-6, '-2'],
  ])('labels %d m at a %d m step as "%s" µm', (position, step, text) => {
    expect(micrometreLabel(position, step)).toBe(text);
  });
});
