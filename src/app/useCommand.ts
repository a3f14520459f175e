import { useAppStore } from '../store/useAppStore';
import type { AppState } from '../store/appStore';
import { editorActions } from './actions';
import {
  commandEnabled,
  commandTitle,
  editorCommand,
  type ActionId,
  type CommandState,
  type EditorCommand,
} from '../commands/editorCommands';

/** What the editor commands' enabled() rules read from the app state. */
export function commandStateOf(s: AppState): CommandState {
  return {
    selectionCount: s.selectedIds.length,
    canUndo: s.history.past.length > 0,
    canRedo: s.history.future.length > 0,
  };
}

/** A command for a button: its label, its tooltip (what it does and its key), whether it is enabled, and run. */
export function useCommand(id: ActionId): {
  readonly command: EditorCommand;
  readonly label: string;
  readonly title: string;
  readonly enabled: boolean;
  readonly run: () => void;
} {
  const command = editorCommand(id);
  const enabled = useAppStore((s) => commandEnabled(command, commandStateOf(s)));
  return {
    command,
    label: command.label,
    title: commandTitle(command),
    enabled,
    run: () => editorActions.perform(id),
  };
}
