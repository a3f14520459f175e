import { FoldButton } from '../../app/FoldButton';
import { useEffect, useRef, useState, type KeyboardEvent } from 'react';
import { OWN_KEYS_ATTRIBUTE } from '../../app/a11y/keyOwnership';
import { deleteBlocks } from '../../commands/deleteBlocks';
import { BLOCK_TYPE_LABEL } from '../../model/block';
import { useEditorStore } from '../../store/editorStore';
import { useAppStore } from '../../store/useAppStore';
import { useUiStore } from '../../store/uiStore';
import { afterFirstPaint } from '../afterFirstPaint';
import { formatWholeNumber } from '../../model/units';

// The add-block form comes with the code behind it after the first paint (the first load does not carry it).
const addBlockForm = afterFirstPaint(() => import('./AddBlockForm').then((m) => m.AddBlockForm));

/** Height of one row of the list (px); the list draws only the rows in view, so it must be fixed. */
const ROW_HEIGHT = 24;
/** Rows drawn beyond the visible ones, above and below. */
const OVERSCAN = 6;
/** Rows a Page Up or Page Down moves. */
const PAGE = 10;

const optionId = (index: number) => `outline-option-${index}`;

/**
 * The block list beside the canvas: every block with its type and name, in document order. Up and Down
 * (Home, End, Page Up, Page Down) move through it; Enter selects the block and frames it on the canvas;
 * Space adds it to the selection or takes it out; Delete deletes it (or the whole selection when it is
 * part of it). Only the rows in view are drawn, so a die of tens of thousands of blocks stays quick.
 */
export function BlockOutline() {
  const blocks = useAppStore((s) => s.history.present.blocks);
  const selectedIds = useAppStore((s) => s.selectedIds);
  const collapsed = useUiStore((s) => s.outlineCollapsed);
  const setCollapsed = useUiStore((s) => s.setOutlineCollapsed);
  const [cursor, setCursor] = useState(0);
  const [scrollTop, setScrollTop] = useState(0);
  const [viewHeight, setViewHeight] = useState(300);
  const list = useRef<HTMLDivElement>(null);
  const selected = new Set(selectedIds);
  const at = Math.min(cursor, Math.max(0, blocks.length - 1));

  // A selection made elsewhere (the canvas, select all) moves the cursor to it while the list is not in use.
  useEffect(() => {
    const last = selectedIds[selectedIds.length - 1];
    if (last === undefined || list.current === document.activeElement) return;
    const index = useAppStore.getState().history.present.blocks.findIndex((b) => b.id === last);
    if (index >= 0) setCursor(index);
  }, [selectedIds]);

  useEffect(() => {
    const element = list.current;
    if (!element) return;
    const observer = new ResizeObserver(([entry]) => {
      if (entry) setViewHeight(entry.contentRect.height);
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, [collapsed]);

  // Keep the cursor's row in view (and therefore drawn, so aria-activedescendant names a real element).
  useEffect(() => {
    const element = list.current;
    if (!element) return;
    const top = at * ROW_HEIGHT;
    if (top < element.scrollTop) element.scrollTop = top;
    else if (top + ROW_HEIGHT > element.scrollTop + element.clientHeight)
      element.scrollTop = top + ROW_HEIGHT - element.clientHeight;
  }, [at]);

  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    const last = blocks.length - 1;
    const move = (to: number) => {
      e.preventDefault();
      setCursor(Math.max(0, Math.min(last, to)));
    };
    const block = blocks[at];
    switch (e.key) {
      case 'ArrowDown':
        return move(at + 1);
      case 'ArrowUp':
        return move(at - 1);
      case 'Home':
        return move(0);
      case 'End':
        return move(last);
      case 'PageDown':
        return move(at + PAGE);
      case 'PageUp':
        return move(at - PAGE);
      case 'Enter':
        if (!block) return;
        e.preventDefault();
        useAppStore.getState().select([block.id]);
        useEditorStore.getState().requestFrame([block.id]);
        return;
      case ' ':
        if (!block) return;
        e.preventDefault();
        useAppStore
          .getState()
          .select(
            selected.has(block.id) ? selectedIds.filter((id) => id !== block.id) : [...selectedIds, block.id],
          );
        return;
      case 'Delete':
      case 'Backspace': {
        if (!block) return;
        e.preventDefault();
        const ids = selected.has(block.id) ? selectedIds : [block.id];
        useAppStore.getState().execute(deleteBlocks, { ids });
        return;
      }
      default:
        return;
    }
  };

  if (collapsed) {
    return (
      <section className="outline collapsed" aria-label="Block list (folded)">
        <FoldButton name="outline" what="the block list" folded symbol="☰" onToggle={setCollapsed} />
      </section>
    );
  }

  const first = Math.max(0, Math.floor(scrollTop / ROW_HEIGHT) - OVERSCAN);
  const end = Math.min(blocks.length, Math.ceil((scrollTop + viewHeight) / ROW_HEIGHT) + OVERSCAN);
  const rows = [];
  for (let i = first; i < end; i++) {
    const b = blocks[i];
    if (!b) continue;
    const isSelected = selected.has(b.id);
    rows.push(
      <div
        key={b.id}
        id={optionId(i)}
        role="option"
        aria-selected={isSelected}
        aria-posinset={i + 1}
        aria-setsize={blocks.length}
        className={`outline-row${i === at ? ' cursor' : ''}${isSelected ? ' selected' : ''}`}
        style={{ top: i * ROW_HEIGHT, height: ROW_HEIGHT }}
        data-testid={`outline-${b.id}`}
        onClick={(e) => {
          setCursor(i);
          const store = useAppStore.getState();
          if (e.shiftKey)
            store.select(isSelected ? selectedIds.filter((id) => id !== b.id) : [...selectedIds, b.id]);
          else store.select([b.id]);
        }}
        onDoubleClick={() => useEditorStore.getState().requestFrame([b.id])}
      >
        <span className="outline-name">{b.name || b.id}</span>
        <span className="outline-type">{BLOCK_TYPE_LABEL[b.type]}</span>
      </div>,
    );
  }

  return (
    <section className="outline" aria-labelledby="outline-heading" data-testid="outline">
      <div className="outline-head">
        <h2 id="outline-heading">
          Blocks <span className="count">{formatWholeNumber(blocks.length)}</span>
        </h2>
        <FoldButton name="outline" what="the block list" folded={false} symbol="«" onToggle={setCollapsed} />
      </div>
      <p className="hint outline-hint" id="outline-keys">
        ↑ ↓ move · Enter select and frame · Space add to selection · Delete delete
      </p>
      <div
        ref={list}
        className="outline-list"
        role="listbox"
        tabIndex={0}
        aria-label="Blocks"
        aria-describedby="outline-keys"
        aria-multiselectable={true}
        aria-activedescendant={blocks.length > 0 ? optionId(at) : undefined}
        data-testid="outline-list"
        onKeyDown={onKeyDown}
        onScroll={(e) => setScrollTop(e.currentTarget.scrollTop)}
        {...{ [OWN_KEYS_ATTRIBUTE]: '' }}
      >
        <div className="outline-rows" style={{ height: blocks.length * ROW_HEIGHT }}>
          {rows}
        </div>
      </div>
      <addBlockForm.Render props={{}} fallback={null} />
    </section>
  );
}
