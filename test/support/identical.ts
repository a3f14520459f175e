/**
 * Where two values differ, or null when they are identical: numbers by Object.is (so −0 ≠ 0 and NaN =
 * NaN: bit for bit, not close), typed arrays element by element, arrays and plain or class objects
 * key by key (own enumerable keys, the same set), anything else by identity. For oracle tests that
 * must show a fast path gives exactly the old answer.
 */
export function firstDifference(actual: unknown, expected: unknown, path = ''): string | null {
  if (typeof expected === 'number' || typeof actual === 'number') {
    return Object.is(actual, expected)
      ? null
      : `${path || '(root)'}: ${String(actual)} vs ${String(expected)}`;
  }
  if (ArrayBuffer.isView(expected) && ArrayBuffer.isView(actual)) {
    const a = actual as unknown as ArrayLike<number>;
    const e = expected as unknown as ArrayLike<number>;
    if (a.length !== e.length) return `${path}.length: ${a.length} vs ${e.length}`;
    for (let i = 0; i < e.length; i++)
      if (!Object.is(a[i], e[i])) return `${path}[${i}]: ${String(a[i])} vs ${String(e[i])}`;
    return null;
  }
  if (typeof expected !== 'object' || expected === null || typeof actual !== 'object' || actual === null) {
    return actual === expected ? null : `${path || '(root)'}: ${String(actual)} vs ${String(expected)}`;
  }
  if (Array.isArray(expected) !== Array.isArray(actual)) return `${path}: array vs not`;
  const aKeys = Object.keys(actual).sort();
  const eKeys = Object.keys(expected).sort();
  if (aKeys.join(',') !== eKeys.join(',')) return `${path}: keys ${aKeys.join(',')} vs ${eKeys.join(',')}`;
  for (const key of eKeys) {
    const d = firstDifference(
      (actual as Record<string, unknown>)[key],
      (expected as Record<string, unknown>)[key],
      `${path}.${key}`,
    );
    if (d) return d;
  }
  return null;
}
