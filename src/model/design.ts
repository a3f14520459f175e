import { cellPitches, crossingOccupancy, type CellDefinition } from './cell';
import { clipForMessage } from './messageText';
import { MAX_COORDINATE } from './blockBasics';

// A design document: its format name, version and limits, without the validation library. The schema
// that checks a stored or edited design is in designSchema.ts, loaded with restore and the edit check.

export type { Design, VariantDesign, VariantShelf } from './designSchema';

/** The name every Matloom design file carries, so that a stray JSON file is recognised as not ours. */
export const DESIGN_FORMAT = 'matloom-design';
/** Current version of the design format; older versions are migrated by io/restore. */
export const DESIGN_VERSION = 2;
/** Most blocks one design may hold: a whole die of small mats with their strips. */
export const MAX_BLOCKS = 300_000;
/** Most variants one document may hold. */
export const MAX_VARIANTS = 32;

/**
 * Why a mat is too long to keep, or null: a mat's size follows from its cells, so it is held within the
 * same bound as positions ({@link MAX_COORDINATE}). Shared by the schema and the edit check.
 */
export function matLengthProblem(
  mat: { id: string; cellsPerBitline: number; cellsPerWordline: number },
  cell: CellDefinition,
  featureSize: number,
): string | null {
  const { bitlinePitch, wordlinePitch } = cellPitches(cell, featureSize);
  const occupancy = crossingOccupancy(cell.bitlineArchitecture);
  const longest = Math.max(
    (mat.cellsPerBitline / occupancy) * wordlinePitch,
    (mat.cellsPerWordline / occupancy) * bitlinePitch,
  );
  if (!(longest > MAX_COORDINATE)) return null;
  return `mat "${clipForMessage(mat.id)}" would be ${(longest * 1e3).toFixed(1)} mm long; the limit is ${MAX_COORDINATE * 1e3} mm`;
}
