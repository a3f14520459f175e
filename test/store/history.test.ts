import { describe, expect, it } from 'vitest';
import { pushHistory, redoHistory, startHistory, undoHistory } from '../../src/store/history';

describe('undo history', () => {
  it('keeps at least 200 steps and drops the oldest beyond its limit', () => {
    let h = startHistory(0);
    for (let i = 1; i <= 300; i++) h = pushHistory(h, i, 250);
    expect(h.past).toHaveLength(250);
    expect(h.past[0]).toBe(50);
    for (let i = 0; i < 250; i++) h = undoHistory(h);
    expect(h.present).toBe(50);
    expect(undoHistory(h)).toBe(h);
  });

  it('a new change after undo discards the redo branch', () => {
    let h = pushHistory(pushHistory(startHistory('a'), 'b'), 'c');
    h = undoHistory(h);
    expect(h.present).toBe('b');
    h = pushHistory(h, 'd');
    expect(h.future).toEqual([]);
    expect(redoHistory(h)).toBe(h);
    expect(undoHistory(h).present).toBe('b');
  });

  it('pushing the same object records no step', () => {
    const h = startHistory({ v: 1 });
    expect(pushHistory(h, h.present)).toBe(h);
  });
});
