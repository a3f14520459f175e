import { describe, expect, it } from 'vitest';
import { groupCentre, mirrorRect, rotateQuarterClockwise } from '../../src/geometry/transform';

describe('rotate and mirror', () => {
  it.each([
    // [rect, centre, expected] — arithmetic; a quarter turn clockwise on a y-down screen.
    [{ x: 10, y: -1, width: 2, height: 2 }, [0, 0], { x: -1, y: 10, width: 2, height: 2 }],
    [{ x: 0, y: 0, width: 4, height: 2 }, [2, 1], { x: 1, y: -1, width: 2, height: 4 }],
    [{ x: -5, y: 0, width: 2, height: 2 }, [0, 0], { x: -2, y: -5, width: 2, height: 2 }],
  ] as const)('turns %j about %j', (rect, [cx, cy], expected) => {
    const t = rotateQuarterClockwise(rect, cx, cy);
    expect(t.x).toBeCloseTo(expected.x, 12);
    expect(t.y).toBeCloseTo(expected.y, 12);
    expect(t.width).toBe(expected.width);
    expect(t.height).toBe(expected.height);
  });

  it('four quarter turns come back', () => {
    let r = { x: 3, y: 7, width: 5, height: 1 };
    for (let i = 0; i < 4; i++) r = rotateQuarterClockwise(r, 1, 2);
    expect(r.x).toBeCloseTo(3, 12);
    expect(r.y).toBeCloseTo(7, 12);
  });

  it('mirrors about the centre line', () => {
    expect(mirrorRect({ x: 1, y: 1, width: 2, height: 3 }, 'leftRight', 5, 0)).toEqual({
      x: 7,
      y: 1,
      width: 2,
      height: 3,
    });
    expect(mirrorRect({ x: 1, y: 1, width: 2, height: 3 }, 'topBottom', 0, 0)).toEqual({
      x: 1,
      y: -4,
      width: 2,
      height: 3,
    });
    expect(groupCentre([])).toBeNull();
    expect(
      groupCentre([
        { x: 0, y: 0, width: 2, height: 2 },
        { x: 4, y: 4, width: 2, height: 2 },
      ]),
    ).toEqual({
      x: 3,
      y: 3,
    });
  });
});
