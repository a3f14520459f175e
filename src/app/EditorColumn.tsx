import { FloorplanCanvas } from '../canvas/FloorplanCanvas';
import { BlockOutline } from '../panels/outline/BlockOutline';
import { SelectionAnnouncer } from './a11y/SelectionAnnouncer';
import { lazy, Suspense, useEffect } from 'react';
import { afterFirstPaint } from '../panels/afterFirstPaint';
import { useEditorStore } from '../store/editorStore';
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

// The block menu opens on a right-click or its keys: its code is fetched after the first paint.
const DeferredBlockMenu = afterFirstPaint(() => import('./BlockMenu').then((m) => m.BlockMenu));
const NO_PROPS = {};

function BlockMenuWhenOpen() {
  const open = useEditorStore((s) => s.contextMenu !== null);
  useEffect(() => DeferredBlockMenu.preload(), []);
  return open ? <DeferredBlockMenu.Render props={NO_PROPS} fallback={null} /> : null;
}

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
      <BlockMenuWhenOpen />
      <Dialogs />
    </div>
  );
}
