import { gridHeight, gridWidth, type GridChoice } from '../../src/designs/gridChoice';
import type { StripSizes } from '../../src/designs/partitionPlan';

/**
 * The bank grid choice as planPartition() made it before chooseGrid() learnt to skip candidates: every
 * candidate in list order (for k = 1 … ⌈√m⌉: ⌈m/k⌉ + L rows × k, then k + L rows × ⌈m/k⌉), the first
 * strictly better one kept (smaller box, then fewer mats, then the squarer box). The oracle for
 * test/designs/gridChoice.test.ts.
 */
export function everyGridCandidate(
  needed: number,
  lossRows: number,
  matWidth: number,
  matHeight: number,
  strips: StripSizes,
  maxMats: number,
): GridChoice | null {
  const candidates: GridChoice[] = [];
  const side = Math.ceil(Math.sqrt(needed));
  const choice = (rows: number, columns: number): GridChoice => ({
    rows,
    columns,
    width: gridWidth(columns, matWidth, strips),
    height: gridHeight(rows, matHeight, strips),
  });
  for (let k = 1; k <= side; k++) {
    candidates.push(choice(Math.ceil(needed / k) + lossRows, k));
    candidates.push(choice(k + lossRows, Math.ceil(needed / k)));
  }
  let chosen: GridChoice | null = null;
  for (const c of candidates) {
    if (c.rows * c.columns <= maxMats && (!chosen || better(c, chosen))) chosen = c;
  }
  return chosen;
}

function better(a: GridChoice, b: GridChoice): boolean {
  const areaA = a.width * a.height;
  const areaB = b.width * b.height;
  if (areaA !== areaB) return areaA < areaB;
  const matsA = a.rows * a.columns;
  const matsB = b.rows * b.columns;
  if (matsA !== matsB) return matsA < matsB;
  return Math.abs(a.width - a.height) < Math.abs(b.width - b.height);
}
