import { describe, expect, it } from 'vitest';
import {
  buildSnapTargets,
  nearestTarget,
  snapMove,
  snapPoint,
  snapToPitch,
} from '../../src/geometry/snapping';

const um = 1e-6;

describe('snapping', () => {
  it.each([
    // [targets, value, threshold, expected] — arithmetic
    [[0, 10, 20], 10.4, 1, 10],
    [[0, 10, 20], 14.9, 1, null],
    [[0, 10, 20], 19.5, 1, 20],
    [[0, 10, 20], -0.5, 1, 0],
    [[0, 10, 20], 25, 10, 20],
    [[], 3, 10, null],
  ])('nearest of %j to %d within %d is %s', (targets, value, threshold, expected) => {
    expect(nearestTarget(Float64Array.from(targets), value, threshold)).toBe(expected);
  });

  it.each([
    [0.7, 0.5, 0.5],
    [0.74, 0.5, 0.5],
    [0.76, 0.5, 1],
    [-0.3, 0.5, -0.5],
    [0.3, 0, 0.3],
  ])('a move of %d at pitch %d rounds to %d', (delta, pitch, expected) => {
    expect(snapToPitch(delta, pitch)).toBeCloseTo(expected, 12);
  });

  const neighbour = { x: 100 * um, y: 0, width: 50 * um, height: 40 * um };
  const targets = buildSnapTargets([neighbour]);
  const moving = { x: 0, y: 0, width: 30 * um, height: 40 * um };
  const pitch = { x: 0.036 * um, y: 0.036 * um };

  it('abuts: a right edge that comes within the threshold of a neighbour’s left edge snaps onto it', () => {
    const s = snapMove(moving, 69 * um, 0.5 * um, pitch, targets, 2 * um);
    expect(s.dx).toBeCloseTo(70 * um, 15);
    expect(s.guideX).toBeCloseTo(100 * um, 15);
    // y lines up top with top (0.5 µm is within 2 µm of 0).
    expect(s.dy).toBe(0);
    expect(s.guideY).toBe(0);
  });

  it('aligns centres when no side is near', () => {
    // centre of the moving rect at 15 µm + dx; neighbour centre at 125 µm.
    const s = snapMove(moving, 109.5 * um, 300 * um, pitch, targets, 1 * um);
    expect(s.dx).toBeCloseTo(110 * um, 15);
    expect(s.guideX).toBeCloseTo(125 * um, 15);
    expect(s.guideY).toBeNull();
    expect(s.dy / pitch.y).toBeCloseTo(Math.round(300 / 0.036), 6);
  });

  it('far from every edge, moves go in whole pitches', () => {
    const s = snapMove(moving, 1.01 * um, -3.3 * um, pitch, buildSnapTargets([]), 1 * um);
    expect(s.dx / pitch.x).toBeCloseTo(28, 9);
    expect(s.dy / pitch.y).toBeCloseTo(-92, 9);
    expect(s.guideX).toBeNull();
  });

  it('snaps a point to edges, else to the pitch grid', () => {
    const p = snapPoint({ x: 150.4 * um, y: 7.01 * um }, pitch, targets, 1 * um);
    expect(p.x).toBeCloseTo(150 * um, 15);
    expect(p.guideX).toBeCloseTo(150 * um, 15);
    expect(p.y / pitch.y).toBeCloseTo(195, 9);
    expect(p.guideY).toBeNull();
  });
});
