/** Closed intervals on a line, used for how much of a mat edge a strip covers. */
export interface Interval {
  readonly start: number;
  readonly end: number;
}

/**
 * How many lines at a regular pitch lie in the parts of [0, length] that no span covers, counting only
 * parts within [from, to]. Spans closer than `tolerance` merge, and a gap no wider than it is no gap.
 * Line i (from 0) sits at (i + ½)·pitch, which is how bit lines and word lines are laid across a mat. The
 * interval-by-interval form of the same count is the test oracle (test/support/intervalReference.ts);
 * this one takes spans kept flat (span k is `spans[2k]` … `spans[2k + 1]`). Sorts the spans in place and
 * allocates nothing, because evaluate runs it for every mat edge of a die.
 */
export function uncoveredLineCount(
  spans: Float64Array,
  count: number,
  length: number,
  tolerance: number,
  pitch: number,
  lineCount: number,
  from = 0,
  to = length,
): number {
  // Keep the non-empty spans, sorted by start (insertion sort, stable).
  let kept = 0;
  for (let k = 0; k < count; k++) {
    const s = spans[2 * k] as number;
    const e = spans[2 * k + 1] as number;
    if (!(e > s)) continue;
    let m = kept;
    while (m > 0 && (spans[2 * (m - 1)] as number) > s) {
      spans[2 * m] = spans[2 * (m - 1)] as number;
      spans[2 * m + 1] = spans[2 * (m - 1) + 1] as number;
      m--;
    }
    spans[2 * m] = s;
    spans[2 * m + 1] = e;
    kept++;
  }
  let lines = 0;
  let cursor = 0;
  let k = 0;
  while (k < kept) {
    // Merge the spans that overlap or touch (within the tolerance) into one covered part.
    const partStart = spans[2 * k] as number;
    let partEnd = spans[2 * k + 1] as number;
    k++;
    while (k < kept && (spans[2 * k] as number) <= partEnd + tolerance) {
      partEnd = Math.max(partEnd, spans[2 * k + 1] as number);
      k++;
    }
    if (partStart > cursor + tolerance) {
      lines += linesInClippedGap(cursor, Math.min(partStart, length), from, to, pitch, lineCount);
    }
    cursor = Math.max(cursor, partEnd);
    if (cursor >= length) break;
  }
  if (cursor < length - tolerance) lines += linesInClippedGap(cursor, length, from, to, pitch, lineCount);
  return lines;
}

function linesInClippedGap(
  gapStart: number,
  gapEnd: number,
  from: number,
  to: number,
  pitch: number,
  lineCount: number,
): number {
  if (!(gapEnd > gapStart)) return 0;
  const start = Math.max(gapStart, from);
  const end = Math.min(gapEnd, to);
  if (!(end > start)) return 0;
  const first = Math.max(0, Math.ceil(start / pitch - 0.5));
  const last = Math.min(lineCount - 1, Math.ceil(end / pitch - 0.5) - 1);
  return last >= first ? last - first + 1 : 0;
}
