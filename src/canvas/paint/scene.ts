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
  /** Bumped whenever a marker changes. */
  readonly markerVersion: number;
  /** Ids whose marker changed after a version, or null when too many did to say. */
  readonly markerChanges: (since: number) => ReadonlySet<string> | null;
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
