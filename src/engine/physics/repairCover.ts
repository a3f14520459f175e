/**
 * Exact spare allocation for one repair domain: can R spare rows and C spare columns cover every fault?
 * Word-line faults need a spare row, bit-line faults a spare column, and a single faulty cell either one
 * (the bipartite cover problem, NP-complete in general). Solved by must-repair analysis (a line with more
 * faulty cells than the spares of the other kind left must be replaced by its own kind), the early abort
 * when more than 2·R·C cells remain after it, and a bounded branch-and-bound over the first uncovered cell.
 * Source: must-repair and early-abort rules of W. K. Huang, Y.-N. Shen, F. Lombardi, "New approaches for the
 * repairs of memory with redundancy by row/column deletion for yield enhancement", IEEE Trans. CAD 9(3),
 * 1990, and S.-Y. Kuo, W. K. Fuchs, "Efficient spare allocation for reconfigurable arrays", IEEE Design &
 * Test 4(1), 1987 [from memory].
 */

export const REPAIRED = 0;
export const NOT_REPAIRED = 1;
/** The search gave up after its node budget; callers count it apart (and as not repaired). */
export const UNDECIDED = 2;
export type CoverOutcome = typeof REPAIRED | typeof NOT_REPAIRED | typeof UNDECIDED;

/** Branch-and-bound nodes one domain may visit before it is reported undecided. */
export const SEARCH_NODE_BUDGET = 20_000;

/** Reusable buffers so the Monte-Carlo loop allocates nothing per domain. */
export class CoverScratch {
  rows = new Float64Array(64);
  columns = new Float64Array(64);
  ensure(size: number): void {
    if (this.rows.length >= size) return;
    const capacity = Math.max(size, this.rows.length * 2);
    this.rows = new Float64Array(capacity);
    this.columns = new Float64Array(capacity);
  }
}

/**
 * Decides one domain. Faulty lines first: distinct faulty rows take spare rows, distinct faulty columns
 * spare columns; cells on a replaced line are covered. The remaining cells go to the cover search.
 *
 * @param faultyRows row indices of word-line faults (duplicates allowed).
 * @param faultyColumns column indices of bit-line faults (duplicates allowed).
 * @param cellRows, cellColumns positions of single-cell faults (same length; duplicates allowed).
 */
export function coverDomain(
  faultyRows: readonly number[],
  faultyColumns: readonly number[],
  cellRows: readonly number[],
  cellColumns: readonly number[],
  spareRows: number,
  spareColumns: number,
  scratch: CoverScratch,
): CoverOutcome {
  const usedRows = distinctCount(faultyRows);
  const usedColumns = distinctCount(faultyColumns);
  if (usedRows > spareRows || usedColumns > spareColumns) return NOT_REPAIRED;
  scratch.ensure(cellRows.length);
  const rows = scratch.rows;
  const columns = scratch.columns;
  let n = 0;
  for (let i = 0; i < cellRows.length; i++) {
    const r = cellRows[i] as number;
    const c = cellColumns[i] as number;
    if (faultyRows.includes(r) || faultyColumns.includes(c)) continue;
    let duplicate = false;
    for (let j = 0; j < n; j++) {
      if (rows[j] === r && columns[j] === c) {
        duplicate = true;
        break;
      }
    }
    if (duplicate) continue;
    rows[n] = r;
    columns[n] = c;
    n++;
  }
  const budget = { nodes: SEARCH_NODE_BUDGET };
  const result = coverCells(
    rows.slice(0, n),
    columns.slice(0, n),
    spareRows - usedRows,
    spareColumns - usedColumns,
    budget,
  );
  return result;
}

function distinctCount(values: readonly number[]): number {
  if (values.length < 2) return values.length;
  let count = 0;
  for (let i = 0; i < values.length; i++) {
    if (values.indexOf(values[i] as number) === i) count++;
  }
  return count;
}

/**
 * Can R rows and C columns cover the distinct cells (rows[i], columns[i])? Exact, within the node budget.
 */
export function coverCells(
  rows: Float64Array,
  columns: Float64Array,
  spareRows: number,
  spareColumns: number,
  budget: { nodes: number },
): CoverOutcome {
  let n = rows.length;
  let r = rows;
  let c = columns;
  let R = spareRows;
  let C = spareColumns;
  // Must-repair to a fixed point.
  for (;;) {
    if (n <= R + C) return REPAIRED;
    let forced = false;
    for (let i = 0; i < n && !forced; i++) {
      if (countEqual(r, n, r[i] as number) > C) {
        if (R === 0) return NOT_REPAIRED;
        [r, c, n] = removeLine(r, c, n, r, r[i] as number);
        R--;
        forced = true;
      } else if (countEqual(c, n, c[i] as number) > R) {
        if (C === 0) return NOT_REPAIRED;
        [r, c, n] = removeLine(r, c, n, c, c[i] as number);
        C--;
        forced = true;
      }
    }
    if (!forced) break;
  }
  if (n <= R + C) return REPAIRED;
  // After must-repair each row holds ≤ C cells and each column ≤ R, so R rows and C columns cover at most 2RC.
  if (n > 2 * R * C) return NOT_REPAIRED;
  if (--budget.nodes < 0) return UNDECIDED;
  let undecided = false;
  const row = r[0] as number;
  const column = c[0] as number;
  if (R > 0) {
    const [r2, c2, n2] = removeLine(r, c, n, r, row);
    const outcome = coverCells(r2.subarray(0, n2), c2.subarray(0, n2), R - 1, C, budget);
    if (outcome === REPAIRED) return REPAIRED;
    if (outcome === UNDECIDED) undecided = true;
  }
  if (C > 0) {
    const [r2, c2, n2] = removeLine(r, c, n, c, column);
    const outcome = coverCells(r2.subarray(0, n2), c2.subarray(0, n2), R, C - 1, budget);
    if (outcome === REPAIRED) return REPAIRED;
    if (outcome === UNDECIDED) undecided = true;
  }
  return undecided ? UNDECIDED : NOT_REPAIRED;
}

function countEqual(values: Float64Array, n: number, value: number): number {
  let count = 0;
  for (let i = 0; i < n; i++) if (values[i] === value) count++;
  return count;
}

/** New arrays without the cells on the line `key[i] === value` (the inputs are left as they are). */
function removeLine(
  rows: Float64Array,
  columns: Float64Array,
  n: number,
  key: Float64Array,
  value: number,
): [Float64Array, Float64Array, number] {
  const outRows = new Float64Array(n);
  const outColumns = new Float64Array(n);
  let m = 0;
  for (let i = 0; i < n; i++) {
    if (key[i] === value) continue;
    outRows[m] = rows[i] as number;
    outColumns[m] = columns[i] as number;
    m++;
  }
  return [outRows, outColumns, m];
}
