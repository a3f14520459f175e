import { expect } from 'vitest';
import type { Command } from '../../src/commands/command';
import { demoDesign } from '../../src/designs/demoDesign';
import { evaluate } from '../../src/engine';
import type { Block } from '../../src/model/block';
import type { Design } from '../../src/model/design';
import { createAppStore } from '../../src/store/appStore';
import { expectSameReport } from './sameReport';

/**
 * The one helper module for command tests. Every command test runs the command through the store, undoes
 * it and redoes it ({@link runUndoRedo}, or {@link runAndCheckChange} for a yes/no property), and checks
 * refusals with {@link expectRefused}.
 */

type AppStoreApi = ReturnType<typeof createAppStore>;

/**
 * Runs a command through the store, undoes it and redoes it, checking the document and the report at
 * each step: after undo the original document object is back; after redo the edited one is.
 */
function undoRedoSteps<A>(
  design: Design,
  command: Command<A>,
  args: A,
  check: (after: Design, before: Design) => void,
): { store: AppStoreApi; after: Design } {
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
  return { store, after };
}

/** Runs, undoes and redoes a command on `design`; returns the edited document for further checks. */
export function runUndoRedo<A>(
  design: Design,
  command: Command<A>,
  args: A,
  check: (after: Design, before: Design) => void,
): Design {
  return undoRedoSteps(design, command, args, check).after;
}

/**
 * Runs, undoes and redoes a command (on the demo unless told otherwise): `changed` must hold after run and
 * redo and fail before (so it cannot pass vacuously). Returns the store, redone, for further checks.
 */
export function runAndCheckChange<A>(
  command: Command<A>,
  args: A,
  changed: (d: Design) => boolean,
  start: Design = demoDesign(),
): AppStoreApi {
  expect(changed(start)).toBe(false);
  return undoRedoSteps(start, command, args, (after, before) => {
    expect(changed(after)).toBe(true);
    expect(changed(before)).toBe(false);
  }).store;
}

/** A command that must be refused: the message names why, and the document and history do not change. */
export function expectRefused<A>(
  design: Design,
  command: Command<A>,
  args: A,
  message: string | RegExp,
): void;
/** The same on the demo (or `start`). */
export function expectRefused<A>(
  command: Command<A>,
  args: A,
  message: string | RegExp,
  start?: Design,
): void;
export function expectRefused<A>(...params: unknown[]): void {
  const onDesign = typeof (params[1] as Command<A> | undefined)?.run === 'function';
  const [design, command, args, message] = (
    onDesign ? params : [params[3] ?? demoDesign(), params[0], params[1], params[2]]
  ) as [Design, Command<A>, A, string | RegExp];
  const store = createAppStore(design);
  const before = store.getState().history.present;
  expect(store.getState().execute(command, args)).toBe(false);
  if (typeof message === 'string') expect(store.getState().lastError).toContain(message);
  else expect(store.getState().lastError).toMatch(message);
  expect(store.getState().history.present).toBe(before);
  expect(store.getState().history.past).toHaveLength(0);
}

export function blockById(design: Design, id: string): Block {
  const block = design.blocks.find((b) => b.id === id);
  if (!block) throw new Error(`no block ${id}`);
  return block;
}
