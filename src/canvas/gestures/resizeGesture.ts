import { reshapeBlocks } from '../../commands/reshapeBlocks';
import { matGeometry } from '../../geometry/matGeometry';
import type { PlacedBlock } from '../../geometry/placedBlocks';
import { handlePosition, resizeMat, resizeRect, type ResizeHandle } from '../../geometry/resize';
import type { Rect } from '../../geometry/rect';
import { snapPoint, type SnapTargets } from '../../geometry/snapping';
import type { Block } from '../../model/block';
import { formatMatSizeAndBits } from '../../model/matSize';
import { formatQuantity } from '../../model/units';
import {
  cellOf,
  commandCall,
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

/** Smallest strip a resize leaves (m): one nanometre, the abutment tolerance. */
const MIN_STRIP_SIZE = 1e-9;

/**
 * Dragging a handle of the one selected block: a mat resizes in whole cells with its opposite side
 * fixed; a strip resizes freely, its dragged side snapping to other blocks' edges.
 */
export class ResizeGesture implements Gesture {
  readonly hiddenIds: ReadonlySet<string>;
  private targets: SnapTargets | null = null;
  private current: Block;
  private guideX: number | null = null;
  private guideY: number | null = null;

  constructor(
    private readonly ctx: EditorContext,
    private readonly original: PlacedBlock,
    private readonly handle: ResizeHandle,
    private readonly grab: WorldPoint,
  ) {
    this.hiddenIds = new Set([original.block.id]);
    this.current = original.block;
  }

  move(point: WorldPoint, modifiers: Modifiers): void {
    let dx = point.x - this.grab.x;
    let dy = point.y - this.grab.y;
    const block = this.original.block;
    if (block.type === 'mat') {
      const cell = cellOf(this.ctx.design, block.cellId);
      if (!cell) return;
      const r = resizeMat(block, cell, this.ctx.design.process.featureSize, this.handle, dx, dy);
      this.current = { ...block, ...r };
      return;
    }
    if (!modifiers.alt) {
      this.targets ??= snapTargetsExcept(this.ctx.placed, this.hiddenIds);
      const at = handlePosition(this.original.rect, this.handle);
      const snapped = snapPoint(
        { x: at.x + dx, y: at.y + dy },
        movePitch(this.ctx, [block]),
        this.targets,
        SNAP_DISTANCE_PX * this.ctx.metresPerPixel,
      );
      // Only the coordinates the handle moves along are snapped (a side handle moves one way).
      const movesX = this.handle.includes('e') || this.handle.includes('w');
      const movesY = this.handle.includes('n') || this.handle.includes('s');
      if (movesX) dx = snapped.x - at.x;
      if (movesY) dy = snapped.y - at.y;
      this.guideX = movesX ? snapped.guideX : null;
      this.guideY = movesY ? snapped.guideY : null;
    }
    const r = resizeRect(this.original.rect, this.handle, dx, dy, MIN_STRIP_SIZE);
    this.current = { ...block, x: r.x, y: r.y, width: r.width, height: r.height };
  }

  private rect(): Rect {
    const b = this.current;
    if (b.type !== 'mat') return { x: b.x, y: b.y, width: b.width, height: b.height };
    const cell = cellOf(this.ctx.design, b.cellId);
    if (!cell) return this.original.rect;
    const g = matGeometry(b, cell, this.ctx.design.process.featureSize);
    return { x: b.x, y: b.y, width: g.width, height: g.height };
  }

  changedBlocks(): readonly Block[] | null {
    return this.current === this.original.block ? null : [this.current];
  }

  preview(): GesturePreview {
    const b = this.current;
    const rect = this.rect();
    let label = `${formatQuantity(rect.width, 'length')} × ${formatQuantity(rect.height, 'length')}`;
    if (b.type === 'mat') {
      const cell = cellOf(this.ctx.design, b.cellId);
      if (cell) {
        const g = matGeometry(b, cell, this.ctx.design.process.featureSize);
        label = formatMatSizeAndBits(b.cellsPerBitline, b.cellsPerWordline, g.bits);
      }
    }
    return { ghosts: [{ type: b.type, rect }], guideX: this.guideX, guideY: this.guideY, label };
  }

  finish(): GestureResult {
    const b = this.current;
    if (b === this.original.block) return NO_RESULT;
    const change =
      b.type === 'mat'
        ? {
            id: b.id,
            x: b.x,
            y: b.y,
            cellsPerBitline: b.cellsPerBitline,
            cellsPerWordline: b.cellsPerWordline,
          }
        : { id: b.id, x: b.x, y: b.y, width: b.width, height: b.height };
    return { call: commandCall(reshapeBlocks, { changes: [change] }) };
  }
}
