import type { Viewport } from '../store/appStore';
import { pinchViewport, type ScreenPoint } from './wheelAndPinch';

interface Pinch {
  readonly start: Viewport;
  readonly ids: readonly [number, number];
  readonly from: readonly [ScreenPoint, ScreenPoint];
}

/**
 * Follows the fingers on a touch screen. With one finger the canvas's ordinary gestures run; when a
 * second finger lands, those are cancelled and the two fingers pinch-zoom and pan the camera until one
 * lifts.
 */
export class TouchPinch {
  private readonly fingers = new Map<number, ScreenPoint>();
  private pinch: Pinch | null = null;

  get active(): boolean {
    return this.pinch !== null;
  }

  /** A finger went down at `p` (canvas px); true when this starts a pinch. */
  down(pointerId: number, p: ScreenPoint, viewport: Viewport): boolean {
    this.fingers.set(pointerId, p);
    if (this.pinch || this.fingers.size !== 2) return false;
    const [a, b] = [...this.fingers.entries()];
    if (!a || !b) return false;
    this.pinch = { start: viewport, ids: [a[0], b[0]], from: [a[1], b[1]] };
    return true;
  }

  /** A finger moved; the camera the pinch asks for, or null when no pinch runs. */
  move(pointerId: number, p: ScreenPoint): Viewport | null {
    if (!this.fingers.has(pointerId)) return null;
    this.fingers.set(pointerId, p);
    const pinch = this.pinch;
    if (!pinch) return null;
    const a = this.fingers.get(pinch.ids[0]);
    const b = this.fingers.get(pinch.ids[1]);
    if (!a || !b) return null;
    return pinchViewport(pinch.start, pinch.from[0], pinch.from[1], a, b);
  }

  /** A finger lifted or was cancelled; true when that ended a pinch. */
  up(pointerId: number): boolean {
    this.fingers.delete(pointerId);
    const pinch = this.pinch;
    if (!pinch || !pinch.ids.includes(pointerId)) return false;
    this.pinch = null;
    return true;
  }
}
