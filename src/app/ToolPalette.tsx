import { TOOLS, useEditorStore } from '../store/editorStore';
import { SHORTCUTS, toolKey } from './keymap';
import { ToolIcon } from './ToolIcon';

const TOOL_TITLE = Object.fromEntries(
  SHORTCUTS.filter((s) => s.group === 'Tools').map((s) => [s.action, s.description]),
);

/** The tool palette down the left of the canvas; each tool shows its number key. */
export function ToolPalette() {
  const tool = useEditorStore((s) => s.tool);
  const setTool = useEditorStore((s) => s.setTool);
  const setHelpOpen = useEditorStore((s) => s.setHelpOpen);
  return (
    <nav className="tool-palette" aria-label="Tools">
      {TOOLS.map((t) => (
        <button
          key={t}
          type="button"
          className="tool-button"
          data-testid={`tool-${t}`}
          aria-pressed={tool === t}
          title={`${TOOL_TITLE[`tool.${t}`] ?? t} (${toolKey(t)})`}
          aria-label={`${TOOL_TITLE[`tool.${t}`] ?? t} (${toolKey(t)})`}
          onClick={() => setTool(t)}
        >
          <ToolIcon tool={t} />
          <kbd>{toolKey(t)}</kbd>
        </button>
      ))}
      <button
        type="button"
        className="tool-button help-button"
        data-testid="open-help"
        title="Keyboard shortcuts (?)"
        aria-label="Keyboard shortcuts (?)"
        onClick={() => setHelpOpen(true)}
      >
        ?
      </button>
    </nav>
  );
}
