import { wordsOf } from '../../geometry/doubleWords';
import { MAT_CODE, type BlockTable, type MatKind } from '../../geometry/blockTable';
import type { BlockRuns } from '../../geometry/blockRuns';
import { needsRefresh } from '../../model/cellBasics';

/** Positions closer than this are the same band edge (m). */
const BAND_GRID = 1e-9;

/**
 * Rows to refresh. Mats side by side along the word-line direction, with the same extent across it,
 * form one band that a row activation crosses together (one global word line), so a band contributes
 * the largest word-line count among its mats, not the sum. Mats of static (6T) cells are not refreshed.
 * Common practice (no source).
 */
export function refreshRows(
  table: BlockTable,
  /** The table's runs by block type (blockRuns.ts), when known: then only runs of mats are visited. */
  runs: BlockRuns | null = null,
): number {
  // What each kind of mat contributes, read here once per kind: the loop below reads no cell, whose shape
  // may differ from design to design (a compiled loop that met another shape would be thrown away).
  const kinds = table.kinds;
  const facts = new KindFacts(kinds.length);
  for (let k = 0; k < kinds.length; k++) {
    const kind = kinds[k] as MatKind;
    facts.refreshed[k] = needsRefresh(kind.cell.kind) ? 1 : 0;
    facts.vertical[k] = kind.block.bitlineAxis === 'vertical' ? 1 : 0;
    facts.wordlines[k] = kind.geometry.wordlineCount;
  }
  const bands = new Map<number, Map<number, number>>();
  const { type, kindOf, x, y, width, height } = table;
  const ranges = runs ? matRuns(runs, kindOf, facts.vertical) : Int32Array.of(0, table.count);
  collectBands(
    ranges,
    runs ? 1 : 0,
    type,
    kindOf,
    x,
    y,
    width,
    height,
    wordsOf(x),
    wordsOf(y),
    wordsOf(width),
    wordsOf(height),
    facts.refreshed,
    facts.vertical,
    facts.wordlines,
    bands,
  );
  let rows = 0;
  for (const byExtent of bands.values()) for (const r of byExtent.values()) rows += r;
  return rows;
}

/** Past this many kinds of mat, runs are not tested for one kind (a native search per other kind). */
const FEW_KINDS = 8;

/**
 * Where each run of mats starts and ends (from, to pairs). A run of one kind whose bit lines are
 * vertical is its first mat alone: the others share its kind, top edge and height, and add nothing (see
 * {@link collectBands}). One kind is told by the native search for each other kind.
 */
function matRuns(runs: BlockRuns, kindOf: Int32Array, vertical: Uint8Array): Int32Array {
  let count = 0;
  for (let r = 0; r < runs.count; r++) if (runs.code[r] === MAT_CODE) count++;
  const ranges = new Int32Array(2 * count);
  const kinds = vertical.length;
  for (let r = 0, at = 0; r < runs.count; r++) {
    if (runs.code[r] !== MAT_CODE) continue;
    const from = runs.start[r] as number;
    let to = runs.start[r + 1] as number;
    const kind = kindOf[from] as number;
    if (vertical[kind] === 1 && kinds <= FEW_KINDS) {
      const ofRun = kindOf.subarray(from, to);
      let other = 0;
      while (other < kinds && (other === kind || ofRun.indexOf(other) < 0)) other++;
      if (other === kinds) to = from + 1;
    }
    ranges[at++] = from;
    ranges[at++] = to;
  }
  return ranges;
}

/**
 * Fills `bands` with each band's rows: bands by axis and start (on a 1 nm grid, as one exact integer),
 * then by extent. Mats of one band mostly follow each other in a tiled design, so the band of the
 * previous mat is tried first. (The hot loop ends the function: see DEVELOPERS.md.)
 */
