import { useRef, useState } from 'react';
import { MAX_REPEAT } from '../commands/stepAndRepeat';
import { formatQuantity } from '../model/units';
import { QuantityField } from '../panels/QuantityField';
import { useEditorStore } from '../store/editorStore';
import { useAppStore } from '../store/useAppStore';
import { ModalDialog } from './a11y/ModalDialog';
import { editorActions } from './actions';

/** The form inside the dialog; mounted fresh on each opening so its defaults follow the selection. */
function StepRepeatForm({ close }: { close(): void }) {
  const box = editorActions.selectionBox();
  const pitches = editorActions.selectionPitches();
  const canShare = !!pitches && (pitches.sharesX || pitches.sharesY);
  const selectedCount = useAppStore((s) => s.selectedIds.length);
  const [columns, setColumns] = useState(2);
  const [rows, setRows] = useState(1);
  const [shareStrips, setShareStrips] = useState(canShare);
  const start = canShare ? pitches?.sharing : pitches?.abutting;
  const [pitchX, setPitchX] = useState(start?.x ?? 0);
  const [pitchY, setPitchY] = useState(start?.y ?? 0);
  const [error, setError] = useState<string | null>(null);
  // Enter in a field commits it and submits the form in the same event, before React re-renders, so
  // the values also live in a ref that the submit reads.
  const values = useRef({ columns, rows, pitchX, pitchY, shareStrips });
  const chooseSharing = (share: boolean) => {
    const pitch = share ? pitches?.sharing : pitches?.abutting;
    values.current = { ...values.current, shareStrips: share, pitchX: pitch?.x ?? 0, pitchY: pitch?.y ?? 0 };
    setShareStrips(share);
    setPitchX(pitch?.x ?? 0);
    setPitchY(pitch?.y ?? 0);
  };
  const count = (label: string, key: 'columns' | 'rows', set: (n: number) => void) => (n: number) => {
    if (!Number.isInteger(n) || n < 1 || n > MAX_REPEAT)
      return `${label} must be a whole number from 1 to ${MAX_REPEAT}`;
    values.current = { ...values.current, [key]: n };
    set(n);
    return null;
  };
  const length = (key: 'pitchX' | 'pitchY', set: (v: number) => void) => (v: number) => {
    values.current = { ...values.current, [key]: v };
    set(v);
    return null;
  };
  const apply = () => {
    if (editorActions.stepAndRepeat(values.current)) close();
    else setError(useAppStore.getState().lastError);
  };
  return (
    <form
      onSubmit={(e) => {
        e.preventDefault();
        apply();
      }}
    >
      <p className="hint">
        {selectedCount} selected block{selectedCount === 1 ? '' : 's'}
        {box ? `, ${formatQuantity(box.width, 'length')} × ${formatQuantity(box.height, 'length')}` : ''}.
      </p>
      {canShare && (
        <label className="check-field">
          <input
            type="checkbox"
            data-testid="repeat-share"
            checked={shareStrips}
            onChange={(e) => chooseSharing(e.target.checked)}
          />{' '}
          Neighbours share edge strips (one sense-amplifier strip between two mat rows, one driver strip
          between two columns)
        </label>
      )}
      <p className="hint">
        {shareStrips
          ? 'The pitch lays each copy’s edge strip on its neighbour’s, which is kept once.'
          : 'The pitch makes the copies abut, each with its own strips.'}
      </p>
      <QuantityField
        id="repeat-columns"
        label="Columns (across)"
        quantity="count"
        value={columns}
        onCommit={count('columns', 'columns', setColumns)}
      />
      <QuantityField
        id="repeat-rows"
        label="Rows (down)"
        quantity="count"
        value={rows}
        onCommit={count('rows', 'rows', setRows)}
      />
      <QuantityField
        id="repeat-pitch-x"
        label="Pitch across"
        quantity="length"
        value={pitchX}
        onCommit={length('pitchX', setPitchX)}
      />
      <QuantityField
        id="repeat-pitch-y"
        label="Pitch down"
        quantity="length"
        value={pitchY}
        onCommit={length('pitchY', setPitchY)}
      />
      <p className="hint" data-testid="repeat-summary">
        {formatQuantity(columns * rows, 'count')} copies of the selection in all (
        {formatQuantity(selectedCount * (columns * rows - 1), 'count')} new blocks).
      </p>
      {error && (
        <p className="field-error" role="alert">
          {error}
        </p>
      )}
      <div className="dialog-buttons">
        <button type="button" onClick={close} title="Close without repeating (Esc)">
          Cancel
        </button>
        <button type="submit" data-testid="repeat-apply" title="Make the copies (one undo step)">
          Repeat
        </button>
      </div>
    </form>
  );
}

/** Step and repeat: n × m copies of the selection at a pitch, as one undo step. */
export function StepRepeatDialog() {
  const open = useEditorStore((s) => s.stepRepeatOpen);
  const setOpen = useEditorStore((s) => s.setStepRepeatOpen);
  if (!open) return null;
  const close = () => setOpen(false);
  return (
    <ModalDialog titleId="step-repeat-title" testId="step-repeat" onClose={close}>
      <h2 id="step-repeat-title">Step and repeat</h2>
      <StepRepeatForm close={close} />
    </ModalDialog>
  );
}
