/**
 * The repair benchmark's die: 4,096 mats (64 × 64) of 512 word lines × 512 bit-line pairs, each mat its own
 * row-repair domain with 2 spare rows, and a sense-amplifier strip above and below every mat (the inner
 * ones shared by two mats), each strip a column-repair domain with 2 spare columns. Fault rates are
 * invented but of the order a DRAM die repairs (a few tens of faults per die): per mat 1e-3 defect cells,
 * 2e-4 defect rows and columns, 2e-3 weak cells and 1e-3 failing sense amplifiers; 0.05 killing periphery
 * defects per die; α = 2.
 */
import { repairTiles, type RepairLayout, type RepairTile } from '../../src/engine/physics/repairLayout';
import type { RepairMonteCarloRequest } from '../../src/engine/physics/repairMonteCarlo';

export const BENCH_MATS = 4096;
export const BENCH_TRIALS = 10_000;

const SIDE = 64;
const ROWS = 512;
const COLUMNS = 512;

function benchLayout(): RepairLayout {
  const defects = { cells: 1e-3 / 2, rows: 2e-4 / 2, columns: 2e-4 / 2 };
  const parametric = { cells: 2e-3 / 2, rows: 0, columns: 1e-3 / 2 };
  const tiles: RepairTile[] = [];
  for (let r = 0; r < SIDE; r++) {
    for (let c = 0; c < SIDE; c++) {
      for (const s of [r, r + 1]) {
        tiles.push({
          rowDomain: r * SIDE + c,
          rowOffset: 0,
          rows: ROWS,
          columnDomain: s * SIDE + c,
          columnOffset: 0,
          columns: COLUMNS / 2,
          defects,
          parametric,
        });
      }
    }
  }
  return {
    rowDomainRows: new Array<number>(SIDE * SIDE).fill(ROWS),
    columnDomainColumns: new Array<number>((SIDE + 1) * SIDE).fill(COLUMNS / 2),
    tiles: repairTiles(tiles),
  };
}

export const BENCH_REPAIR_REQUEST: RepairMonteCarloRequest = {
  layout: benchLayout(),
  copies: 1,
  spareRows: 2,
  spareColumns: 2,
  fatalDefects: 0.05,
  clustering: 2,
  seed: 20261205,
};
