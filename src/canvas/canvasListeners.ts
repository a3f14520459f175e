/** What the canvas does with each kind of input event. */
export interface CanvasInput {
  readonly pointerDown: (e: PointerEvent) => void;
  readonly pointerMove: (e: PointerEvent) => void;
  readonly pointerUp: (e: PointerEvent) => void;
  readonly pointerCancel: (e: PointerEvent) => void;
  /** Capture lost before the button went up (say the window lost focus mid-drag). */
  readonly captureLost: () => void;
  readonly pointerLeave: () => void;
  readonly wheel: (e: WheelEvent) => void;
  readonly contextMenu: (e: MouseEvent) => void;
  /** Key presses and releases anywhere in the window (Space held turns a drag into a pan). */
  readonly key: (e: KeyboardEvent) => void;
}

/**
 * Connects `input` to the canvas element and the window; returns the function that disconnects it all.
 * The wheel listener is not passive, because a wheel over the canvas zooms it instead of scrolling the page.
 */
export function listenToCanvas(element: HTMLElement, input: CanvasInput): () => void {
  const cleanups: (() => void)[] = [];
  const listen = <K extends keyof HTMLElementEventMap>(
    type: K,
    handler: (e: HTMLElementEventMap[K]) => void,
    options?: AddEventListenerOptions,
  ) => {
    element.addEventListener(type, handler, options);
    cleanups.push(() => element.removeEventListener(type, handler, options));
  };
  listen('pointerdown', input.pointerDown);
  listen('pointermove', input.pointerMove);
  listen('pointerup', input.pointerUp);
  listen('pointercancel', input.pointerCancel);
  listen('lostpointercapture', input.captureLost);
  listen('pointerleave', input.pointerLeave);
  listen('wheel', input.wheel, { passive: false });
  listen('contextmenu', input.contextMenu);
  window.addEventListener('keydown', input.key);
  window.addEventListener('keyup', input.key);
  cleanups.push(() => {
    window.removeEventListener('keydown', input.key);
    window.removeEventListener('keyup', input.key);
  });
  return () => {
    for (const cleanup of cleanups.splice(0)) cleanup();
  };
}
