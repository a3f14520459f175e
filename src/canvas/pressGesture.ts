import type { Tool } from '../commands/tools';
import { isPlacementTool } from '../store/editorStore';
import { DrawMatGesture } from './gestures/drawMatGesture';
import type { EditorContext, Gesture, WorldPoint } from './gestures/gesture';
import { PlaceStripGesture } from './gestures/placeStripGesture';
import { pressWithSelectTool } from './gestures/selectPress';

/** What a press on the canvas starts. */
export interface StartedPress {
  readonly gesture: Gesture;
  /** Ids to select if the press ends without a drag (a click on a selected block). */
  readonly selectOnClick?: readonly string[];
  /** Ids to select at once, as the press begins. */
  readonly selectNow?: readonly string[];
}

/**
 * The gesture a primary-button press at `at` (world, m) starts with `tool`: select presses resize,
 * move or band-select; the mat tool draws a mat; placement tools place a strip or decoder. Null for a
 * tool that starts no gesture (pan is handled before this).
 */
export function gestureForPress(
  ctx: EditorContext,
  tool: Tool,
  at: WorldPoint,
  shift: boolean,
): StartedPress | null {
  if (tool === 'select') return pressWithSelectTool(ctx, at, shift);
  if (tool === 'mat') return { gesture: new DrawMatGesture(ctx, at) };
  if (isPlacementTool(tool)) return { gesture: new PlaceStripGesture(ctx, tool, at) };
  return null;
}
