import { FloorplanCanvas } from '../canvas/FloorplanCanvas';
import { ShortcutHelp } from './ShortcutHelp';
import { StatusBar } from './StatusBar';
import { StepRepeatDialog } from './StepRepeatDialog';
import { ToolOptionsBar } from './ToolOptionsBar';
import { ToolPalette } from './ToolPalette';
import { useEditorShortcuts } from './useEditorShortcuts';
import './editor.css';

/** The floorplan editor: tool palette, tool options, the canvas and a status bar, plus its dialogs. */
export function EditorColumn() {
  useEditorShortcuts();
  return (
    <div className="editor-column">
      <ToolPalette />
      <ToolOptionsBar />
      <FloorplanCanvas />
      <StatusBar />
      <ShortcutHelp />
      <StepRepeatDialog />
    </div>
  );
}
