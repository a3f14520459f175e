import { describe, expect, it } from 'vitest';
import { actionForKey, SHORTCUTS, toolKey, type ActionId } from '../../src/app/keymap';
import { TOOLS } from '../../src/store/editorStore';

const key = (
  k: string,
  mods: Partial<{ ctrl: boolean; shift: boolean; alt: boolean; meta: boolean }> = {},
) => ({
  key: k,
  ctrlKey: mods.ctrl ?? false,
  metaKey: mods.meta ?? false,
  shiftKey: mods.shift ?? false,
  altKey: mods.alt ?? false,
});

describe('keyboard shortcuts', () => {
  it.each([
    [key('1'), 'tool.select'],
    [key('3'), 'tool.mat'],
    [key('8'), 'tool.spacer'],
    [key('9'), null],
    [key('r'), 'edit.rotate'],
    [key('m'), 'edit.mirrorLeftRight'],
    [key('M', { shift: true }), 'edit.mirrorTopBottom'],
    [key('Delete'), 'edit.delete'],
    [key('Backspace'), 'edit.delete'],
    [key('d', { ctrl: true }), 'edit.duplicate'],
    [key('D', { meta: true, shift: true }), 'edit.duplicate'],
    [key('c', { ctrl: true }), 'edit.copy'],
    [key('v', { ctrl: true }), 'edit.paste'],
    [key('a', { ctrl: true }), 'edit.selectAll'],
    [key('ArrowLeft'), 'edit.nudgeLeft'],
    [key('ArrowDown', { shift: true }), 'edit.nudgeDown'],
    [key('t'), 'edit.stepAndRepeat'],
    [key('z'), 'view.frameSelection'],
    [key('g'), 'view.grid'],
    [key('?', { shift: true }), 'help'],
    [key('Escape'), 'escape'],
    [key('='), 'view.zoomIn'],
    [key('-'), 'view.zoomOut'],
    // Left to the toolbar's own handler: undo, redo, zoom to fit.
    [key('z', { ctrl: true }), null],
    [key('y', { ctrl: true }), null],
    [key('f'), null],
    // Alt combinations belong to the browser.
    [key('r', { alt: true }), null],
  ] as const)('%j → %s', (input, action) => {
    expect(actionForKey(input)).toBe(action);
  });

  it('every tool has a number key in palette order, and every listed action is reachable or the toolbar’s', () => {
    expect(TOOLS.map(toolKey)).toEqual(['1', '2', '3', '4', '5', '6', '7', '8']);
    const listed = new Set(SHORTCUTS.map((s) => s.action));
    for (const tool of TOOLS) expect(listed.has(`tool.${tool}` as ActionId)).toBe(true);
    for (const s of SHORTCUTS.filter((x) => x.handledByToolbar)) {
      expect(['edit.undo', 'edit.redo', 'view.fitAll']).toContain(s.action);
    }
  });
});
