import { describe, expect, it } from 'vitest';
import { actionForKey, SHORTCUTS, toolKey, type ActionId } from '../../src/commands/keymap';
import { commandTitle, COMMANDS, editorCommand } from '../../src/commands/editorCommands';
import { chordLabel } from '../../src/commands/keyChord';
import { TOOLS } from '../../src/commands/tools';

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
    // One listener for every command, the toolbar's too.
    [key('z', { ctrl: true }), 'edit.undo'],
    [key('Z', { meta: true, shift: true }), 'edit.redo'],
    [key('y', { ctrl: true }), 'edit.redo'],
    [key('f'), 'view.fitAll'],
    [key('F', { shift: true }), 'view.fitAll'],
    // A key without Ctrl is not the Ctrl command, nor the other way round.
    [key('r', { ctrl: true }), null],
    [key('Escape', { ctrl: true }), null],
    // Alt combinations belong to the browser.
    [key('r', { alt: true }), null],
  ] as const)('%j → %s', (input, action) => {
    expect(actionForKey(input)).toBe(action);
  });

  it('every tool has a number key in palette order, and every listed action is reachable', () => {
    expect(TOOLS.map(toolKey)).toEqual(['1', '2', '3', '4', '5', '6', '7', '8']);
    const listed = new Set(SHORTCUTS.map((s) => s.action));
    for (const tool of TOOLS) expect(listed.has(`tool.${tool}` as ActionId)).toBe(true);
  });

  it('no two commands share a chord, and every chord reaches its own command', () => {
    const seen = new Map<string, string>();
    for (const command of COMMANDS) {
      for (const chord of command.keys) {
        const label = chordLabel(chord) + (chord.shift === undefined ? ' (any shift)' : '');
        expect(seen.get(label), label).toBeUndefined();
        seen.set(label, command.id);
        const input = key(chord.key, { ctrl: chord.mod ?? false, shift: chord.shift ?? false });
        expect(actionForKey(input), label).toBe(command.id);
      }
    }
  });

  it('the help lists each row’s keys as the commands declare them', () => {
    const row = (action: ActionId) => SHORTCUTS.find((s) => s.action === action)?.keys;
    expect(row('edit.undo')).toBe('Ctrl+Z');
    expect(row('edit.redo')).toBe('Ctrl+Shift+Z / Ctrl+Y');
    expect(row('edit.delete')).toBe('Delete / Backspace');
    expect(row('edit.mirrorTopBottom')).toBe('Shift+M');
    expect(row('escape')).toBe('Esc');
    expect(row('view.zoomIn')).toBe('+ / −');
    expect(SHORTCUTS.some((s) => s.action === 'view.zoomOut')).toBe(false);
    expect(commandTitle(editorCommand('view.fitAll'))).toBe('Fit: show the whole floorplan (F)');
  });
});
