import { FloorplanCanvas } from '../canvas/FloorplanCanvas';
import { BlockOutline } from '../panels/outline/BlockOutline';
import { SelectionAnnouncer } from './a11y/SelectionAnnouncer';
import { ShortcutHelp } from './ShortcutHelp';
import { StatusBar } from './StatusBar';
import { StepRepeatDialog } from './StepRepeatDialog';
import { ToolOptionsBar } from './ToolOptionsBar';
import { ToolPalette } from './ToolPalette';
import { useEditorShortcuts } from './useEditorShortcuts';
import './editor.css';

/** The floorplan editor: tool palette, block list, tool options, the canvas and a status bar, plus its dialogs. */
export function EditorColumn() {
  useEditorShortcuts();
  return (
    <div className="editor-column">
      <ToolPalette />
      <BlockOutline />
      <ToolOptionsBar />
      <FloorplanCanvas />
      <StatusBar />
      <SelectionAnnouncer />
      <ShortcutHelp />
      <StepRepeatDialog />
    </div>
  );
}
