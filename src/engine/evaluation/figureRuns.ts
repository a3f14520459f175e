/*
 * Runs of mats sharing one figures index (a die lists its mats in such runs: rows of one kind), found
 * for the totals' sums and the findings' groups.
 */

/**
 * Where the mats from k on (k < count) stop sharing mat k's figures index `index`: the first later mat
 * with another index, or `count`. With one or two figures (`figures`: how many the table has) the native
 * search finds it, so a die of one kind of mat takes no step of the interpreter per mat.
 */
export function figuresEnd(
  figureIndex: Int32Array,
  k: number,
  count: number,
  index: number,
  figures: number,
): number {
  if (figures > 2) return sameFiguresUntil(figureIndex, k, count);
  const other = figures === 2 ? figureIndex.indexOf(1 - index, k + 1) : -1;
  return other < 0 || other > count ? count : other;
}

/**
 * {@link figuresEnd} mat by mat (the hot loop ends the function, and what is done per run happens in
 * the caller: code after a loop V8 compiled while it ran has no type feedback, see DEVELOPERS.md).
 */
function sameFiguresUntil(figureIndex: Int32Array, k: number, count: number): number {
  // Every operation is in the loop (none before it: see geometry/blockTable.ts, writeRows).
  let end = k;
  do end++;
  while (end < count && figureIndex[end] === figureIndex[k]);
  return end;
}
