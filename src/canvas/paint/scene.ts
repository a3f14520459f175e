import type { Severity } from '../../engine';
import type { PlacedDesign } from '../../geometry/placedIndex';
import type { Rect } from '../../geometry/rect';
import type { Design } from '../../model/design';
import type { Viewport } from '../../store/appStore';
import { MICROMETRES_PER_METRE } from '../viewportMath';

/** What the painters need for one frame. Painters only read it. */
export interface Scene {
  readonly design: Design;
  readonly placed: PlacedDesign;
  readonly viewport: Viewport;
  /** Canvas size (px). */
  readonly width: number;
  readonly height: number;
  /** Worst finding severity per block id, from the report shown (live during a gesture). */
  readonly markers: ReadonlyMap<string, Severity>;
  /** Blocks drawn faintly because a gesture is moving them. */
  readonly hidden: ReadonlySet<string>;
  readonly gridVisible: boolean;
}

/** Width of the rulers along the top and left edges (px). */
export const RULER_SIZE = 20;

/** Screen mapping of the viewport: px = metres × pxPerMetre + offset. */
export function pxPerMetre(viewport: Viewport): number {
  return viewport.scale * MICROMETRES_PER_METRE;
}

/** A world rectangle (m) on screen (px). */
export function toScreen(viewport: Viewport, r: Rect): Rect {
  const k = pxPerMetre(viewport);
  return {
    x: r.x * k + viewport.offsetX,
    y: r.y * k + viewport.offsetY,
    width: r.width * k,
    height: r.height * k,
  };
}

/** The part of the floorplan (m) the canvas shows. */
export function visibleWorld(viewport: Viewport, width: number, height: number): Rect {
  const k = pxPerMetre(viewport);
  return { x: -viewport.offsetX / k, y: -viewport.offsetY / k, width: width / k, height: height / k };
}

/** Worst severity per block id. */
export function markersOf(findings: readonly { severity: Severity; blockIds: readonly string[] }[]) {
  const markers = new Map<string, Severity>();
  for (const f of findings) {
    for (const id of f.blockIds) {
      if (markers.get(id) !== 'error') markers.set(id, f.severity);
    }
  }
  return markers;
}

/** True when two marker maps flag the same blocks the same way. */
export function sameMarkers(a: ReadonlyMap<string, Severity>, b: ReadonlyMap<string, Severity>): boolean {
  if (a.size !== b.size) return false;
  for (const [id, s] of a) if (b.get(id) !== s) return false;
  return true;
}
