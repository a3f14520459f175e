import { TOOLS, type Tool } from '../store/editorStore';

/** Everything the keyboard can do in the editor. */
export type ActionId =
  | `tool.${Tool}`
  | 'edit.undo'
  | 'edit.redo'
  | 'edit.delete'
  | 'edit.duplicate'
  | 'edit.copy'
  | 'edit.cut'
  | 'edit.paste'
  | 'edit.selectAll'
  | 'edit.rotate'
  | 'edit.mirrorLeftRight'
  | 'edit.mirrorTopBottom'
  | 'edit.stepAndRepeat'
  | 'edit.nudgeLeft'
  | 'edit.nudgeRight'
  | 'edit.nudgeUp'
  | 'edit.nudgeDown'
  | 'view.fitAll'
  | 'view.frameSelection'
  | 'view.zoomIn'
  | 'view.zoomOut'
  | 'view.grid'
  | 'view.pan'
  | 'help'
  | 'escape';

export interface Shortcut {
  readonly action: ActionId;
  /** As shown in the help overlay and in tooltips. */
  readonly keys: string;
  readonly description: string;
  readonly group: 'Tools' | 'Edit' | 'View';
  /** Handled by the top toolbar's own key handler; listed here for the help overlay only. */
  readonly handledByToolbar?: boolean;
}

const TOOL_NAMES: Record<Tool, string> = {
  select: 'Select, move and resize',
  pan: 'Pan the view',
  mat: 'Draw a mat (drag; snaps to whole cells)',
  senseAmpStrip: 'Place a sense-amplifier strip (fits a bit-line edge)',
  wordlineDriverStrip: 'Place a sub-word-line driver strip (fits a word-line edge)',
  rowDecoder: 'Place a row decoder',
  columnDecoder: 'Place a column decoder',
  spacer: 'Place a spacer',
};

/** Number key of each tool: its place in the palette. */
export function toolKey(tool: Tool): string {
  return String(TOOLS.indexOf(tool) + 1);
}

export const SHORTCUTS: readonly Shortcut[] = [
  ...TOOLS.map((tool): Shortcut => ({
    action: `tool.${tool}`,
    keys: toolKey(tool),
    description: TOOL_NAMES[tool],
    group: 'Tools',
  })),
  {
    action: 'view.pan',
    keys: 'Space + drag',
    description: 'Pan with any tool (or drag with the middle button)',
    group: 'Tools',
  },
  {
    action: 'escape',
    keys: 'Esc',
    description: 'Cancel the drag in progress; else back to Select; else clear the selection',
    group: 'Tools',
  },
  { action: 'edit.undo', keys: 'Ctrl+Z', description: 'Undo', group: 'Edit', handledByToolbar: true },
  {
    action: 'edit.redo',
    keys: 'Ctrl+Shift+Z / Ctrl+Y',
    description: 'Redo',
    group: 'Edit',
    handledByToolbar: true,
  },
  { action: 'edit.delete', keys: 'Delete / Backspace', description: 'Delete the selection', group: 'Edit' },
  {
    action: 'edit.duplicate',
    keys: 'Ctrl+D',
    description: 'Duplicate, abutting on the right',
    group: 'Edit',
  },
  { action: 'edit.copy', keys: 'Ctrl+C', description: 'Copy', group: 'Edit' },
  { action: 'edit.cut', keys: 'Ctrl+X', description: 'Cut', group: 'Edit' },
  { action: 'edit.paste', keys: 'Ctrl+V', description: 'Paste at the pointer', group: 'Edit' },
  { action: 'edit.selectAll', keys: 'Ctrl+A', description: 'Select everything', group: 'Edit' },
  { action: 'edit.rotate', keys: 'R', description: 'Rotate 90° clockwise', group: 'Edit' },
  { action: 'edit.mirrorLeftRight', keys: 'M', description: 'Mirror left–right', group: 'Edit' },
  { action: 'edit.mirrorTopBottom', keys: 'Shift+M', description: 'Mirror top–bottom', group: 'Edit' },
  {
    action: 'edit.stepAndRepeat',
    keys: 'T',
    description: 'Step and repeat (n × m at a pitch)…',
    group: 'Edit',
  },
  {
    action: 'edit.nudgeLeft',
    keys: '← → ↑ ↓',
    description: 'Nudge by one cell pitch (Shift: ten)',
    group: 'Edit',
  },
  {
    action: 'view.fitAll',
    keys: 'F',
    description: 'Zoom to fit the whole floorplan',
    group: 'View',
    handledByToolbar: true,
  },
  { action: 'view.frameSelection', keys: 'Z', description: 'Zoom to the selection', group: 'View' },
  {
    action: 'view.zoomIn',
    keys: '+ / −',
    description: 'Zoom in / out (or the mouse wheel, around the pointer)',
    group: 'View',
  },
  { action: 'view.grid', keys: 'G', description: 'Show or hide the grid', group: 'View' },
  { action: 'help', keys: '?', description: 'Show or hide this list', group: 'View' },
];

/** The parts of a key event the keymap reads. */
export interface KeyInput {
  readonly key: string;
  readonly ctrlKey: boolean;
  readonly metaKey: boolean;
  readonly shiftKey: boolean;
  readonly altKey: boolean;
}

const ARROWS: Record<string, ActionId> = {
  ArrowLeft: 'edit.nudgeLeft',
  ArrowRight: 'edit.nudgeRight',
  ArrowUp: 'edit.nudgeUp',
  ArrowDown: 'edit.nudgeDown',
};

/**
 * The action a key press asks for, or null. Undo, redo and zoom-to-fit are left to the top toolbar's
 * own handler, so they are never returned here.
 */
export function actionForKey(e: KeyInput): ActionId | null {
  if (e.altKey) return null;
  const mod = e.ctrlKey || e.metaKey;
  const key = e.key;
  if (mod) {
    switch (key.toLowerCase()) {
      case 'd':
        return 'edit.duplicate';
      case 'c':
        return 'edit.copy';
      case 'x':
        return 'edit.cut';
      case 'v':
        return 'edit.paste';
      case 'a':
        return 'edit.selectAll';
      default:
        return null;
    }
  }
  const arrow = ARROWS[key];
  if (arrow) return arrow;
  const tool = TOOLS[Number(key) - 1];
  if (/^[1-9]$/.test(key) && tool) return `tool.${tool}`;
  switch (key) {
    case 'Escape':
      return 'escape';
    case 'Delete':
    case 'Backspace':
      return 'edit.delete';
    case 'r':
    case 'R':
      return 'edit.rotate';
    case 'm':
      return 'edit.mirrorLeftRight';
    case 'M':
      return 'edit.mirrorTopBottom';
    case 't':
    case 'T':
      return 'edit.stepAndRepeat';
    case 'z':
    case 'Z':
      return 'view.frameSelection';
    case '+':
    case '=':
      return 'view.zoomIn';
    case '-':
    case '_':
      return 'view.zoomOut';
    case 'g':
    case 'G':
      return 'view.grid';
    case '?':
      return 'help';
    default:
      return null;
  }
}
