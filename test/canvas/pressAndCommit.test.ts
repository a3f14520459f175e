import { describe, expect, it } from 'vitest';
import { commitGesture } from '../../src/canvas/commitGesture';
import { BandGesture } from '../../src/canvas/gestures/bandGesture';
import { DrawMatGesture } from '../../src/canvas/gestures/drawMatGesture';
import { commandCall, type EditorContext } from '../../src/canvas/gestures/gesture';
import { PlaceStripGesture } from '../../src/canvas/gestures/placeStripGesture';
import { gestureForPress } from '../../src/canvas/pressGesture';
import { duplicateBlocks } from '../../src/commands/duplicateBlocks';
import { demoDesign } from '../../src/designs/demoDesign';
import { placedDesign } from '../../src/geometry/placedIndex';
import type { Design } from '../../src/model/design';
import { createAppStore } from '../../src/store/appStore';
import { DEFAULT_TOOL_OPTIONS } from '../../src/store/editorStore';

function context(design: Design): EditorContext {
  return {
    design,
    placed: placedDesign(design),
    selection: [],
    options: { ...DEFAULT_TOOL_OPTIONS, cellId: design.cells[0]?.id ?? '' },
    metresPerPixel: 1e-8,
  };
}

/** Far outside the demo floorplan (m). */
const EMPTY_SPOT = { x: -1e-3, y: -1e-3 };

describe('which gesture a press starts', () => {
  const ctx = context(demoDesign());
  it('select on empty space bands, mat draws, a placement tool places, pan starts none', () => {
    expect(gestureForPress(ctx, 'select', EMPTY_SPOT, false)?.gesture).toBeInstanceOf(BandGesture);
    expect(gestureForPress(ctx, 'mat', EMPTY_SPOT, false)?.gesture).toBeInstanceOf(DrawMatGesture);
    expect(gestureForPress(ctx, 'senseAmpStrip', EMPTY_SPOT, false)?.gesture).toBeInstanceOf(
      PlaceStripGesture,
    );
    expect(gestureForPress(ctx, 'pan', EMPTY_SPOT, false)).toBeNull();
  });
});

describe('committing a finished gesture', () => {
  const call = commandCall(duplicateBlocks, { ids: ['mat-r0c0'], dx: 0, dy: -1e-3 });

  it('runs the command as one undo step, selects what it added; undo and redo restore both states', () => {
    const app = createAppStore(demoDesign());
    const before = app.getState().history.present;
    commitGesture(app, { call, select: 'added' }, undefined);
    const after = app.getState().history.present;
    expect(after.blocks).toHaveLength(before.blocks.length + 1);
    expect(app.getState().selectedIds).toEqual(['mat-r0c0-2']);
    app.getState().undo();
    expect(app.getState().history.present).toBe(before);
    app.getState().redo();
    expect(app.getState().history.present).toBe(after);
  });

  it('a click selects what the press asked for; a result with no command changes no document', () => {
    const app = createAppStore(demoDesign());
    const before = app.getState().history.present;
    commitGesture(app, { call: null }, ['mat-r0c1']);
    expect(app.getState().selectedIds).toEqual(['mat-r0c1']);
    commitGesture(app, { call: null, select: ['mat-r0c0'] }, undefined);
    expect(app.getState().selectedIds).toEqual(['mat-r0c0']);
    expect(app.getState().history.present).toBe(before);
    expect(app.getState().history.past).toHaveLength(0);
  });
});
