import type { Design } from '../model/design';
import type { SnapTargets } from '../geometry/snapping';
import type { PlacementTool } from '../store/editorStore';
import { snapTargetsExcept, type EditorContext, type GesturePreview } from './gestures/gesture';
import { placementAt } from './gestures/placeStripGesture';

/**
 * What a placement tool would put down under the pointer before any button is pressed: the strip fitted
 * to the nearest suitable mat edge, or the block at its default size. Snap targets are kept per document.
 */
export class HoverPreview {
  private targets: { design: Design; targets: SnapTargets } | null = null;
  preview: GesturePreview | null = null;

  update(ctx: EditorContext, tool: PlacementTool, at: { x: number; y: number }): void {
    if (this.targets?.design !== ctx.design) {
      this.targets = { design: ctx.design, targets: snapTargetsExcept(ctx.placed, new Set()) };
    }
    const placement = placementAt(ctx, tool, at, this.targets.targets);
    this.preview = { ghosts: [{ type: tool, rect: placement.rect }], label: placement.label };
  }

  clear(): void {
    this.preview = null;
  }
}
