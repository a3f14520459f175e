import type { Layer } from 'konva/lib/Layer';
import { placedDesign } from '../geometry/placedIndex';
import type { AppStore } from '../store/appStore';
import type { EditorStore } from '../store/editorStore';
import type { GesturePreview } from './gestures/gesture';
import { BlocksCache } from './paint/blocksCache';
import { paintGrid } from './paint/paintGrid';
import { paintOverlay } from './paint/paintOverlay';
import { paintRulers } from './paint/paintRulers';
import { FindingMarkers, type MarkedFinding } from './paint/findingMarkers';
import type { Scene } from './paint/scene';
import { timed } from './perfProbe';

export interface CanvasLayers {
  readonly grid: Layer;
  readonly blocks: Layer;
  /** Overlay and rulers: both change with every pointer move, so they share one bitmap to upload per frame. */
  readonly overlay: Layer;
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
 * The three Konva layers and what each paints: grid (background), blocks (the document, repainted only
 * when the document, camera or finding markers change), and overlay (selection and gesture previews,
 * then the rulers with the pointer mark; repainted per pointer move, one bitmap to upload per frame).
 */
export class CanvasView {
  layers: CanvasLayers | null = null;
  element: HTMLDivElement | null = null;
  width = 0;
  height = 0;
  private readonly findingMarkers = new FindingMarkers();
  private readonly markerChanges = (since: number) => this.findingMarkers.changedSince(since);

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
      markers: this.findingMarkers.markers,
      markerVersion: this.findingMarkers.version,
      markerChanges: this.markerChanges,
      hidden: this.input.hidden(),
      gridVisible: this.editor.getState().gridVisible,
    };
  }

  readonly paintGrid = (ctx: CanvasRenderingContext2D) => paintGrid(ctx, this.scene());
  private readonly blocksCache = new BlocksCache();
  readonly paintBlocks = (ctx: CanvasRenderingContext2D) =>
    timed('paintBlocks', () => this.blocksCache.paint(ctx, this.scene()));
  /** The overlay, then the rulers on top of it. */
  readonly paintOverlay = (ctx: CanvasRenderingContext2D) =>
    timed('paintOverlay', () => {
      const scene = this.scene();
      const pointer = this.input.pointer();
      paintOverlay(ctx, scene, {
        selection: this.app.getState().selectedIds,
        handles: this.input.handles(),
        preview: this.input.preview(),
        pointer,
      });
      paintRulers(ctx, scene, pointer);
    });

  /** Asks Konva to repaint layers on the next animation frame (several asks make one paint). */
  redraw(what: LayerName): void {
    const layers = this.layers;
    if (!layers || this.width === 0) return;
    if (what === 'all') layers.grid.batchDraw();
    if (what === 'all' || what === 'blocks') layers.blocks.batchDraw();
    // The rulers share the overlay's layer: every change repaints it.
    layers.overlay.batchDraw();
  }

  /** Marks the blocks the findings name; repaints the blocks only when the marks change. */
  showFindings(findings: readonly MarkedFinding[]): void {
    if (this.findingMarkers.update(findings)) this.redraw('blocks');
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
