// Konva's stage, layer and shape modules alone, not its core bundle: tweens, animations, groups and the
// fast layer are never used here and would only add to the first load.
import { Layer } from 'konva/lib/Layer';
import { Shape } from 'konva/lib/Shape';
import { Stage } from 'konva/lib/Stage';
import type { CanvasLayers } from './canvasView';

type Paint = (ctx: CanvasRenderingContext2D) => void;

/** What the stage paints, one function per layer, bottom to top. */
export interface LayerPainters {
  readonly grid: Paint;
  readonly blocks: Paint;
  /** Selection, gesture previews and the rulers on top: what changes with every pointer move, on one bitmap. */
  readonly overlay: Paint;
}

/** The stage and its layers, made once per mounted canvas. */
export interface PaintedStage {
  readonly layers: CanvasLayers;
  resize(width: number, height: number): void;
  destroy(): void;
}

/** One layer holding one shape that paints itself; nothing in it takes pointer events. */
function paintedLayer(paint: Paint): Layer {
  const layer = new Layer({ listening: false, imageSmoothingEnabled: false });
  layer.add(
    new Shape({
      sceneFunc: (context) => paint(context._context),
      listening: false,
      perfectDrawEnabled: false,
    }),
  );
  return layer;
}

/**
 * Mounts a Konva stage of three painted layers in `container`, straight through Konva's core (no React
 * reconciler: the canvas controller paints and hit-tests itself, so the stage never changes shape).
 */
export function mountPaintedStage(
  container: HTMLDivElement,
  width: number,
  height: number,
  background: string,
  paint: LayerPainters,
): PaintedStage {
  const stage = new Stage({ container, width, height, listening: false });
  stage.content.style.background = background;
  const layers: CanvasLayers = {
    grid: paintedLayer(paint.grid),
    blocks: paintedLayer(paint.blocks),
    overlay: paintedLayer(paint.overlay),
  };
  stage.add(layers.grid, layers.blocks, layers.overlay);
  return {
    layers,
    resize(w, h) {
      if (stage.width() !== w || stage.height() !== h) stage.size({ width: w, height: h });
    },
    destroy() {
      stage.destroy();
    },
  };
}
