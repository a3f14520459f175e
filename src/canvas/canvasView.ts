import type { Layer } from 'konva/lib/Layer';
import type { Severity } from '../engine';
import { placedDesign } from '../geometry/placedIndex';
import type { AppStore } from '../store/appStore';
import type { EditorStore } from '../store/editorStore';
import type { GesturePreview } from './gestures/gesture';
import { BlocksCache } from './paint/blocksCache';
import { paintGrid } from './paint/paintGrid';
import { paintOverlay } from './paint/paintOverlay';
import { paintRulers } from './paint/paintRulers';
import { markersOf, sameMarkers, type Scene } from './paint/scene';
import { timed } from './perfProbe';

export interface CanvasLayers {
  readonly grid: Layer;
  readonly blocks: Layer;
  readonly overlay: Layer;
  readonly rulers: Layer;
}

/** What the view asks of the controller when it paints. */
export interface ViewInput {
  /** Blocks a gesture is moving (drawn faintly in place). */
  hidden(): ReadonlySet<string>;
  /** The preview to draw in the overlay, if any. */
  preview(): GesturePreview | null;
  /** Show the resize handles of a single selected block. */
  handles(): boolean;
  /** Pointer on screen (px), or null. */
  pointer(): { x: number; y: number } | null;
}

export type LayerName = 'all' | 'blocks' | 'overlay' | 'rulers';

/**
 * The four Konva layers and what each paints: grid (background), blocks (the document, repainted only
 * when the document, camera or finding markers change), overlay (selection and gesture previews,
 * repainted per pointer move) and rulers (with the pointer mark).
 */
export class CanvasView {
  layers: CanvasLayers | null = null;
  element: HTMLDivElement | null = null;
  width = 0;
  height = 0;
  private markers: ReadonlyMap<string, Severity> = new Map();

  constructor(
    private readonly app: AppStore,
    private readonly editor: EditorStore,
    private readonly input: ViewInput,
  ) {}

  scene(): Scene {
    const s = this.app.getState();
    const design = s.history.present;
    return {
      design,
      placed: placedDesign(design),
      viewport: s.viewport,
      width: this.width,
      height: this.height,
      markers: this.markers,
      hidden: this.input.hidden(),
      gridVisible: this.editor.getState().gridVisible,
    };
  }

  readonly paintGrid = (ctx: CanvasRenderingContext2D) => paintGrid(ctx, this.scene());
  private readonly blocksCache = new BlocksCache();
  readonly paintBlocks = (ctx: CanvasRenderingContext2D) =>
    timed('paintBlocks', () => this.blocksCache.paint(ctx, this.scene()));
  readonly paintRulers = (ctx: CanvasRenderingContext2D) =>
    paintRulers(ctx, this.scene(), this.input.pointer());
  readonly paintOverlay = (ctx: CanvasRenderingContext2D) =>
    timed('paintOverlay', () =>
      paintOverlay(ctx, this.scene(), {
        selection: this.app.getState().selectedIds,
        handles: this.input.handles(),
        preview: this.input.preview(),
        pointer: this.input.pointer(),
      }),
    );

  /** Asks Konva to repaint layers on the next animation frame (several asks make one paint). */
  redraw(what: LayerName): void {
    const layers = this.layers;
    if (!layers || this.width === 0) return;
    if (what === 'all') layers.grid.batchDraw();
    if (what === 'all' || what === 'blocks') layers.blocks.batchDraw();
    if (what !== 'rulers') layers.overlay.batchDraw();
    if (what === 'all' || what === 'rulers') layers.rulers.batchDraw();
  }

  /** Marks the blocks the findings name; repaints the blocks only when the marks change. */
  showFindings(findings: readonly { severity: Severity; blockIds: readonly string[] }[]): void {
    const next = markersOf(findings);
    if (sameMarkers(next, this.markers)) return;
    this.markers = next;
    this.redraw('blocks');
  }

  /** The camera as data attributes, so that browser tests can turn world positions into clicks. */
  writeViewAttributes(): void {
    const el = this.element;
    if (!el) return;
    const v = this.app.getState().viewport;
    el.dataset.viewScale = String(v.scale);
    el.dataset.viewX = String(v.offsetX);
    el.dataset.viewY = String(v.offsetY);
  }
}
