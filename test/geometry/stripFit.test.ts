import { describe, expect, it } from 'vitest';
import { fitDroppedStrip, fitStripAtPoint, stripAlongSide } from '../../src/geometry/stripFit';

const m = { id: 'm', rect: { x: 10, y: 10, width: 40, height: 30 }, bitlineAxis: 'vertical' as const };
const h = { id: 'h', rect: { x: 100, y: 10, width: 40, height: 30 }, bitlineAxis: 'horizontal' as const };

describe('strips fit themselves to mat edges', () => {
  it.each([
    // [type, point, expected side, expected rect] — arithmetic on the mats above; thickness 2, reach 3
    ['senseAmpStrip', { x: 20, y: 9 }, 'top', { x: 10, y: 8, width: 40, height: 2 }],
    ['senseAmpStrip', { x: 20, y: 41 }, 'bottom', { x: 10, y: 40, width: 40, height: 2 }],
    ['wordlineDriverStrip', { x: 11, y: 20 }, 'left', { x: 8, y: 10, width: 2, height: 30 }],
    ['wordlineDriverStrip', { x: 52, y: 39 }, 'right', { x: 50, y: 10, width: 2, height: 30 }],
    ['senseAmpStrip', { x: 141, y: 20 }, 'right', { x: 140, y: 10, width: 2, height: 30 }],
    ['wordlineDriverStrip', { x: 120, y: 8 }, 'top', { x: 100, y: 8, width: 40, height: 2 }],
  ] as const)('%s near %j goes on the %s side', (type, point, side, rect) => {
    const fit = fitStripAtPoint(type, point, [m, h], 2, 3);
    expect(fit?.side).toBe(side);
    expect(fit?.rect).toEqual(rect);
  });

  it('does not fit to the wrong edges, far away, past the ends, or for other block types', () => {
    expect(fitStripAtPoint('senseAmpStrip', { x: 11, y: 25 }, [m], 2, 3)).toBeNull();
    expect(fitStripAtPoint('senseAmpStrip', { x: 20, y: 0 }, [m], 2, 3)).toBeNull();
    expect(fitStripAtPoint('senseAmpStrip', { x: 55, y: 9 }, [m], 2, 3)).toBeNull();
    expect(fitStripAtPoint('rowDecoder', { x: 20, y: 9 }, [m], 2, 3)).toBeNull();
  });

  it('a strip dropped against a suitable edge takes that edge’s length', () => {
    const dropped = { x: 25, y: 8, width: 10, height: 2 };
    expect(fitDroppedStrip('senseAmpStrip', dropped, [m])?.rect).toEqual(stripAlongSide(m.rect, 'top', 2));
    // A driver strip on the top edge of a vertical-bit-line mat serves nothing there.
    expect(fitDroppedStrip('wordlineDriverStrip', dropped, [m])).toBeNull();
    // Not touching.
    expect(fitDroppedStrip('senseAmpStrip', { ...dropped, y: 5 }, [m])).toBeNull();
  });
});
