import { blockAt, placedDesign } from '../geometry/placedIndex';
import type { AppState, AppStore, Viewport } from '../store/appStore';
import { isPlacementTool, type EditorState, type EditorStore } from '../store/editorStore';
import { useLiveReport } from '../store/liveReport';
import { setActiveCanvas } from './canvasBridge';
import { listenToCanvas } from './canvasListeners';
import { CanvasCursor } from './canvasCursor';
import { commitGesture } from './commitGesture';
import { CanvasView, type CanvasLayers } from './canvasView';
import { frameBlocks, frameEverything } from './framing';
import {
  chosenCell,
  type EditorContext,
  type Gesture,
  type GesturePreview,
  type Modifiers,
} from './gestures/gesture';
import { HoverPreview } from './hoverPreview';
import { LiveReportLoop } from './liveReportLoop';
import { gestureForPress } from './pressGesture';
import { pxPerMetre } from './paint/scene';
import { TouchPinch } from './touchPinch';
import { screenToWorld } from './viewportMath';
import { applyWheel, wheelIntent } from './wheelAndPinch';

/** A press becomes a drag once the pointer has moved this far (px). */
const DRAG_THRESHOLD_PX = 3;

interface Press {
  readonly gesture: Gesture;
  readonly startX: number;
  readonly startY: number;
  dragged: boolean;
  readonly selectOnClick?: readonly string[];
}

interface Pan {
  readonly startX: number;
  readonly startY: number;
  readonly viewport: Viewport;
}

const NOTHING_HIDDEN: ReadonlySet<string> = new Set();

/**
 * The canvas behind the Konva stage. React mounts the stage and its three layers once; everything that
 * changes per pointer move happens here, imperatively: gestures run in the overlay layer, the blocks
 * layer is repainted only when the document, the camera or the finding markers change, and the live
 * report of a drag is computed once per animation frame. So a drag on a 4,096-mat floorplan re-renders
 * no React component except the panels that show figures.
 */
export class CanvasController {
  readonly view: CanvasView;
  private press: Press | null = null;
  private pan: Pan | null = null;
  private spaceHeld = false;
  private pointer: { x: number; y: number } | null = null;
  /** The canvas's box on screen, measured when a gesture or a pan begins. */
  private gestureBox: DOMRect | null = null;
  private fitSeen = -1;
  private frameSeen = 0;
  private readonly hover = new HoverPreview();
  private readonly cursor = new CanvasCursor();
  private readonly live: LiveReportLoop;
  private readonly touch = new TouchPinch();
  private readonly cleanups: (() => void)[] = [];

  constructor(
    private readonly app: AppStore,
    private readonly editor: EditorStore,
  ) {
    this.live = new LiveReportLoop(app);
    this.view = new CanvasView(app, editor, {
      hidden: () => (this.press?.dragged ? this.press.gesture.hiddenIds : NOTHING_HIDDEN),
      preview: () => this.preview(),
      handles: () => !this.press && this.editor.getState().tool === 'select',
      pointer: () => this.pointer,
    });
  }

  private preview(): GesturePreview | null {
    const press = this.press;
    if (!press) return this.hover.preview;
    // A move shows nothing until it is a drag; drawing tools show where a click would put the block.
    return press.dragged || press.gesture.hiddenIds.size === 0 ? press.gesture.preview() : null;
  }

  // ---- lifecycle -------------------------------------------------------------------------------

  attach(element: HTMLDivElement, layers: CanvasLayers): void {
    if (this.view.element) this.detach();
    this.view.element = element;
    this.view.layers = layers;
    this.view.showFindings(this.app.getState().report.findings);
    this.frameSeen = this.editor.getState().frameRequest?.serial ?? 0;
    this.cleanups.push(
      listenToCanvas(element, {
        pointerDown: (e) => this.onPointerDown(e),
        pointerMove: (e) => this.onPointerMove(e),
        pointerUp: (e) => this.onPointerUp(e),
        pointerCancel: (e) => {
          if (!this.touch.up(e.pointerId)) this.cancelGesture();
        },
        // Capture ends by itself after pointerup (the gesture is over by then); losing it earlier cancels.
        captureLost: () => this.cancelGesture(),
        pointerLeave: () => this.onPointerLeave(),
        wheel: (e) => this.onWheel(e),
        contextMenu: (e) => this.onContextMenu(e),
        key: (e) => this.onSpace(e),
      }),
    );
    this.cleanups.push(this.app.subscribe((s, prev) => this.onAppChange(s, prev)));
    this.cleanups.push(this.editor.subscribe((s, prev) => this.onEditorChange(s, prev)));
    this.cleanups.push(
      useLiveReport.subscribe((s) =>
        this.view.showFindings((s.report ?? this.app.getState().report).findings),
      ),
    );
    setActiveCanvas({
      gestureActive: () => this.press !== null || this.pan !== null,
      cancelGesture: () => this.cancelGesture(),
      size: () => ({ width: this.view.width, height: this.view.height }),
    });
    this.view.writeViewAttributes();
    this.view.redraw('all');
  }

