import type { PlacedBlock } from '../geometry/placedBlocks';
import { area, boundingBox } from '../geometry/rect';
import type { MatReport, Totals } from './report';

/**
 * Whole-floorplan area figures. Array efficiency η = bits·A_cell / A_total and area per bit =
 * A_total / bits (= A_cell / η). Source: the definition used by Takahashi et al., "A Multigigabit DRAM
 * Technology With 6F² Open-Bitline Cell…", IEEE JSSC 36(11), 2001 (cell area over die area).
 * The total is the bounding box of every block, so gaps count against efficiency.
 */
export function computeTotals(
  placed: readonly PlacedBlock[],
  mats: readonly MatReport[],
  featureSize: number,
): Totals {
  let bits = 0;
  let cellArea = 0;
  let worstSenseSignal = Number.NaN;
  let worstSenseSignalMatId: string | null = null;
  for (const m of mats) {
    bits += m.bits;
    cellArea += m.cellArea;
    if (worstSenseSignalMatId === null || m.senseSignal < worstSenseSignal) {
      worstSenseSignal = m.senseSignal;
      worstSenseSignalMatId = m.matId;
    }
  }
  let placedArea = 0;
  for (const p of placed) placedArea += area(p.rect);
  const box = boundingBox(placed.map((p) => p.rect));
  const totalArea = box ? area(box) : 0;
  const areaPerBit = bits > 0 ? totalArea / bits : 0;
  return {
    matCount: mats.length,
    bits,
    totalArea,
    placedArea,
    cellArea,
    arrayEfficiency: totalArea > 0 ? cellArea / totalArea : 0,
    areaPerBit,
    areaPerBitInF2: areaPerBit / (featureSize * featureSize),
    worstSenseSignal,
    worstSenseSignalMatId,
  };
}
