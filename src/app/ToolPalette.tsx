import { TOOLS, toolKey } from '../commands/tools';
import { useEditorStore } from '../store/editorStore';
import { commandTitle, editorCommand, keysText } from '../commands/editorCommands';
import { ToolIcon } from './ToolIcon';

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
          title={commandTitle(editorCommand(`tool.${t}`))}
          aria-label={commandTitle(editorCommand(`tool.${t}`))}
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
        title={`${editorCommand('help').label} (${keysText(editorCommand('help'))})`}
        aria-label={`${editorCommand('help').label} (${keysText(editorCommand('help'))})`}
        onClick={() => setHelpOpen(true)}
      >
        ?
      </button>
    </nav>
  );
}