  detach(): void {
    this.cancelGesture();
    for (const cleanup of this.cleanups.splice(0)) cleanup();
    setActiveCanvas(null);
    this.view.element = null;
    this.view.layers = null;
  }

  setSize(width: number, height: number): void {
    if (width === this.view.width && height === this.view.height) return;
    this.view.width = width;
    this.view.height = height;
    if (this.fitSeen !== this.app.getState().fitRequest && width > 0) this.fitAll();
    this.view.redraw('all');
  }

  // ---- store changes ---------------------------------------------------------------------------

  private onAppChange(s: AppState, prev: AppState): void {
    if (s.viewport !== prev.viewport) {
      this.view.writeViewAttributes();
      this.view.redraw('all');
    }
    if (s.history.present !== prev.history.present) {
      this.hover.clear();
      this.view.redraw('blocks');
    }
    if (s.report !== prev.report && !useLiveReport.getState().report)
      this.view.showFindings(s.report.findings);
    if (s.selectedIds !== prev.selectedIds) this.view.redraw('overlay');
    if (s.fitRequest !== prev.fitRequest) this.fitAll();
  }

  private onEditorChange(s: EditorState, prev: EditorState): void {
    if (s.tool !== prev.tool) {
      this.cancelGesture();
      this.hover.clear();
      this.updateCursor(null);
      this.view.redraw('overlay');
    }
    if (s.gridVisible !== prev.gridVisible) this.view.redraw('all');
    if (s.frameRequest && s.frameRequest.serial !== this.frameSeen) {
      this.frameSeen = s.frameRequest.serial;
      const design = this.app.getState().history.present;
      const viewport = frameBlocks(design, s.frameRequest.ids, this.view.width, this.view.height);
      if (viewport) this.app.getState().setViewport(viewport);
    }
  }

  private fitAll(): void {
    if (this.view.width === 0) return;
    this.fitSeen = this.app.getState().fitRequest;
    const design = this.app.getState().history.present;
    this.app.getState().setViewport(frameEverything(design, this.view.width, this.view.height));
  }

  // ---- pointer input ---------------------------------------------------------------------------

  private local(e: MouseEvent): { x: number; y: number } {
    // During a gesture the canvas stays where it was when it began; asking again on every move would
    // force a layout after each status-bar update.
    const box = this.gestureBox ?? this.view.element?.getBoundingClientRect();
    return { x: e.clientX - (box?.left ?? 0), y: e.clientY - (box?.top ?? 0) };
  }

  private world(p: { x: number; y: number }) {
    return screenToWorld(this.app.getState().viewport, p.x, p.y);
  }

  private context(): EditorContext {
    const s = this.app.getState();
    const design = s.history.present;
    const options = this.editor.getState().options;
    return {
      design,
      placed: placedDesign(design),
      selection: s.selectedIds,
      options: { ...options, cellId: chosenCell(design, options)?.id ?? options.cellId },
      metresPerPixel: 1 / pxPerMetre(s.viewport),
    };
  }

  private modifiers(e: PointerEvent): Modifiers {
    return { shift: e.shiftKey, alt: e.altKey };
  }

  private onPointerDown(e: PointerEvent): void {
    if (e.pointerType === 'touch') {
      const p = this.local(e);
      if (this.touch.down(e.pointerId, p, this.app.getState().viewport)) {
        // A second finger: whatever the first began gives way to the pinch.
        this.cancelGesture();
        this.view.element?.setPointerCapture(e.pointerId);
        return;
      }
    }
    if ((e.button !== 0 && e.button !== 1) || this.press || this.pan || this.touch.active) return;
    // Keyboard shortcuts belong to the canvas again once it is clicked.
    const focused = document.activeElement;
    if (focused instanceof HTMLElement && focused !== document.body) focused.blur();
    this.view.element?.setPointerCapture(e.pointerId);
    this.gestureBox = this.view.element?.getBoundingClientRect() ?? null;
    const p = this.local(e);
    const tool = this.editor.getState().tool;
    if (e.button === 1 || tool === 'pan' || this.spaceHeld) {
      this.pan = { startX: p.x, startY: p.y, viewport: this.app.getState().viewport };
      this.cursor.set(this.view.element, 'grabbing');
      return;
    }
    const started = gestureForPress(this.context(), tool, this.world(p), e.shiftKey);
    if (!started) return;
    if (started.selectNow) this.app.getState().select(started.selectNow);
    const { gesture, selectOnClick } = started;
    this.hover.clear();
    this.press = { gesture, startX: p.x, startY: p.y, dragged: false, selectOnClick };
    this.view.redraw('overlay');
  }

