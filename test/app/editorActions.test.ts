import { describe, expect, it } from 'vitest';
import { clipboardText, createEditorActions } from '../../src/app/editorActions';
import { blockRect } from '../../src/geometry/placedBlocks';
import { restoreDesign } from '../../src/io/restore';
import { demoDesign } from '../../src/designs/demoDesign';
import { createAppStore } from '../../src/store/appStore';
import { createEditorStore } from '../../src/store/editorStore';

function setup() {
  const app = createAppStore(demoDesign());
  const editor = createEditorStore();
  return { app, editor, actions: createEditorActions(app, editor, () => null) };
}

const blockX = (app: ReturnType<typeof createAppStore>, id: string) =>
  app.getState().history.present.blocks.find((b) => b.id === id)?.x ?? NaN;

describe('editor actions', () => {
  it('nudges the selection by one line pitch, ten with Shift, each press one undo step', () => {
    const { app, actions } = setup();
    const x0 = blockX(app, 'mat-r0c0');
    app.getState().select(['mat-r0c0']);
    actions.perform('edit.nudgeRight');
    // Folded 8F² with vertical bit lines: bit-line pitch 2F = 36 nm (common practice, F = 18 nm).
    expect(blockX(app, 'mat-r0c0') - x0).toBeCloseTo(36e-9, 15);
    actions.perform('edit.nudgeLeft', true);
    expect(blockX(app, 'mat-r0c0') - x0).toBeCloseTo(-324e-9, 15);
    expect(app.getState().history.past).toHaveLength(2);
  });

  it('duplicates beside the selection and selects the copies', () => {
    const { app, actions } = setup();
    app.getState().select(['mat-r0c0']);
    actions.perform('edit.duplicate');
    const d = app.getState().history.present;
    expect(app.getState().selectedIds).toEqual(['mat-r0c0-2']);
    const original = d.blocks.find((b) => b.id === 'mat-r0c0');
    const copy = d.blocks.find((b) => b.id === 'mat-r0c0-2');
    if (!original || !copy) throw new Error('missing blocks');
    expect(copy.x).toBeCloseTo(original.x + blockRect(d, original).width, 15);
  });

  it('copies as a design file that restores, and pastes at the pointer on the cell grid', async () => {
    const { app, editor, actions } = setup();
    app.getState().select(['mat-r1c1', 'sa-r1c1']);
    const text = actions.copy();
    expect(text).not.toBeNull();
    const restored = restoreDesign(text ?? '');
    expect(restored.ok && restored.design.blocks.map((b) => b.id)).toEqual(['mat-r1c1', 'sa-r1c1']);
    editor.getState().setPointer({ x: 300e-6, y: 10e-6 });
    expect(await actions.paste()).toBe(true);
    expect(app.getState().selectedIds).toEqual(['mat-r1c1-2', 'sa-r1c1-2']);
    // The clip's top-left (the strip above the mat) lands on the pointer, rounded to the 36 nm pitch.
    const strip = app.getState().history.present.blocks.find((b) => b.id === 'sa-r1c1-2');
    expect(Math.abs((strip?.x ?? 0) - 300e-6)).toBeLessThan(36e-9);
    expect(await actions.paste('not a design')).toBe(false);
    expect(clipboardText(app.getState().history.present, [])).toBeNull();
  });

  it('cut copies then deletes; select all; escape steps back tool, then selection', () => {
    const { app, editor, actions } = setup();
    actions.perform('edit.selectAll');
    expect(app.getState().selectedIds).toHaveLength(58);
    app.getState().select(['mat-r3c3']);
    actions.perform('edit.cut');
    expect(app.getState().history.present.blocks).toHaveLength(57);
    expect(editor.getState().clipboard).toContain('mat-r3c3');
    editor.getState().setTool('mat');
    app.getState().select(['mat-r0c0']);
    actions.perform('escape');
    expect(editor.getState().tool).toBe('select');
    actions.perform('escape');
    expect(app.getState().selectedIds).toEqual([]);
  });

  it('with nothing selected, editing keys do nothing and report no error', () => {
    const { app, actions } = setup();
    for (const action of [
      'edit.delete',
      'edit.rotate',
      'edit.mirrorLeftRight',
      'edit.duplicate',
      'edit.nudgeUp',
    ] as const) {
      actions.perform(action);
    }
    expect(app.getState().lastError).toBeNull();
    expect(app.getState().history.past).toHaveLength(0);
  });

  it('rotates, mirrors and steps-and-repeats the selection through their commands', () => {
    const { app, editor, actions } = setup();
    app.getState().select(['mat-r0c0']);
    actions.perform('edit.rotate');
    actions.perform('edit.mirrorTopBottom');
    const m = app.getState().history.present.blocks.find((b) => b.id === 'mat-r0c0');
    expect(m?.type === 'mat' && [m.bitlineAxis, m.mirrored]).toEqual(['horizontal', true]);
    actions.perform('edit.stepAndRepeat');
    expect(editor.getState().stepRepeatOpen).toBe(true);
    expect(actions.stepAndRepeat({ columns: 2, rows: 2, pitchX: 1e-4, pitchY: 1e-4 })).toBe(true);
    expect(app.getState().selectedIds).toHaveLength(4);
    expect(app.getState().history.past).toHaveLength(3);
  });
});
