import type { ActionId } from '../commands/editorCommands';
import { useCommand } from './useCommand';

interface CommandButtonProps {
  readonly id: ActionId;
  readonly testId?: string;
  /** Button text when it differs from the command's label (a short word in a crowded bar). */
  readonly text?: string;
  readonly pressed?: boolean;
}

/** A button that runs an editor command, with its tooltip (what it does and its key) and enabled state. */
export function CommandButton({ id, testId, text, pressed }: CommandButtonProps) {
  const command = useCommand(id);
  return (
    <button
      type="button"
      onClick={command.run}
      disabled={!command.enabled}
      title={command.title}
      aria-pressed={pressed}
      data-testid={testId}
    >
      {text ?? command.label}
    </button>
  );
}