function collectBands(
  /** Blocks to visit: from, to pairs (the whole table, or its runs of mats). */
  ranges: Int32Array,
  /** 1 when each range is a run (its blocks share their top edge and height to the bit). */
  rangesAreRuns: number,
  type: Uint8Array,
  kindOf: Int32Array,
  x: Float64Array,
  y: Float64Array,
  width: Float64Array,
  height: Float64Array,
  /** The same lists as 32-bit words (two per double), compared without reading a double. */
  xWords: Int32Array,
  yWords: Int32Array,
  widthWords: Int32Array,
  heightWords: Int32Array,
  refreshed: Uint8Array,
  verticalKind: Uint8Array,
  wordlinesOfKind: Float64Array,
  bands: Map<number, Map<number, number>>,
): void {
  // Nothing before the loop reads a property (see blockTable.ts, writeRows): no grid position is −1, and
  // lengths are positive.
  let lastKey = -1;
  let lastExtent = -1;
  let lastBand: Map<number, number> | null = null;
  let lastRows = 0;
  // The band of the previous mat by its start and extent as read (m): equal readings give equal grid
  // positions, so a mat in the same row as the one before needs no rounding.
  let lastStart = 0;
  let lastLength = -1;
  let lastVertical = false;
  // The kind and the words of start and extent of the mat last added: a mat of that kind whose start and
  // extent have the same bits adds nothing (its band holds at least its kind's rows already). Reading
  // words, not doubles, keeps the interpreter from boxing two numbers per mat.
  let lastKind = -1;
  let startLow = 0;
  let startHigh = 0;
  let lengthLow = 0;
  let lengthHigh = 0;
  // The range of the mat last added, when the ranges are runs.
  let lastRun = -1;
  for (let r = 0, i = 0, to = 0; r < ranges.length || i < to; i++) {
    if (i >= to) {
      i = ranges[r] as number;
      to = ranges[r + 1] as number;
      r += 2;
      if (i >= to) continue;
    }
    if (type[i] !== MAT_CODE) continue;
    const k = kindOf[i] as number;
    // Static cells need no refresh and add no rows.
    if (!(k >= 0 && k < refreshed.length) || refreshed[k] === 0) continue;
    const vertical = verticalKind[k] === 1;
    // A mat of the last one's kind in the same run shares its top edge and height: nothing to add.
    if (vertical && k === lastKind && lastRun === r) continue;
    const startWords = vertical ? yWords : xWords;
    const lengthWords = vertical ? heightWords : widthWords;
    const s0 = startWords[2 * i] as number;
    const s1 = startWords[2 * i + 1] as number;
    const l0 = lengthWords[2 * i] as number;
    const l1 = lengthWords[2 * i + 1] as number;
    if (k === lastKind && s0 === startLow && s1 === startHigh && l0 === lengthLow && l1 === lengthHigh)
      continue;
    lastKind = k;
    lastRun = rangesAreRuns === 1 ? r : -1;
    startLow = s0;
    startHigh = s1;
    lengthLow = l0;
    lengthHigh = l1;
    const at = (vertical ? y[i] : x[i]) as number;
    const length = (vertical ? height[i] : width[i]) as number;
    const wordlines = wordlinesOfKind[k] as number;
    if (at === lastStart && length === lastLength && vertical === lastVertical && lastBand) {
      if (wordlines > lastRows) {
        lastRows = wordlines;
        lastBand.set(lastExtent, wordlines);
      }
      continue;
    }
    const start = Math.round(at / BAND_GRID);
    const extent = Math.round(length / BAND_GRID);
    const key = start * 2 + (vertical ? 1 : 0);
    lastStart = at;
    lastLength = length;
    lastVertical = vertical;
    if (key === lastKey && extent === lastExtent && lastBand) {
      if (wordlines > lastRows) {
        lastRows = wordlines;
        lastBand.set(extent, wordlines);
      }
      continue;
    }
    let byExtent = bands.get(key);
    if (!byExtent) {
      byExtent = new Map();
      bands.set(key, byExtent);
    }
    const rows = Math.max(byExtent.get(extent) ?? 0, wordlines);
    byExtent.set(extent, rows);
    lastKey = key;
    lastExtent = extent;
    lastBand = byExtent;
    lastRows = rows;
  }
}

/** Per mat kind: refreshed (1) or static (0), bit lines vertical (1), word lines (count). */
class KindFacts {
  readonly refreshed: Uint8Array;
  readonly vertical: Uint8Array;
  readonly wordlines: Float64Array;

  constructor(kinds: number) {
    this.refreshed = new Uint8Array(kinds);
    this.vertical = new Uint8Array(kinds);
    this.wordlines = new Float64Array(kinds);
  }
}
