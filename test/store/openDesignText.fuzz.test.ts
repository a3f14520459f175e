import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/designs/demoDesign';
import { createAppStore } from '../../src/store/appStore';
import { openDesignText } from '../../src/store/openDesignText';
import { restoreDesign } from '../../src/io/restore';
import { DEMO_CELL_IDS, mutatedDemo, mutation } from '../support/demoMutations';
import { figureProblems } from '../support/figureInvariants';

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
    const documentId = store.getState().documentId;
    fc.assert(
      fc.property(malformed, (text) => {
        const opened = openDesignText(store, text, 'fuzz.json');
        if (opened) {
          // A replaced character can leave a valid design (e.g. a digit): it opens as a new document.
          expect(store.getState().documentId).not.toBe(documentId);
          store.setState({ history: before, documentId });
        }
        expect(store.getState().history).toBe(before);
        expect(store.getState().documentId).toBe(documentId);
      }),
      { numRuns: 3000 },
    );
  }, 60_000);

  it(
    'a valid design with one field broken: refused with nothing changed, or opened with sound figures',
    { timeout: 180_000 },
    () => {
      // Source: common practice (no source). Each case is the demo (or the demo with every mat on one of
      // its cells) with exactly one field replaced, deleted or scaled: a file that parses and nearly
      // validates, the hardest kind for a loader. ~3 s of CPU; the limit is for a busy 2-core machine.
      const store = createAppStore(demoDesign());
      const before = store.getState().history;
      const documentId = store.getState().documentId;
      let opened = 0;
      let refused = 0;
      fc.assert(
        fc.property(fc.option(fc.constantFrom(...DEMO_CELL_IDS)), mutation, (cellId, broken) => {
          const text = JSON.stringify(mutatedDemo([broken], cellId ?? undefined));
          if (openDesignText(store, text, 'one-field.json')) {
            opened++;
            const state = store.getState();
            const design = state.history.present;
            expect(state.documentId).not.toBe(documentId);
            // What was opened restores again, and its figures are finite or missing with a reason.
            expect(restoreDesign(JSON.stringify(design)).ok).toBe(true);
            expect(figureProblems(state.report, design)).toEqual([]);
            store.setState({ history: before, documentId });
          } else {
            refused++;
            const state = store.getState();
            expect(state.history).toBe(before);
            expect(state.documentId).toBe(documentId);
            expect(state.notice?.kind).toBe('error');
            expect((state.notice?.text ?? '').length).toBeLessThan(2000);
          }
        }),
        { numRuns: 1500 },
      );
      // Both outcomes must occur, or the property proves little.
      expect(opened).toBeGreaterThan(100);
      expect(refused).toBeGreaterThan(100);
    },
  );

  it('opens a good file as a new document with its own history, in a file', () => {
    const store = createAppStore(demoDesign());
    const documentId = store.getState().documentId;
    expect(openDesignText(store, JSON.stringify({ ...demoDesign(), name: 'Other' }), 'other.json')).toBe(
      true,
    );
    const state = store.getState();
    expect(state.history.present.name).toBe('Other');
    expect(state.history.past).toHaveLength(0);
    expect(state.documentId).not.toBe(documentId);
    expect(state.inFile).toBe(state.history.present);
    expect(state.notice?.kind).toBe('info');
  });

  it('quotes a long file name cut short, with control characters escaped', () => {
    const store = createAppStore(demoDesign());
    openDesignText(store, 'nonsense', `${'x'.repeat(500)}\u001b[31m.json`);
    const text = store.getState().notice?.text ?? '';
    expect(text).toContain('…');
    expect(text.length).toBeLessThan(300);
    openDesignText(store, 'nonsense', 'evil\u001b[2J.json');
    expect(store.getState().notice?.text).toContain('evil\\u001b[2J.json');
  });
});
