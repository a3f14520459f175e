import { create } from 'zustand';
import { DEMO_MAT, DEMO_STRIPS } from '../designs/demoSizes';
import type { Tool } from '../commands/tools';
import type { BitlineAxis } from '../model/block';

/**
 * Session state of the floorplan editor: the active tool and its options, view toggles, open dialogs and
 * the clipboard. None of it is part of the document, so none of it is undone.
 */

/** Tools that place a strip-like block. */
export type PlacementTool = Exclude<Tool, 'select' | 'pan' | 'mat'>;

export function isPlacementTool(tool: Tool): tool is PlacementTool {
  return tool !== 'select' && tool !== 'pan' && tool !== 'mat';
}

/** What new blocks look like. Lengths in metres. */
export interface ToolOptions {
  /** Cell of newly drawn mats; the design's first cell when it names none the design has. */
  readonly cellId: string;
  readonly bitlineAxis: BitlineAxis;
  /** Cell counts of a mat placed with a click instead of a drag. */
  readonly cellsPerBitline: number;
  readonly cellsPerWordline: number;
  /** Thickness of each strip type across its long side, and the length of one placed away from any mat. */
  readonly thickness: Readonly<Record<PlacementTool, number>>;
  readonly length: Readonly<Record<PlacementTool, number>>;
}

export const DEFAULT_TOOL_OPTIONS: ToolOptions = {
  cellId: '',
  bitlineAxis: 'vertical',
  cellsPerBitline: DEMO_MAT.cellsPerBitline,
  cellsPerWordline: DEMO_MAT.cellsPerWordline,
  thickness: {
    senseAmpStrip: DEMO_STRIPS.senseAmpStripHeight,
    wordlineDriverStrip: DEMO_STRIPS.wordlineDriverStripWidth,
    rowDecoder: DEMO_STRIPS.rowDecoderWidth,
    columnDecoder: DEMO_STRIPS.columnDecoderHeight,
    spacer: 5e-6,
  },
  length: {
    senseAmpStrip: 36e-6,
    wordlineDriverStrip: 36e-6,
    rowDecoder: 80e-6,
    columnDecoder: 80e-6,
    spacer: 5e-6,
  },
};

/** A request to the canvas to frame some blocks; `serial` grows with each request. */
export interface FrameRequest {
  readonly ids: readonly string[];
  readonly serial: number;
}

export interface EditorState {
  readonly tool: Tool;
  readonly options: ToolOptions;
  readonly gridVisible: boolean;
  readonly helpOpen: boolean;
  readonly stepRepeatOpen: boolean;
  /** Copied blocks as the text of a small design file (read back through io/restore). */
  readonly clipboard: string | null;
  readonly frameRequest: FrameRequest | null;
  /**
   * The block menu when open: where it was asked for (page px), or `at: null` when opened from the keyboard
   * (it then sits over the canvas); null when closed.
   */
  readonly contextMenu: { readonly at: { readonly x: number; readonly y: number } | null } | null;
  /** World position under the pointer (m), or null when it is off the canvas. */
  readonly pointer: { readonly x: number; readonly y: number } | null;

  setTool(tool: Tool): void;
  setOptions(patch: Partial<ToolOptions>): void;
  setThickness(tool: PlacementTool, thickness: number): void;
  toggleGrid(): void;
  setHelpOpen(open: boolean): void;
  setStepRepeatOpen(open: boolean): void;
  setClipboard(text: string): void;
  requestFrame(ids: readonly string[]): void;
  setContextMenu(menu: { at: { x: number; y: number } | null } | null): void;
  setPointer(pointer: { x: number; y: number } | null): void;
}

export function createEditorStore() {
  return create<EditorState>()((set, get) => ({
    tool: 'select',
    options: DEFAULT_TOOL_OPTIONS,
    gridVisible: true,
    helpOpen: false,
    stepRepeatOpen: false,
    clipboard: null,
    frameRequest: null,
    contextMenu: null,
    pointer: null,
    setTool: (tool) => set({ tool }),
    setOptions: (patch) => set({ options: { ...get().options, ...patch } }),
    setThickness: (tool, thickness) =>
      set({ options: { ...get().options, thickness: { ...get().options.thickness, [tool]: thickness } } }),
    toggleGrid: () => set({ gridVisible: !get().gridVisible }),
    setHelpOpen: (helpOpen) => set({ helpOpen }),
    setStepRepeatOpen: (stepRepeatOpen) => set({ stepRepeatOpen }),
    setClipboard: (clipboard) => set({ clipboard }),
    requestFrame: (ids) => set({ frameRequest: { ids, serial: (get().frameRequest?.serial ?? 0) + 1 } }),
    setPointer: (pointer) => set({ pointer }),
    setContextMenu: (contextMenu) => set({ contextMenu }),
  }));
}

export type EditorStore = ReturnType<typeof createEditorStore>;

/** The app's one editor store. Tests make their own with createEditorStore. */
export const useEditorStore = createEditorStore();
