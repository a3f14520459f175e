import { describe, expect, it } from 'vitest';
import { TouchPinch } from '../../src/canvas/touchPinch';
import { screenToWorld } from '../../src/canvas/viewportMath';
import { applyWheel, pinchViewport, wheelIntent } from '../../src/canvas/wheelAndPinch';

const plain = { deltaX: 0, deltaY: 0, deltaMode: 0, ctrlKey: false, metaKey: false, shiftKey: false };
const camera = { scale: 2, offsetX: 100, offsetY: 50 };

describe('wheel intent', () => {
  it('pans with a two-finger trackpad scroll (small or fractional steps, or any sideways part)', () => {
    expect(wheelIntent({ ...plain, deltaX: 3, deltaY: 12 })).toEqual({ kind: 'pan', dx: -3, dy: -12 });
    expect(wheelIntent({ ...plain, deltaY: 7.5 })).toEqual({ kind: 'pan', dx: -0, dy: -7.5 });
    expect(wheelIntent({ ...plain, deltaX: 20, deltaY: 100 }).kind).toBe('pan');
  });

  it('zooms with a pinch (Ctrl+wheel): fingers apart (negative delta) zooms in', () => {
    const pinchOut = wheelIntent({ ...plain, deltaY: -4.2, ctrlKey: true });
    expect(pinchOut.kind).toBe('zoom');
    if (pinchOut.kind === 'zoom') expect(pinchOut.factor).toBeCloseTo(Math.exp(0.042), 12);
    const big = wheelIntent({ ...plain, deltaY: 1000, ctrlKey: true });
    if (big.kind === 'zoom') expect(big.factor).toBeCloseTo(Math.exp(-0.5), 12);
  });

  it('zooms with a notched mouse wheel, in pixels, lines or pages', () => {
    const notch = wheelIntent({ ...plain, deltaY: -100 });
    expect(notch.kind).toBe('zoom');
    if (notch.kind === 'zoom') expect(notch.factor).toBeCloseTo(Math.exp(0.15), 12);
    expect(wheelIntent({ ...plain, deltaY: 3, deltaMode: 1 }).kind).toBe('zoom');
  });

  it('pans sideways with Shift', () => {
    expect(wheelIntent({ ...plain, deltaY: 100, shiftKey: true })).toEqual({ kind: 'pan', dx: -100, dy: 0 });
  });

  it('keeps the world point under the pointer when zooming, and moves the camera by the pan', () => {
    const zoomed = applyWheel(camera, { kind: 'zoom', factor: 1.7 }, 300, 200);
    const before = screenToWorld(camera, 300, 200);
    const after = screenToWorld(zoomed, 300, 200);
    expect(after.x).toBeCloseTo(before.x, 15);
    expect(after.y).toBeCloseTo(before.y, 15);
    expect(applyWheel(camera, { kind: 'pan', dx: -5, dy: 8 }, 0, 0)).toEqual({
      scale: 2,
      offsetX: 95,
      offsetY: 58,
    });
  });
});

describe('touch pinch', () => {
  it('spreading the fingers to twice their distance doubles the zoom around their midpoint', () => {
    const v = pinchViewport(
      camera,
      { x: 200, y: 200 },
      { x: 300, y: 200 },
      { x: 150, y: 200 },
      { x: 350, y: 200 },
    );
    expect(v.scale).toBeCloseTo(4, 12);
    const mid = screenToWorld(camera, 250, 200);
    const still = screenToWorld(v, 250, 200);
    expect(still.x).toBeCloseTo(mid.x, 15);
    expect(still.y).toBeCloseTo(mid.y, 15);
  });

  it('moving both fingers together pans by their movement', () => {
    const v = pinchViewport(camera, { x: 0, y: 0 }, { x: 10, y: 0 }, { x: 30, y: 40 }, { x: 40, y: 40 });
    expect(v).toEqual({ scale: 2, offsetX: 130, offsetY: 90 });
  });

  it('a second finger starts a pinch, moves follow it, and lifting a finger ends it', () => {
    const touch = new TouchPinch();
    expect(touch.down(1, { x: 100, y: 100 }, camera)).toBe(false);
    expect(touch.move(1, { x: 101, y: 100 })).toBeNull();
    expect(touch.down(2, { x: 201, y: 100 }, camera)).toBe(true);
    expect(touch.active).toBe(true);
    const v = touch.move(2, { x: 301, y: 100 });
    expect(v?.scale).toBeCloseTo(4, 12);
    expect(touch.up(1)).toBe(true);
    expect(touch.active).toBe(false);
    expect(touch.move(2, { x: 310, y: 100 })).toBeNull();
  });
});
