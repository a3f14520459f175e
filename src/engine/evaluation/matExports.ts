import { matAt, type MatTable } from './matTable';
import type { MatReport } from './report';

/**
 * The mat table read whole, for exports and tests (io/summary.ts, io/reportTable.ts): every mat as an
 * object, a mat's serving strips by id. Apart from matTable.ts so that the first load, which draws and
 * evaluates a design, does not carry them.
 */

/** Every mat's report as objects, in order (for exports and tests; panels ask for the mats they show). */
export function allMats(mats: MatTable): MatReport[] {
  const all = new Array<MatReport>(mats.count);
  for (let k = 0; k < mats.count; k++) all[k] = matAt(mats, k);
  return all;
}

function idsBetween(mats: MatTable, from: number, to: number): string[] {
  const ids = new Array<string>(Math.max(0, to - from));
  for (let p = from; p < to; p++) ids[p - from] = mats.blocks[mats.servingPositions[p] ?? -1]?.id ?? '';
  return ids;
}

/** Ids of the sense-amplifier strips abutting mat k's bit-line ends. */
export function senseAmpStripIdsOf(mats: MatTable, k: number): string[] {
  return idsBetween(mats, mats.servingOffsets[3 * k] ?? 0, mats.servingOffsets[3 * k + 1] ?? 0);
}

/** Ids of the driver strips or row decoders abutting mat k's word-line ends. */
export function wordlineDriverIdsOf(mats: MatTable, k: number): string[] {
  return idsBetween(mats, mats.servingOffsets[3 * k + 1] ?? 0, mats.servingOffsets[3 * k + 2] ?? 0);
}
