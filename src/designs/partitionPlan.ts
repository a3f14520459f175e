import { unplacedMatGeometry } from '../geometry/matGeometry';
import { MAX_CELLS_PER_LINE } from '../model/blockBasics';
import type { CellDefinition } from '../model/cell';
import { isGainCell } from '../model/cellBasics';
import { formatWholeNumber } from '../model/units';
import { chooseGrid, gridHeight, gridWidth } from './gridChoice';

/** Sizes of the periphery around the mats (m). Strips must be wider than zero; decoders may be absent (0). */
export interface StripSizes {
  /** Height of a sense-amplifier strip between mat rows (across the bit lines) (m). */
  readonly senseAmpStripHeight: number;
  /** Width of a sub-word-line driver strip between mat columns (m). */
  readonly wordlineDriverStripWidth: number;
  /** Width of the row decoder along the left edge (m); 0 for none. */
  readonly rowDecoderWidth: number;
  /** Height of the column decoder along the bottom edge (m); 0 for none. */
  readonly columnDecoderHeight: number;
}

/** What a bank partition is made of. The bit-line architecture is the cell's own (folded or open). */
export interface PartitionSpec {
  /** Bits the bank must be able to read (usable bits) at least. */
  readonly targetBits: number;
  readonly cell: CellDefinition;
  /** F of the process (m). */
  readonly featureSize: number;
  readonly cellsPerBitline: number;
  readonly cellsPerWordline: number;
  readonly strips: StripSizes;
}

/** How a partition tiles: the grid of mats and what it holds. Lengths in metres. */
export interface PartitionPlan {
  readonly matRows: number;
  readonly matColumns: number;
  readonly matCount: number;
  readonly matWidth: number;
  readonly matHeight: number;
  readonly bitsPerMat: number;
  readonly bits: number;
  /** Bits on open bit lines that end at the array's outer sense-amplifier strips, with no partner mat. */
  readonly lostBits: number;
  readonly usableBits: number;
  /** Bounding box of the whole bank, decoders included (m). */
  readonly width: number;
  readonly height: number;
}

export type PlanResult =
  { readonly ok: true; readonly plan: PartitionPlan } | { readonly ok: false; readonly error: string };

/** Most mats a generated bank may have (about three blocks per mat); keeps a built design editable. */
export const MAX_PARTITION_MATS = 16_384;
/** Why a bank that needs more than MAX_PARTITION_MATS mats is refused. */
const TOO_MANY_MATS = `the target needs more than ${formatWholeNumber(MAX_PARTITION_MATS)} mats of this size`;
/** Largest target capacity the builder accepts (bits): 64 Gib. */
export const MAX_TARGET_BITS = 2 ** 36;

/**
 * True when the outer sense-amplifier strips of an array of this cell lose bits: a 1T1C open-bit-line
 * amplifier compares a bit line with one of the mat beyond its strip, and the outermost strips have no mat
 * beyond them, so the edge mats read only half their bit lines (Takahashi et al., IEEE JSSC 36(11), 2001;
 * the engine counts the loss). Gain cells read single-ended against a reference and lose nothing.
 */
export function losesEdgeBits(cell: CellDefinition): boolean {
  return cell.bitlineArchitecture === 'open' && !isGainCell(cell.kind);
}

const whole = (v: number, max: number) => Number.isInteger(v) && v >= 1 && v <= max;
/** Strip sizes (m): above zero (strips) or at least zero (decoders), at most 1 mm. */
const positive = (v: number) => Number.isFinite(v) && v > 0 && v <= 1e-3;
const optional = (v: number) => Number.isFinite(v) && v >= 0 && v <= 1e-3;

function checkSpec(spec: PartitionSpec): string | null {
  if (!whole(spec.cellsPerBitline, MAX_CELLS_PER_LINE) || !whole(spec.cellsPerWordline, MAX_CELLS_PER_LINE)) {
    return `cells per line must be whole numbers from 1 to ${MAX_CELLS_PER_LINE}`;
  }
  if (!Number.isInteger(spec.targetBits) || spec.targetBits < 1 || spec.targetBits > MAX_TARGET_BITS) {
    return 'the target capacity must be a whole number of bits from 1 to 64 Gib';
  }
  const s = spec.strips;
  if (!positive(s.senseAmpStripHeight) || !positive(s.wordlineDriverStripWidth)) {
    return 'sense-amplifier and driver strips need a size above zero and at most 1 mm';
  }
  if (!optional(s.rowDecoderWidth) || !optional(s.columnDecoderHeight)) {
    return 'decoder sizes must lie between 0 and 1 mm';
  }
  return null;
}

/** Width and height (m) of a grid of `rows` × `columns` mats with their strips and decoders. */
export function gridExtent(
  rows: number,
  columns: number,
  matWidth: number,
  matHeight: number,
  strips: StripSizes,
): { width: number; height: number } {
  return { width: gridWidth(columns, matWidth, strips), height: gridHeight(rows, matHeight, strips) };
}

/**
 * Chooses the grid of a bank: the fewest mats that reach the target, arranged as rows × columns to give
 * the smallest bounding box (ties: fewer mats, then the squarer box). Open 1T1C arrays need one mat row
 * more than their bits alone suggest, since the two edge rows each lose half their bits. Only grids where
 * neither dimension could shrink are tried: for each column count c the fewest rows ⌈m/c⌉ and for each
 * row count r the fewest columns ⌈m/r⌉, with c, r up to ⌈√m⌉, which covers all of them (gridChoice.ts
 * skips those a lower bound rules out).
 */
export function planPartition(spec: PartitionSpec): PlanResult {
  const problem = checkSpec(spec);
  if (problem) return { ok: false, error: problem };
  const g = unplacedMatGeometry(spec.cell, spec.cellsPerBitline, spec.cellsPerWordline, spec.featureSize);
  const bitsPerMat = g.bits;
  const lossRows = losesEdgeBits(spec.cell) ? 1 : 0;
  // Mats that must be readable; with an open array the edge rows add one row's worth of lost halves.
  const needed = Math.ceil(spec.targetBits / bitsPerMat);
  if (needed > MAX_PARTITION_MATS) return { ok: false, error: TOO_MANY_MATS };
  const chosen = chooseGrid(needed, lossRows, g.width, g.height, spec.strips, MAX_PARTITION_MATS);
  if (!chosen) return { ok: false, error: TOO_MANY_MATS };
  const { rows, columns, width, height } = chosen;
  const matCount = rows * columns;
  const bits = matCount * bitsPerMat;
  const lostBits = lossRows * columns * bitsPerMat;
  return {
    ok: true,
    plan: {
      matRows: rows,
      matColumns: columns,
      matCount,
      matWidth: g.width,
      matHeight: g.height,
      bitsPerMat,
      bits,
      lostBits,
      usableBits: bits - lostBits,
      width,
      height,
    },
  };
}
