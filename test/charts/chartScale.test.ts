import { describe, expect, it } from 'vitest';
import { axisScale, axisTicks, extentScale, grownExtent } from '../../src/charts/chartScale';
import { nearestIndex } from '../../src/charts/nearestPoint';

describe('chart scales', () => {
  it('goes logarithmic for positive values spanning more than 30×, without rounding out to decades', () => {
    const axis = axisScale([0.0016e-12, 0.14e-12, Number.NaN], 0, 600);
    expect(axis.log).toBe(true);
    const [lo, hi] = axis.scale.domain() as [number, number];
    expect(lo).toBeGreaterThan(0.001e-12);
    expect(hi).toBeLessThan(0.2e-12);
    expect(axis.scale(0.0016e-12)).toBeGreaterThan(0);
    expect(
      axisTicks(axis, 6).every((t) =>
        [1, 2, 5].some((m) => Math.abs(t / 10 ** Math.floor(Math.log10(t) + 1e-9) - m) < 1e-6),
      ),
    ).toBe(true);
  });

  it('stays linear when values cross zero, with nice padded ends', () => {
    const axis = axisScale([-0.3, 0.25], 400, 0);
    expect(axis.log).toBe(false);
    const [lo, hi] = axis.scale.domain() as [number, number];
    expect(lo).toBeLessThanOrEqual(-0.3);
    expect(hi).toBeGreaterThanOrEqual(0.25);
    expect(axis.scale(lo)).toBe(400);
  });

  it('copes with no finite values', () => {
    expect(axisScale([Number.NaN], 0, 10).scale.domain()).toEqual([0, 1]);
  });
});

describe('growing axis extent', () => {
  it('keeps the shown extent while the points fit, grows past them when they do not, and fits them when none is shown', () => {
    const first = grownExtent(null, 1, 2);
    expect(first.min).toBeLessThan(1);
    expect(first.max).toBeGreaterThan(2);
    expect(first.log).toBe(false);
    expect(grownExtent(first, 1.1, 2.05)).toBe(first);
    const wider = grownExtent(first, 1, 5);
    expect(wider.max).toBeGreaterThan(5);
    expect(wider.min).toBe(first.min);
    // Past a factor of 30 the axis turns logarithmic, and grows by decades.
    const log = grownExtent(wider, 1e-3, 5);
    expect(log.log).toBe(true);
    expect(log.min).toBeLessThan(1e-3);
    expect(log.min).toBeGreaterThan(0);
    expect(grownExtent(log, 2e-3, 4)).toBe(log);
  });

  it('gives the same scale from an extent as from the values', () => {
    const values = [3e-15, 8e-14, 1.2e-13, Number.NaN];
    expect(extentScale(3e-15, 1.2e-13, 0, 400).scale.domain()).toEqual(
      axisScale(values, 0, 400).scale.domain(),
    );
    expect(extentScale(0.01, 0.2, 400, 0).scale.domain()).toEqual(
      axisScale([0.2, 0.01], 400, 0).scale.domain(),
    );
  });
});

describe('nearest point', () => {
  it('finds the closest point within the radius, else nothing (brute force)', () => {
    const points: [number, number][] = [];
    for (let i = 0; i < 400; i++) points.push([(i * 37) % 113, (i * 91) % 97]);
    const index = nearestIndex(
      points.length,
      points.map((p) => p[0]),
      points.map((p) => p[1]),
      14,
    );
    for (let x = -20; x < 130; x += 7) {
      for (let y = -20; y < 120; y += 7) {
        let best: number | null = null;
        let bestD = 14;
        points.forEach((p, i) => {
          const d = Math.hypot(p[0] - x, p[1] - y);
          if (d < bestD) {
            bestD = d;
            best = i;
          }
        });
        const found = index.find(x, y);
        if (best === null) expect(found).toBeNull();
        else
          expect(
            Math.hypot((points[found ?? -1]?.[0] ?? NaN) - x, (points[found ?? -1]?.[1] ?? NaN) - y),
          ).toBe(bestD);
      }
    }
  });
});
