import { describe, expect, it } from 'vitest';
import { fitViewport, screenToWorld, worldToScreen, zoomAround } from '../../src/canvas/viewportMath';

describe('canvas camera math', () => {
  it('zooming keeps the world point under the cursor fixed', () => {
    const v = { scale: 2, offsetX: 30, offsetY: -10 };
    const before = screenToWorld(v, 400, 250);
    const zoomed = zoomAround(v, 1.7, 400, 250);
    const after = screenToWorld(zoomed, 400, 250);
    expect(after.x).toBeCloseTo(before.x, 15);
    expect(after.y).toBeCloseTo(before.y, 15);
  });

  it('fit centres the box inside the margin', () => {
    const box = { x: 10e-6, y: 20e-6, width: 100e-6, height: 50e-6 };
    const v = fitViewport(box, 800, 600, 20);
    const tl = worldToScreen(v, box.x, box.y);
    const br = worldToScreen(v, box.x + box.width, box.y + box.height);
    expect(tl.x).toBeCloseTo(20, 9);
    expect(br.x).toBeCloseTo(780, 9);
    expect((tl.y + br.y) / 2).toBeCloseTo(300, 9);
  });
});
