/**
 * The repair benchmark's die: 4,096 mats of 512 word lines × 512 bit-line pairs, each mat its own repair
 * domain with 2 spare rows and 2 spare columns. Fault rates are invented but of the order a DRAM die
 * repairs (a few tens of faults per die): per mat 1e-3 defect cells, 2e-4 defect rows and columns,
 * 2e-3 weak cells and 1e-3 failing sense amplifiers; 0.05 killing periphery defects per die; α = 2.
 */
import type { RepairMonteCarloRequest } from '../../src/engine/physics/repairMonteCarlo';

export const BENCH_MATS = 4096;
export const BENCH_TRIALS = 10_000;

export const BENCH_REPAIR_REQUEST: RepairMonteCarloRequest = {
  classes: [
    {
      count: BENCH_MATS,
      rows: 512,
      columns: 512,
      spareRows: 2,
      spareColumns: 2,
      defectFaults: { cells: 1e-3, rows: 2e-4, columns: 2e-4 },
      parametricFaults: { cells: 2e-3, rows: 0, columns: 1e-3 },
    },
  ],
  fatalDefects: 0.05,
  clustering: 2,
  seed: 20261205,
};
