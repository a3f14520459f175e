import { FloorplanCanvas } from '../canvas/FloorplanCanvas';
import { BlockOutline } from '../panels/outline/BlockOutline';
import { SelectionAnnouncer } from './a11y/SelectionAnnouncer';
import { lazy, Suspense } from 'react';
import { useEditorStore } from '../store/editorStore';
import { BlockMenu } from './BlockMenu';
import { StatusBar } from './StatusBar';
import { ToolOptionsBar } from './ToolOptionsBar';
import { ToolPalette } from './ToolPalette';
import { useEditorShortcuts } from './useEditorShortcuts';
import './editor.css';

// The dialogs load the first time they open: they are not part of the first load.
const ShortcutHelp = lazy(() => import('./ShortcutHelp').then((m) => ({ default: m.ShortcutHelp })));
const StepRepeatDialog = lazy(() =>
  import('./StepRepeatDialog').then((m) => ({ default: m.StepRepeatDialog })),
);

function Dialogs() {
  const help = useEditorStore((s) => s.helpOpen);
  const stepRepeat = useEditorStore((s) => s.stepRepeatOpen);
  return (
    <Suspense fallback={null}>
      {help && <ShortcutHelp />}
      {stepRepeat && <StepRepeatDialog />}
    </Suspense>
  );
}

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
      <BlockMenu />
      <Dialogs />
    </div>
  );
}
