import { expect } from 'vitest';

/** Expects two numbers to agree within a relative tolerance (both NaN also agree). */
export function expectRelativelyClose(actual: number, expected: number, relative: number, label = '') {
  if (Number.isNaN(expected)) {
    expect(actual, label).toBeNaN();
    return;
  }
  const scale = Math.max(Math.abs(actual), Math.abs(expected));
  const ok = actual === expected || Math.abs(actual - expected) <= relative * scale;
  expect(ok, `${label}: ${actual} vs ${expected}`).toBe(true);
}
