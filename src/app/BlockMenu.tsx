import { useEffect, useRef, type KeyboardEvent } from 'react';
import { useEditorStore } from '../store/editorStore';
import { useAppStore } from '../store/useAppStore';
import { OWN_KEYS_ATTRIBUTE } from './a11y/keyOwnership';
import { editorActions } from './actions';
import {
  commandEnabled,
  editorCommand,
  keysText,
  type ActionId,
  type CommandState,
} from '../commands/editorCommands';

/** The commands the block menu offers, in order; each is the editor command of the same id. */
const MENU_COMMANDS: readonly ActionId[] = [
  'edit.duplicate',
  'edit.copy',
  'edit.cut',
  'edit.rotate',
  'edit.mirrorLeftRight',
  'edit.mirrorTopBottom',
  'edit.stepAndRepeat',
  'view.frameSelection',
  'edit.delete',
];

/** Room kept between the menu and the window's edges (px), and the menu's size for placing it. */
const EDGE = 8;
const MENU_WIDTH = 240;
const MENU_HEIGHT = 300;

/**
 * The block menu: opened by a right-click (or a long press) on a block, or by Shift+F10 or the menu key
 * for the selection. It offers the common editor commands with their keys. Up and Down move, Enter runs,
 * Escape or a click elsewhere closes it, and focus goes back to where it was.
 */
export function BlockMenu() {
  const menu = useEditorStore((s) => s.contextMenu);
  const selectionCount = useAppStore((s) => s.selectedIds.length);
  const canUndo = useAppStore((s) => s.history.past.length > 0);
  const canRedo = useAppStore((s) => s.history.future.length > 0);
  const state: CommandState = { selectionCount, canUndo, canRedo };
  const ref = useRef<HTMLDivElement>(null);
  const opener = useRef<HTMLElement | null>(null);
  const close = () => useEditorStore.getState().setContextMenu(null);

  useEffect(() => {
    if (!menu) return;
    opener.current = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    ref.current?.querySelector<HTMLElement>('[role="menuitem"]:not([aria-disabled="true"])')?.focus();
    const onPointer = (e: PointerEvent) => {
      if (!(e.target instanceof Node) || !ref.current?.contains(e.target)) close();
    };
    window.addEventListener('pointerdown', onPointer, true);
    return () => {
      window.removeEventListener('pointerdown', onPointer, true);
      const back = opener.current;
      if (back?.isConnected && back !== document.body) back.focus();
      else document.querySelector<HTMLElement>('[data-testid="floorplan"]')?.focus();
    };
  }, [menu]);

  if (!menu) return null;
  const canvas = document.querySelector('[data-testid="floorplan"]')?.getBoundingClientRect();
  const at = menu.at ?? {
    x: (canvas?.left ?? 0) + (canvas?.width ?? 0) / 2,
    y: (canvas?.top ?? 0) + (canvas?.height ?? 0) / 3,
  };
  const left = Math.max(EDGE, Math.min(at.x, window.innerWidth - MENU_WIDTH - EDGE));
  const top = Math.max(EDGE, Math.min(at.y, window.innerHeight - MENU_HEIGHT - EDGE));

  const run = (id: ActionId) => {
    close();
    editorActions.perform(id);
  };
  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    const items = [...(ref.current?.querySelectorAll<HTMLElement>('[role="menuitem"]') ?? [])];
    const at = items.indexOf(document.activeElement as HTMLElement);
    const focus = (i: number) => items[(i + items.length) % items.length]?.focus();
    if (e.key === 'ArrowDown') focus(at + 1);
    else if (e.key === 'ArrowUp') focus(at - 1);
    else if (e.key === 'Home') focus(0);
    else if (e.key === 'End') focus(items.length - 1);
    else if (e.key === 'Escape' || e.key === 'Tab') close();
    else return;
    e.preventDefault();
    e.stopPropagation();
  };

  return (
    <div
      ref={ref}
      className="block-menu"
      role="menu"
      aria-label="Block commands"
      data-testid="block-menu"
      style={{ left, top }}
      onKeyDown={onKeyDown}
      {...{ [OWN_KEYS_ATTRIBUTE]: '' }}
    >
      {MENU_COMMANDS.map((id) => {
        const command = editorCommand(id);
        const enabled = commandEnabled(command, state);
        return (
          <button
            key={id}
            type="button"
            role="menuitem"
            tabIndex={-1}
            aria-disabled={!enabled}
            title={command.description}
            data-testid={`menu-${id}`}
            onClick={() => enabled && run(id)}
          >
            <span>{command.label}</span>
            <kbd>{keysText(command)}</kbd>
          </button>
        );
      })}
    </div>
  );
}
