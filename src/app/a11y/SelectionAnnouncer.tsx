import { useAppStore } from '../../store/useAppStore';
import { selectionText } from './selectionText';

export const SELECTION_ANNOUNCER_ID = 'selection-announcer';

/** A polite live region that tells a screen reader what is selected, whichever way it was selected. */
export function SelectionAnnouncer() {
  const design = useAppStore((s) => s.history.present);
  const ids = useAppStore((s) => s.selectedIds);
  return (
    <div
      id={SELECTION_ANNOUNCER_ID}
      className="sr-only"
      role="status"
      aria-live="polite"
      data-testid="selection-announcer"
    >
      {selectionText(design, ids)}
    </div>
  );
}