  private onPointerMove(e: PointerEvent): void {
    const p = this.local(e);
    if (e.pointerType === 'touch') {
      const pinched = this.touch.move(e.pointerId, p);
      if (pinched) this.app.getState().setViewport(pinched);
      if (this.touch.active) return;
    }
    this.pointer = p;
    const at = this.world(p);
    this.editor.getState().setPointer(at);
    if (this.pan) {
      const v = this.pan.viewport;
      this.app.getState().setViewport({
        ...v,
        offsetX: v.offsetX + p.x - this.pan.startX,
        offsetY: v.offsetY + p.y - this.pan.startY,
      });
      return;
    }
    const press = this.press;
    if (press) {
      if (!press.dragged && Math.hypot(p.x - press.startX, p.y - press.startY) < DRAG_THRESHOLD_PX) return;
      if (!press.dragged) {
        press.dragged = true;
        if (press.gesture.hiddenIds.size > 0) this.view.redraw('blocks');
      }
      press.gesture.move(at, this.modifiers(e));
      this.live.schedule(press.gesture, e.timeStamp);
      this.view.redraw('overlay');
      this.view.redraw('rulers');
      return;
    }
    const tool = this.editor.getState().tool;
    if (isPlacementTool(tool)) this.hover.update(this.context(), tool, at);
    else this.hover.clear();
    this.updateCursor(at);
    this.view.redraw('overlay');
    this.view.redraw('rulers');
  }

  private onPointerUp(e: PointerEvent): void {
    if (e.pointerType === 'touch' && (this.touch.up(e.pointerId) || this.touch.active)) return;
    if (this.pan) {
      this.pan = null;
      this.updateCursor(this.world(this.local(e)));
      this.gestureBox = null;
      return;
    }
    const press = this.press;
    if (!press) {
      this.gestureBox = null;
      return;
    }
    const result = press.gesture.finish(this.world(this.local(e)), press.dragged, this.modifiers(e));
    this.endGesture();
    commitGesture(this.app, result, press.dragged ? undefined : press.selectOnClick);
    this.view.redraw('blocks');
  }

  private onPointerLeave(): void {
    if (this.press || this.pan) return;
    this.pointer = null;
    this.editor.getState().setPointer(null);
    this.hover.clear();
    this.view.redraw('overlay');
    this.view.redraw('rulers');
  }

  /** Two-finger scroll pans, pinch (Ctrl+wheel) and a mouse wheel zoom around the pointer. */
  private onWheel(e: WheelEvent): void {
    e.preventDefault();
    const p = this.local(e);
    this.app.getState().setViewport(applyWheel(this.app.getState().viewport, wheelIntent(e), p.x, p.y));
  }

  /** A right-click (or a long press) on a block selects it, unless it is selected, and opens the block menu. */
  private onContextMenu(e: MouseEvent): void {
    e.preventDefault();
    if (this.press || this.pan) return;
    const at = this.world(this.local(e));
    const hit = blockAt(placedDesign(this.app.getState().history.present), at.x, at.y);
    if (!hit) return;
    if (!this.app.getState().selectedIds.includes(hit)) this.app.getState().select([hit]);
    this.editor.getState().setContextMenu({ at: { x: e.clientX, y: e.clientY } });
  }

  /** Holding Space turns the next drag into a pan, as in most drawing editors. */
  private onSpace(e: KeyboardEvent): void {
    if (e.code !== 'Space') return;
    const t = e.target;
    const typing =
      t instanceof HTMLInputElement ||
      t instanceof HTMLTextAreaElement ||
      t instanceof HTMLSelectElement ||
      t instanceof HTMLButtonElement;
    if (typing) return;
    const down = e.type === 'keydown';
    if (down) e.preventDefault();
    if (down === this.spaceHeld) return;
    this.spaceHeld = down;
    this.updateCursor(this.pointer ? this.world(this.pointer) : null);
  }

  private updateCursor(at: { x: number; y: number } | null): void {
    this.cursor.update(this.view.element, {
      tool: this.editor.getState().tool,
      spaceHeld: this.spaceHeld,
      panning: this.pan !== null,
      at,
      ctx: at ? this.context() : null,
    });
  }

  // ---- gestures --------------------------------------------------------------------------------

  /** Cancels the gesture in progress (Escape): nothing is committed. True when there was one. */
  cancelGesture(): boolean {
    if (this.pan) {
      this.app.getState().setViewport(this.pan.viewport);
      this.pan = null;
      this.gestureBox = null;
      return true;
    }
    if (!this.press) return false;
    this.endGesture();
    this.view.redraw('blocks');
    return true;
  }

  private endGesture(): void {
    this.press = null;
    this.gestureBox = null;
    this.live.stop();
    this.view.showFindings(this.app.getState().report.findings);
  }
}
