import { moveBlocks } from '../../commands/moveBlocks';
import { reshapeBlocks } from '../../commands/reshapeBlocks';
import { boundingBox, type Rect } from '../../geometry/rect';
import { snapMove, type SnapTargets } from '../../geometry/snapping';
import { decoderSides, fitDroppedDecoder, stackOutlines } from '../../geometry/stackFit';
import { fitDroppedStrip } from '../../geometry/stripFit';
import type { Block } from '../../model/block';
import { formatPosition, formatQuantity } from '../../model/units';
import {
  commandCall,
  labelOf,
  matsNear,
  movePitch,
  NO_RESULT,
  SNAP_DISTANCE_PX,
  snapTargetsExcept,
  type EditorContext,
  type Gesture,
  type GestureResult,
  type GesturePreview,
  type Modifiers,
  type WorldPoint,
} from './gesture';

/**
 * Dragging the selection: the move goes in whole cell pitches, edges snap to line up with or abut other
 * blocks (with a guide), a lone sense-amplifier or driver strip dropped against a suitable mat edge
 * takes that edge's length, and a lone decoder dropped against a stack's side takes that side's length. One move is one command.
 */
export class MoveGesture implements Gesture {
  readonly hiddenIds: ReadonlySet<string>;
  private readonly originals: readonly Block[];
  private readonly rects: readonly Rect[];
  private readonly box: Rect;
  private targets: SnapTargets | null = null;
  private dx = 0;
  private dy = 0;
  private guideX: number | null = null;
  private guideY: number | null = null;
  private fit: { readonly rect: Rect; readonly describe: string } | null = null;

  constructor(
    private readonly ctx: EditorContext,
    ids: readonly string[],
    private readonly grab: WorldPoint,
  ) {
    const chosen = new Set(ids);
    const originals: Block[] = [];
    const rects: Rect[] = [];
    ctx.placed.placed.forEach((p) => {
      if (!chosen.has(p.block.id)) return;
      originals.push(p.block);
      rects.push(p.rect);
    });
    this.originals = originals;
    this.rects = rects;
    this.box = boundingBox(rects) ?? { x: grab.x, y: grab.y, width: 0, height: 0 };
    this.hiddenIds = chosen;
  }

  get ids(): readonly string[] {
    return this.originals.map((b) => b.id);
  }

  move(point: WorldPoint, modifiers: Modifiers): void {
    const rawDx = point.x - this.grab.x;
    const rawDy = point.y - this.grab.y;
    if (modifiers.alt) {
      this.dx = rawDx;
      this.dy = rawDy;
      this.guideX = null;
      this.guideY = null;
    } else {
      this.targets ??= snapTargetsExcept(this.ctx.placed, this.hiddenIds);
      const snapped = snapMove(
        this.box,
        rawDx,
        rawDy,
        movePitch(this.ctx, this.originals),
        this.targets,
        SNAP_DISTANCE_PX * this.ctx.metresPerPixel,
      );
      this.dx = snapped.dx;
      this.dy = snapped.dy;
      this.guideX = snapped.guideX;
      this.guideY = snapped.guideY;
    }
    this.fit = this.fitLoneStrip();
  }

  /**
   * A lone sense-amplifier or driver strip dropped against a suitable mat edge, or a lone decoder dropped
   * against a suitable side of a stack of mats and strips.
   */
  private fitLoneStrip(): { readonly rect: Rect; readonly describe: string } | null {
    const only = this.originals[0];
    const rect = this.rects[0];
    if (this.originals.length !== 1 || !only || !rect || only.type === 'mat') return null;
    const moved = { ...rect, x: rect.x + this.dx, y: rect.y + this.dy };
    if (decoderSides(only.type).length > 0) {
      const stack = fitDroppedDecoder(only.type, moved, stackOutlines(this.ctx.placed));
      return stack && { rect: stack.rect, describe: `the ${stack.side} of the stack` };
    }
    const mats = matsNear(this.ctx.placed, moved, 2 * this.ctx.metresPerPixel, this.hiddenIds);
    const fit = fitDroppedStrip(only.type, moved, mats);
    return fit && { rect: fit.rect, describe: `${labelOf(this.ctx.design, fit.matId)} ${fit.side} edge` };
  }

  changedBlocks(): readonly Block[] | null {
    if (this.dx === 0 && this.dy === 0 && !this.fit) return null;
    const fit = this.fit;
    return this.originals.map((b): Block => {
      if (fit && b.type !== 'mat') {
        return { ...b, x: fit.rect.x, y: fit.rect.y, width: fit.rect.width, height: fit.rect.height };
      }
      return { ...b, x: b.x + this.dx, y: b.y + this.dy };
    });
  }

  preview(): GesturePreview {
    const fit = this.fit;
    const ghosts = this.originals.map((b, i) => {
      const r = this.rects[i] ?? { x: b.x, y: b.y, width: 0, height: 0 };
      return { type: b.type, rect: fit ? fit.rect : { ...r, x: r.x + this.dx, y: r.y + this.dy } };
    });
    const grid = movePitch(this.ctx, this.originals);
    const shift = `Δx ${formatPosition(this.dx, grid.x)}, Δy ${formatPosition(this.dy, grid.y)}`;
    const label = fit
      ? `${shift} · fits ${fit.describe}, ${formatQuantity(
          Math.max(fit.rect.width, fit.rect.height),
          'length',
        )}`
      : shift;
    return { ghosts, guideX: this.guideX, guideY: this.guideY, label };
  }

  finish(_point: WorldPoint, dragged: boolean): GestureResult {
    if (!dragged) return NO_RESULT;
    const only = this.originals[0];
    if (this.fit && only) {
      const r = this.fit.rect;
      return {
        call: commandCall(reshapeBlocks, {
          changes: [{ id: only.id, x: r.x, y: r.y, width: r.width, height: r.height }],
        }),
      };
    }
    if (this.dx === 0 && this.dy === 0) return NO_RESULT;
    return { call: commandCall(moveBlocks, { ids: this.ids, dx: this.dx, dy: this.dy }) };
  }
}
