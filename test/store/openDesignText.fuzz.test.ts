import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/model/demoDesign';
import { createAppStore } from '../../src/store/appStore';
import { openDesignText } from '../../src/store/openDesignText';

// Source: common practice (no source): a refused file never changes what the person is working on.

describe('opening malformed files', () => {
  it('never throws and never changes the current design or its history', () => {
    const store = createAppStore(demoDesign());
    const before = store.getState().history;
    const demoText = JSON.stringify(demoDesign());
    const malformed = fc.oneof(
      fc.string(),
      fc.json(),
      // The demo file cut short at a random place.
      fc.integer({ min: 0, max: demoText.length - 1 }).map((n) => demoText.slice(0, n)),
      // The demo file with one character replaced.
      fc
        .tuple(fc.integer({ min: 0, max: demoText.length - 1 }), fc.constantFrom('"', '}', '-', 'x', '9'))
        .map(([at, ch]) => demoText.slice(0, at) + ch + demoText.slice(at + 1)),
    );
    fc.assert(
      fc.property(malformed, (text) => {
        const opened = openDesignText(store, text, 'fuzz.json');
        if (opened) {
          // A replaced character can leave a valid design (e.g. a digit); undo restores the original.
          store.getState().undo();
          store.setState({ history: { ...store.getState().history, future: [] } });
        }
        expect(store.getState().history.present).toBe(before.present);
        expect(store.getState().history.past).toHaveLength(0);
      }),
      { numRuns: 3000 },
    );
  });

  it('opens a good file as one undoable step', () => {
    const store = createAppStore(demoDesign());
    const original = store.getState().history.present;
    expect(openDesignText(store, JSON.stringify({ ...demoDesign(), name: 'Other' }), 'other.json')).toBe(
      true,
    );
    expect(store.getState().history.present.name).toBe('Other');
    expect(store.getState().notice?.kind).toBe('info');
    store.getState().undo();
    expect(store.getState().history.present).toBe(original);
  });
});
