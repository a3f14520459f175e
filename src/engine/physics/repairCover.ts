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

/**
 * Exact spare allocation when row and column domains cross (spare rows per row domain, spare columns per
 * strip segment): can every distinct cell (rowKeys[i], columnKeys[i]) be covered by a spare row of its
 * row domain rowDomains[i] or a spare column of its column domain columnDomains[i], given rowSpares[d]
 * and columnSpares[d] left in each (local) domain? Must-repair per domain pair (a row holding more cells
 * of one strip than that strip has spare columns left must be replaced by a row, and the other way round),
 * then branch-and-bound on the first uncovered cell within the node budget. Keys are unique per line.
 * The spare arrays are not changed.
 */
export function coverCrossedDomains(
  rowKeys: Float64Array,
  columnKeys: Float64Array,
  rowDomains: Int32Array,
  columnDomains: Int32Array,
  rowSpares: Int32Array,
  columnSpares: Int32Array,
  budget: { nodes: number },
): CoverOutcome {
  let n = rowKeys.length;
  let rk = rowKeys;
  let ck = columnKeys;
  let rd = rowDomains;
  let cd = columnDomains;
  const rs = rowSpares.slice();
  const cs = columnSpares.slice();
  for (;;) {
    if (n === 0) return REPAIRED;
    let forced = false;
    for (let i = 0; i < n && !forced; i++) {
      const rowDomain = rd[i] as number;
      const columnDomain = cd[i] as number;
      if (countOnLine(rk, cd, n, rk[i] as number, columnDomain) > (cs[columnDomain] as number)) {
        if ((rs[rowDomain] as number) === 0) return NOT_REPAIRED;
        rs[rowDomain] = (rs[rowDomain] as number) - 1;
        [rk, ck, rd, cd, n] = dropLine(rk, ck, rd, cd, n, rk, rk[i] as number);
        forced = true;
      } else if (countOnLine(ck, rd, n, ck[i] as number, rowDomain) > (rs[rowDomain] as number)) {
        if ((cs[columnDomain] as number) === 0) return NOT_REPAIRED;
        cs[columnDomain] = (cs[columnDomain] as number) - 1;
        [rk, ck, rd, cd, n] = dropLine(rk, ck, rd, cd, n, ck, ck[i] as number);
        forced = true;
      }
    }
    if (!forced) break;
  }
  if (--budget.nodes < 0) return UNDECIDED;
  let undecided = false;
  const rowDomain = rd[0] as number;
  const columnDomain = cd[0] as number;
  if ((rs[rowDomain] as number) > 0) {
    const [r2, c2, d2, e2] = dropLine(rk, ck, rd, cd, n, rk, rk[0] as number);
    rs[rowDomain] = (rs[rowDomain] as number) - 1;
    const outcome = coverCrossedDomains(r2, c2, d2, e2, rs, cs, budget);
    rs[rowDomain] = (rs[rowDomain] as number) + 1;
    if (outcome === REPAIRED) return REPAIRED;
    if (outcome === UNDECIDED) undecided = true;
  }
  if ((cs[columnDomain] as number) > 0) {
    const [r2, c2, d2, e2] = dropLine(rk, ck, rd, cd, n, ck, ck[0] as number);
    cs[columnDomain] = (cs[columnDomain] as number) - 1;
    const outcome = coverCrossedDomains(r2, c2, d2, e2, rs, cs, budget);
    if (outcome === REPAIRED) return REPAIRED;
    if (outcome === UNDECIDED) undecided = true;
  }
  return undecided ? UNDECIDED : NOT_REPAIRED;
}

/** Cells on the line `keys[i] === key` whose other domain is `domain`. */
function countOnLine(keys: Float64Array, otherDomains: Int32Array, n: number, key: number, domain: number) {
  let count = 0;
  for (let i = 0; i < n; i++) if (keys[i] === key && otherDomains[i] === domain) count++;
  return count;
}

/** New arrays without the cells on the line `lineKeys[i] === key` (exactly sized). */
function dropLine(
  rowKeys: Float64Array,
  columnKeys: Float64Array,
  rowDomains: Int32Array,
  columnDomains: Int32Array,
  n: number,
  lineKeys: Float64Array,
  key: number,
): [Float64Array, Float64Array, Int32Array, Int32Array, number] {
  let m = 0;
  for (let i = 0; i < n; i++) if (lineKeys[i] !== key) m++;
  const r = new Float64Array(m);
  const c = new Float64Array(m);
  const d = new Int32Array(m);
  const e = new Int32Array(m);
  let j = 0;
  for (let i = 0; i < n; i++) {
    if (lineKeys[i] === key) continue;
    r[j] = rowKeys[i] as number;
    c[j] = columnKeys[i] as number;
    d[j] = rowDomains[i] as number;
    e[j] = columnDomains[i] as number;
    j++;
  }
  return [r, c, d, e, m];
}
