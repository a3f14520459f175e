import { expect } from 'vitest';
import type { Command } from '../../src/commands/command';
import { evaluate } from '../../src/engine';
import type { Block } from '../../src/model/block';
import type { Design } from '../../src/model/design';
import { createAppStore } from '../../src/store/appStore';
import { expectSameReport } from './sameReport';

/**
 * Runs a command through the store, undoes it and redoes it, checking the document and the report at
 * each step: after undo the original document object is back; after redo the edited one is.
 * Returns the edited document for further checks.
 */
export function runUndoRedo<A>(
  design: Design,
  command: Command<A>,
  args: A,
  check: (after: Design, before: Design) => void,
): Design {
  const store = createAppStore(design);
  const before = store.getState().history.present;
  const reportBefore = store.getState().report;
  expect(store.getState().execute(command, args), store.getState().lastError ?? '').toBe(true);
  const after = store.getState().history.present;
  expect(after).not.toBe(before);
  expect(store.getState().history.past).toHaveLength(1);
  check(after, before);
  expectSameReport(store.getState().report, evaluate(after));

  store.getState().undo();
  expect(store.getState().history.present).toBe(before);
  expect(store.getState().report).toEqual(reportBefore);

  store.getState().redo();
  expect(store.getState().history.present).toBe(after);
  check(store.getState().history.present, before);
  expect(store.getState().history.future).toHaveLength(0);
  return after;
}

/** Runs a command that must be refused, and checks that the document and history did not change. */
export function expectRefused<A>(design: Design, command: Command<A>, args: A, message: string): void {
  const store = createAppStore(design);
  const before = store.getState().history.present;
  expect(store.getState().execute(command, args)).toBe(false);
  expect(store.getState().lastError).toContain(message);
  expect(store.getState().history.present).toBe(before);
  expect(store.getState().history.past).toHaveLength(0);
}

export function blockById(design: Design, id: string): Block {
  const block = design.blocks.find((b) => b.id === id);
  if (!block) throw new Error(`no block ${id}`);
  return block;
}
