import type { Interval } from '../../src/geometry/interval';

/**
 * Coverage of a mat edge, interval by interval: the plain statement of what
 * `uncoveredLineCount()` (src/geometry/interval.ts) computes over flat arrays. Tests compare the two.
 */

/** Merges overlapping or touching intervals; the result is sorted and disjoint. */
export function unionIntervals(intervals: readonly Interval[], tolerance = 0): Interval[] {
  // Insertion sort: a mat edge has a handful of stretches, and this runs for every mat of a large die,
  // so it avoids the extra arrays of filter() and sort().
  const sorted: Interval[] = [];
  for (const interval of intervals) {
    if (!(interval.end > interval.start)) continue;
    let k = sorted.length;
    sorted.push(interval);
    while (k > 0 && (sorted[k - 1] as Interval).start > interval.start) {
      sorted[k] = sorted[k - 1] as Interval;
      k--;
    }
    sorted[k] = interval;
  }
  const merged: Interval[] = [];
  for (const next of sorted) {
    const last = merged[merged.length - 1];
    if (last && next.start <= last.end + tolerance) {
      merged[merged.length - 1] = { start: last.start, end: Math.max(last.end, next.end) };
    } else {
      merged.push(next);
    }
  }
  return merged;
}

/** The parts of [0, length] that no interval covers. */
export function uncoveredParts(covered: readonly Interval[], length: number, tolerance = 0): Interval[] {
  const gaps: Interval[] = [];
  let cursor = 0;
  for (const part of unionIntervals(covered, tolerance)) {
    if (part.start > cursor + tolerance) gaps.push({ start: cursor, end: Math.min(part.start, length) });
    cursor = Math.max(cursor, part.end);
    if (cursor >= length) break;
  }
  if (cursor < length - tolerance) gaps.push({ start: cursor, end: length });
  return gaps.filter((g) => g.end > g.start);
}

/**
 * How many lines at a regular pitch have their centre line inside the given gaps. Line i (from 0)
 * sits at (i + ½)·pitch, which is how bit lines and word lines are laid across a mat.
 */
export function linesInGaps(gaps: readonly Interval[], pitch: number, lineCount: number): number {
  let count = 0;
  for (const gap of gaps) {
    const first = Math.max(0, Math.ceil(gap.start / pitch - 0.5));
    const last = Math.min(lineCount - 1, Math.ceil(gap.end / pitch - 0.5) - 1);
    if (last >= first) count += last - first + 1;
  }
  return count;
}
