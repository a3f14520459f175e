import { useEditorStore } from '../store/editorStore';
import { ModalDialog } from './a11y/ModalDialog';
import { SHORTCUTS } from '../commands/keymap';

const GROUPS = ['File', 'Tools', 'Edit', 'View'] as const;

/** Every keyboard shortcut, opened with "?" and closed with Escape or the button. */
export function ShortcutHelp() {
  const open = useEditorStore((s) => s.helpOpen);
  const setOpen = useEditorStore((s) => s.setHelpOpen);
  if (!open) return null;
  return (
    <ModalDialog
      className="shortcut-help"
      titleId="shortcut-help-title"
      testId="shortcut-help"
      onClose={() => setOpen(false)}
    >
      <h2 id="shortcut-help-title">Keyboard shortcuts</h2>
      <div className="shortcut-groups">
        {GROUPS.map((group) => (
          <section key={group}>
            <h3>{group}</h3>
            <table>
              <tbody>
                {SHORTCUTS.filter((s) => s.group === group).map((s) => (
                  <tr key={s.action}>
                    <td>
                      <kbd>{s.keys}</kbd>
                    </td>
                    <td>{s.description}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </section>
        ))}
      </div>
      <button type="button" onClick={() => setOpen(false)} data-testid="close-help" title="Close (Esc)">
        Close
      </button>
    </ModalDialog>
  );
}
