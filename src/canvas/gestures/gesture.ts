import type { Command } from '../../commands/command';
import { matLinePitch, type Step } from '../../geometry/cellPitch';
import { isPlacedMat } from '../../geometry/placedBlocks';
import type { PlacedDesign } from '../../geometry/placedIndex';
import type { Rect } from '../../geometry/rect';
import { buildSnapTargets, type SnapTargets } from '../../geometry/snapping';
import type { MatOutline } from '../../geometry/stripFit';
import type { Block, BlockType } from '../../model/block';
import type { CellDefinition } from '../../model/cell';
import type { Design } from '../../model/design';
import type { ToolOptions } from '../../store/editorStore';

/**
 * Gestures are small state machines that turn pointer input into one command (one undo step). They are
 * plain TypeScript over the document and geometry, so they are tested in Node; the canvas feeds them
 * world positions and draws what they preview.
 */

/** A point on the floorplan (m). */
export interface WorldPoint {
  readonly x: number;
  readonly y: number;
}

export interface Modifiers {
  readonly shift: boolean;
  /** Alt turns snapping off for the rest of the move. */
  readonly alt: boolean;
}

/** What a gesture sees of the editor when it starts. */
export interface EditorContext {
  readonly design: Design;
  readonly placed: PlacedDesign;
  readonly selection: readonly string[];
  readonly options: ToolOptions;
  /** Metres per screen pixel at the current zoom, for pixel-sized snapping distances. */
  readonly metresPerPixel: number;
}

/** Snapping reaches this far on screen (px). */
export const SNAP_DISTANCE_PX = 8;

/** A command with its arguments, ready for the store. */
export interface CommandCall {
  readonly command: Command<unknown>;
  readonly args: unknown;
}

export function commandCall<A>(command: Command<A>, args: A): CommandCall {
  return { command, args };
}

/** What a gesture leaves behind: a command to run, and what to select afterwards. */
export interface GestureResult {
  readonly call: CommandCall | null;
  /** Ids to select, or 'added' for the blocks the command adds; absent keeps the selection. */
  readonly select?: readonly string[] | 'added';
}

/** A block drawn by the overlay in its preview place. */
export interface GhostBlock {
  readonly type: BlockType;
  readonly rect: Rect;
}

/** What the overlay draws for a gesture in progress (world coordinates, m). */
export interface GesturePreview {
  readonly ghosts: readonly GhostBlock[];
  readonly band?: Rect;
  readonly guideX?: number | null;
  readonly guideY?: number | null;
  /** Text beside the pointer: sizes, cell counts, capacity, what a strip fits. */
  readonly label?: string;
}

export interface Gesture {
  /** The pointer moved past the click threshold, or further. */
  move(point: WorldPoint, modifiers: Modifiers): void;
  /** The button went up; `dragged` is false for a click. */
  finish(point: WorldPoint, dragged: boolean, modifiers: Modifiers): GestureResult;
  preview(): GesturePreview;
  /** Blocks as the gesture would leave them, for the live report; null when the document would not change. */
  changedBlocks(): readonly Block[] | null;
  /** Blocks the canvas draws faintly in their old place while the gesture runs. */
  readonly hiddenIds: ReadonlySet<string>;
}

export const NO_RESULT: GestureResult = { call: null };

export function cellOf(design: Design, cellId: string): CellDefinition | undefined {
  return design.cells.find((c) => c.id === cellId);
}

/** The cell new mats use: the chosen one if the design has it, else the design's first. */
export function chosenCell(design: Design, options: ToolOptions): CellDefinition | undefined {
  return cellOf(design, options.cellId) ?? design.cells[0];
}

/**
 * The pitch a set of blocks moves by: the line pitch of the first mat among them, else the pitch of the
 * cell new mats would use (so strips stay on the same grid as the mats they serve).
 */
export function pitchFor(design: Design, options: ToolOptions, blocks: readonly Block[]): Step {
  const F = design.process.featureSize;
  for (const b of blocks) {
    if (b.type !== 'mat') continue;
    const cell = cellOf(design, b.cellId);
    if (cell) return matLinePitch(cell, F, b.bitlineAxis);
  }
  const cell = chosenCell(design, options);
  return cell ? matLinePitch(cell, F, options.bitlineAxis) : { x: F, y: F };
}

export function movePitch(ctx: EditorContext, blocks: readonly Block[]): Step {
  return pitchFor(ctx.design, ctx.options, blocks);
}

/** Snap targets from every block except the excluded ones. */
export function snapTargetsExcept(placed: PlacedDesign, excluded: ReadonlySet<string>): SnapTargets {
  const rects: Rect[] = [];
  for (const p of placed.placed) if (!excluded.has(p.block.id)) rects.push(p.rect);
  return buildSnapTargets(rects);
}

/** Mats whose rectangles meet `rect` grown by `margin` (m), except the excluded ones. */
export function matsNear(
  placed: PlacedDesign,
  rect: Rect,
  margin: number,
  excluded: ReadonlySet<string> = new Set(),
): MatOutline[] {
  const mats: MatOutline[] = [];
  for (const i of placed.index.near(rect, margin)) {
    const p = placed.placed[i];
    if (p && isPlacedMat(p) && !excluded.has(p.block.id)) {
      mats.push({ id: p.block.id, rect: p.rect, bitlineAxis: p.block.bitlineAxis });
    }
  }
  return mats;
}

/** The name a mat goes by in labels. */
export function labelOf(design: Design, id: string): string {
  const block = design.blocks.find((b) => b.id === id);
  return block ? block.name || block.id : id;
}
