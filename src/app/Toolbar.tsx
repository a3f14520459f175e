import { useAppStore } from '../store/useAppStore';
import { CommandButton } from './CommandButton';
import { DocumentMenu } from './DocumentMenu';
import { FileMenu } from './FileMenu';
import { StorageStatus } from './StorageStatus';
import { ThemeChoice } from './ThemeChoice';

/**
 * Top bar: design name, the file menu, undo and redo (Fit lives in the canvas bar, its one place). Their keys are the editor commands'
 * (editorCommands.ts), caught by the app's one key listener (useEditorShortcuts.ts).
 */
export function Toolbar() {
  const name = useAppStore((s) => s.history.present.name);
  return (
    <header className="toolbar">
      <h1 className="brand">Matloom</h1>
      <span className="design-name" data-testid="design-name" title={name}>
        {name}
      </span>
      <StorageStatus />
      <DocumentMenu />
      <FileMenu />
      <div className="actions">
        <ThemeChoice />
        <CommandButton id="edit.undo" testId="undo" />
        <CommandButton id="edit.redo" testId="redo" />
      </div>
    </header>
  );
}
