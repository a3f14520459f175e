import { expect } from 'vitest';
import type { Command } from '../../src/commands/command';
import type { Design } from '../../src/model/design';
import { demoDesign } from '../../src/designs/demoDesign';
import { createAppStore } from '../../src/store/appStore';

/**
 * Runs a command through the store, then undoes and redoes it, checking the document at each step:
 * `changed` must hold after run and redo and fail after undo (so it cannot pass vacuously).
 */
export function runUndoRedo<A>(
  command: Command<A>,
  args: A,
  changed: (d: Design) => boolean,
  start: Design = demoDesign(),
) {
  const store = createAppStore(start);
  const original = store.getState().history.present;
  expect(changed(original)).toBe(false);
  expect(store.getState().execute(command, args)).toBe(true);
  const after = store.getState().history.present;
  expect(changed(after)).toBe(true);
  store.getState().undo();
  expect(store.getState().history.present).toBe(original);
  expect(changed(store.getState().history.present)).toBe(false);
  store.getState().redo();
  expect(store.getState().history.present).toBe(after);
  return store;
}

/** Runs a command that must be refused, checking the message and that nothing changed. */
export function expectRefused<A>(
  command: Command<A>,
  args: A,
  message: RegExp,
  start: Design = demoDesign(),
) {
  const store = createAppStore(start);
  const before = store.getState().history.present;
  expect(store.getState().execute(command, args)).toBe(false);
  expect(store.getState().lastError).toMatch(message);
  expect(store.getState().history.present).toBe(before);
  expect(store.getState().history.past).toHaveLength(0);
}
