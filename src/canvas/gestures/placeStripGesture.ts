import { addBlocks } from '../../commands/addBlocks';
import { newBlockIdentity } from '../../commands/blockIds';
import type { Rect } from '../../geometry/rect';
import { snapPoint, type SnapTargets } from '../../geometry/snapping';
import { decoderSides, fitDecoderAtPoint, stackOutlines, type StackFit } from '../../geometry/stackFit';
import { fitStripAtPoint, type StripFit } from '../../geometry/stripFit';
import { BLOCK_TYPE_LABEL, type Strip } from '../../model/block';
import { formatQuantity } from '../../model/units';
import type { PlacementTool } from '../../store/editorStore';
import { boxBetween } from './bandGesture';
import {
  commandCall,
  labelOf,
  matsNear,
  movePitch,
  SNAP_DISTANCE_PX,
  snapTargetsExcept,
  type EditorContext,
  type Gesture,
  type GestureResult,
  type GesturePreview,
  type Modifiers,
  type WorldPoint,
} from './gesture';

/** Strips drawn across (wider than tall) when placed away from any mat; the others stand upright. */
const LIES_ACROSS: Record<PlacementTool, boolean> = {
  senseAmpStrip: true,
  wordlineDriverStrip: false,
  rowDecoder: false,
  columnDecoder: true,
  spacer: true,
};

/** Where a click would put a block of this tool: fitted to a nearby mat edge, or its default size. */
export interface Placement {
  readonly rect: Rect;
  readonly fit: StripFit | null;
  /** For a decoder: the stack side it spans. */
  readonly stack: StackFit | null;
  readonly label: string;
}

/**
 * The placement for a click at `point`: a sense-amplifier strip near a mat's bit-line edge (or a driver
 * strip near a word-line edge) spans that edge; a row decoder near the left or right side of a stack of
 * mats and strips (a column decoder near its top or bottom) spans that side; anything else gets its default size with its top-left
 * corner at the snapped point.
 */
export function placementAt(
  ctx: EditorContext,
  tool: PlacementTool,
  point: WorldPoint,
  targets: SnapTargets,
): Placement {
  const thickness = ctx.options.thickness[tool];
  const reach = Math.max(12 * ctx.metresPerPixel, thickness);
  const probe = { x: point.x, y: point.y, width: 0, height: 0 };
  const kind = BLOCK_TYPE_LABEL[tool];
  if (decoderSides(tool).length > 0) {
    const stack = fitDecoderAtPoint(tool, point, stackOutlines(ctx.placed), thickness, reach);
    if (stack) {
      const length = Math.max(stack.rect.width, stack.rect.height);
      const mats = formatQuantity(stack.stack.matCount, 'count');
      return {
        rect: stack.rect,
        fit: null,
        stack,
        label: `${kind} along the ${stack.side} of the stack of ${mats} mat${stack.stack.matCount === 1 ? '' : 's'} · ${formatQuantity(length, 'length')}`,
      };
    }
  }
  const fit = fitStripAtPoint(tool, point, matsNear(ctx.placed, probe, reach), thickness, reach);
  if (fit) {
    const length = Math.max(fit.rect.width, fit.rect.height);
    return {
      rect: fit.rect,
      fit,
      stack: null,
      label: `${kind} on ${labelOf(ctx.design, fit.matId)} ${fit.side} edge · ${formatQuantity(length, 'length')}`,
    };
  }
  const length = ctx.options.length[tool];
  const snapped = snapPoint(point, movePitch(ctx, []), targets, SNAP_DISTANCE_PX * ctx.metresPerPixel);
  const across = LIES_ACROSS[tool];
  const rect = {
    x: snapped.x,
    y: snapped.y,
    width: across ? length : thickness,
    height: across ? thickness : length,
  };
  return {
    rect,
    fit: null,
    stack: null,
    label: `${kind} ${formatQuantity(rect.width, 'length')} × ${formatQuantity(rect.height, 'length')}`,
  };
}

/** The block a placement tool adds for a rectangle. */
export function placedStrip(ctx: EditorContext, tool: PlacementTool, rect: Rect): Strip {
  return { ...newBlockIdentity(ctx.design, tool), type: tool, ...rect };
}

/**
 * Placing a strip, decoder or spacer: a click puts it where {@link placementAt} says; a drag draws its
 * rectangle, both corners snapping to other blocks' edges.
 */
export class PlaceStripGesture implements Gesture {
  readonly hiddenIds: ReadonlySet<string> = new Set();
  private readonly targets: SnapTargets;
  private readonly start: WorldPoint;
  private drawn: Rect | null = null;
  private guideX: number | null = null;
  private guideY: number | null = null;

  constructor(
    private readonly ctx: EditorContext,
    private readonly tool: PlacementTool,
    start: WorldPoint,
  ) {
    this.targets = snapTargetsExcept(ctx.placed, new Set());
    this.start = start;
  }

  private snap(point: WorldPoint) {
    return snapPoint(
      point,
      movePitch(this.ctx, []),
      this.targets,
      SNAP_DISTANCE_PX * this.ctx.metresPerPixel,
    );
  }

  move(point: WorldPoint, modifiers: Modifiers): void {
    const a = modifiers.alt ? this.start : this.snap(this.start);
    const b = modifiers.alt ? { ...point, guideX: null, guideY: null } : this.snap(point);
    this.guideX = b.guideX;
    this.guideY = b.guideY;
    // A drag along one direction only gives the strip its default thickness across it.
    const box = boxBetween(a, b);
    const tiny = 2 * this.ctx.metresPerPixel;
    const thickness = this.ctx.options.thickness[this.tool];
    this.drawn = {
      ...box,
      width: box.width < tiny ? thickness : box.width,
      height: box.height < tiny ? thickness : box.height,
    };
  }

  changedBlocks(): null {
    return null;
  }

  preview(): GesturePreview {
    if (!this.drawn) {
      const p = placementAt(this.ctx, this.tool, this.start, this.targets);
      return { ghosts: [{ type: this.tool, rect: p.rect }], label: p.label };
    }
    const r = this.drawn;
    return {
      ghosts: [{ type: this.tool, rect: r }],
      guideX: this.guideX,
      guideY: this.guideY,
      label: `${BLOCK_TYPE_LABEL[this.tool]} ${formatQuantity(r.width, 'length')} × ${formatQuantity(r.height, 'length')}`,
    };
  }

  finish(point: WorldPoint, dragged: boolean, modifiers: Modifiers): GestureResult {
    let rect: Rect;
    if (dragged) {
      this.move(point, modifiers);
      rect = this.drawn ?? placementAt(this.ctx, this.tool, this.start, this.targets).rect;
    } else {
      rect = placementAt(this.ctx, this.tool, this.start, this.targets).rect;
    }
    if (rect.width <= 0 || rect.height <= 0) return { call: null };
    return {
      call: commandCall(addBlocks, { blocks: [placedStrip(this.ctx, this.tool, rect)] }),
      select: 'added',
    };
  }
}
