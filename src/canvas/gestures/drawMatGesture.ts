import { addBlocks } from '../../commands/addBlocks';
import { newBlockIdentity } from '../../commands/blockIds';
import { matLinePitch } from '../../geometry/cellPitch';
import { matFromDrag, type CellRounding, type DraggedMat } from '../../geometry/matFromDrag';
import { matGeometry } from '../../geometry/matGeometry';
import { snapPoint, type SnapTargets } from '../../geometry/snapping';
import type { Mat } from '../../model/block';
import type { CellDefinition } from '../../model/cell';
import { formatMatSizeAndBits } from '../../model/matSize';
import {
  chosenCell,
  commandCall,
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

/** Round counts by default, powers of two with Shift, whole cells with Alt (which also turns snapping off). */
export function drawnMatRounding(modifiers: Modifiers): CellRounding {
  return modifiers.alt ? 'free' : modifiers.shift ? 'powerOfTwo' : 'round';
}

/**
 * Drawing a mat: the press fixes one corner (snapped to other blocks' edges or the cell grid) and the
 * drag sizes the mat in round cell counts of the chosen cell (multiples of 64; powers of two with Shift;
 * free with Alt), showing its size and capacity. A click
 * without a drag places a mat of the default cell counts.
 */
export class DrawMatGesture implements Gesture {
  readonly hiddenIds: ReadonlySet<string> = new Set();
  private readonly cell: CellDefinition | undefined;
  private readonly targets: SnapTargets;
  private readonly anchor: WorldPoint;
  private drawn: DraggedMat | null = null;
  private guideX: number | null;
  private guideY: number | null;

  constructor(
    private readonly ctx: EditorContext,
    start: WorldPoint,
  ) {
    this.cell = chosenCell(ctx.design, ctx.options);
    this.targets = snapTargetsExcept(ctx.placed, new Set());
    const snapped = this.snap(start, false);
    this.anchor = snapped;
    this.guideX = snapped.guideX;
    this.guideY = snapped.guideY;
  }

  private snap(point: WorldPoint, off: boolean) {
    if (off || !this.cell) return { ...point, guideX: null, guideY: null };
    const pitch = matLinePitch(this.cell, this.ctx.design.process.featureSize, this.ctx.options.bitlineAxis);
    return snapPoint(point, pitch, this.targets, SNAP_DISTANCE_PX * this.ctx.metresPerPixel);
  }

  move(point: WorldPoint, modifiers: Modifiers): void {
    if (!this.cell) return;
    const snapped = this.snap(point, modifiers.alt);
    this.guideX = snapped.guideX;
    this.guideY = snapped.guideY;
    this.drawn = matFromDrag(
      this.anchor,
      snapped,
      this.cell,
      this.ctx.design.process.featureSize,
      this.ctx.options.bitlineAxis,
      drawnMatRounding(modifiers),
    );
  }

  /** The mat this gesture would add now. */
  mat(): Mat | null {
    const cell = this.cell;
    if (!cell) return null;
    const base = {
      ...newBlockIdentity(this.ctx.design, 'mat'),
      type: 'mat' as const,
      cellId: cell.id,
      bitlineAxis: this.ctx.options.bitlineAxis,
    };
    if (this.drawn) {
      const d = this.drawn;
      return {
        ...base,
        x: d.rect.x,
        y: d.rect.y,
        cellsPerBitline: d.cellsPerBitline,
        cellsPerWordline: d.cellsPerWordline,
      };
    }
    return {
      ...base,
      x: this.anchor.x,
      y: this.anchor.y,
      cellsPerBitline: this.ctx.options.cellsPerBitline,
      cellsPerWordline: this.ctx.options.cellsPerWordline,
    };
  }

  changedBlocks(): null {
    return null;
  }

  preview(): GesturePreview {
    const mat = this.mat();
    if (!mat || !this.cell) return { ghosts: [] };
    const g = matGeometry(mat, this.cell, this.ctx.design.process.featureSize);
    return {
      ghosts: [{ type: 'mat', rect: { x: mat.x, y: mat.y, width: g.width, height: g.height } }],
      guideX: this.guideX,
      guideY: this.guideY,
      label: formatMatSizeAndBits(mat.cellsPerBitline, mat.cellsPerWordline, g.bits),
    };
  }

  finish(point: WorldPoint, dragged: boolean, modifiers: Modifiers): GestureResult {
    if (dragged) this.move(point, modifiers);
    else this.drawn = null;
    const mat = this.mat();
    if (!mat) return NO_RESULT;
    return { call: commandCall(addBlocks, { blocks: [mat] }), select: 'added' };
  }
}
