import { useEffect, useState } from 'react';
import type { AnchorCorner } from '../geometry/stretchMap';
import { useAppStore } from '../store/useAppStore';
import { afterFirstPaint } from './afterFirstPaint';
import type { CellNote } from './SelectionEditor';

// The editor of a selection loads after the first paint (nothing is selected when a design opens), so
// the first load does not carry it and the commands behind its fields.
const editor = afterFirstPaint(() => import('./SelectionEditor').then((m) => m.SelectionEditor));

/** The selected blocks' properties; the editor itself is SelectionEditor.tsx. */
export function PropertiesPanel() {
  const selected = useAppStore((s) => s.selectedIds.length > 0);
  // How a cell change resizes the mats: session choices, not part of the document, kept while the
  // selection changes.
  const [anchor, setAnchor] = useState<AnchorCorner>('topLeft');
  const [keepCounts, setKeepCounts] = useState(false);
  const [cellNote, setCellNote] = useState<CellNote | null>(null);
  // After the first paint: fetched before anyone can select anything.
  useEffect(() => editor.preload(), []);
  const choices = { anchor, setAnchor, keepCounts, setKeepCounts, cellNote, setCellNote };
  return (
    <section className="panel" aria-labelledby="properties-heading">
      <h2 id="properties-heading">Properties</h2>
      {selected ? (
        <editor.Render props={{ choices }} fallback={<p className="panel-loading">Loading…</p>} />
      ) : (
        <p className="hint">Nothing selected. Click a block, or drag on empty canvas.</p>
      )}
    </section>
  );
}
