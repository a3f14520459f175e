/**
 * What the rest of the app may ask of the mounted canvas: whether a gesture is in progress, and to
 * cancel it (Escape). Set by the canvas while it is mounted; null otherwise.
 */
export interface CanvasHandle {
  gestureActive(): boolean;
  cancelGesture(): boolean;
  /** Screen size of the canvas (px), for framing. */
  size(): { width: number; height: number };
}

let active: CanvasHandle | null = null;

export function setActiveCanvas(handle: CanvasHandle | null): void {
  active = handle;
}

export function activeCanvas(): CanvasHandle | null {
  return active;
}
