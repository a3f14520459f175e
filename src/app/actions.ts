import { activeCanvas } from '../canvas/canvasBridge';
import { useEditorStore } from '../store/editorStore';
import { useAppStore } from '../store/useAppStore';
import { createEditorActions } from './editorActions';

/** The app's editor actions, bound to its stores and its canvas. */
export const editorActions = createEditorActions(useAppStore, useEditorStore, activeCanvas);
