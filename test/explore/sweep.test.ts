import { describe, expect, it } from 'vitest';
import { partitionFigures } from '../../src/explore/partitionFigures';
import {
  pointBuildSpec,
  runSweepRange,
  steppedValues,
  sweepCoordinates,
  sweepSize,
  type SweepRequest,
} from '../../src/explore/sweep';
import { BUILTIN_CELLS, BUILTIN_PROCESSES, DEFAULT_OPERATING } from '../../src/model/builtins';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';

const request: SweepRequest = {
  targetBits: 32 * 2 ** 20,
  strips: DEMO_STRIPS,
  operating: DEFAULT_OPERATING,
  cellsPerBitline: [64, 128, 256, 512],
  cellsPerWordline: [8, 256, 512],
  cells: BUILTIN_CELLS,
  processes: BUILTIN_PROCESSES,
};

describe('sweep core', () => {
  it('visits every combination once, and chunks add up to the whole', () => {
    const n = sweepSize(request);
    expect(n).toBe(4 * 3 * BUILTIN_CELLS.length * 3);
    const whole = runSweepRange(request, 0, n);
    const chunked = [0, 50, 100, 150, n].flatMap((s, k, a) =>
      k + 1 < a.length ? runSweepRange(request, s, a[k + 1] ?? n) : [],
    );
    expect(chunked).toEqual(whole);
    const combos = new Set(
      whole.map((p) => `${p.cellsPerBitline}/${p.cellsPerWordline}/${p.cellIndex}/${p.processIndex}`),
    );
    expect(combos.size).toBe(n);
  });

  it('gives each point the figures of its own partition, or says why it has none', () => {
    const points = runSweepRange(request, 0, sweepSize(request));
    for (const p of points.filter((_, i) => i % 17 === 0)) {
      // A sweep without spares leaves the yield figures out (NaN), and so does this direct call.
      const direct = partitionFigures(pointBuildSpec(request, p), undefined, { withYield: false });
      expect(direct.ok ? direct.figures : null).toEqual(p.figures);
    }
    // 8 cells per word line make mats so small that 32 Mib needs too many of them.
    const tiny = points.filter((p) => p.cellsPerWordline === 8 && p.cellsPerBitline === 64);
    expect(tiny.every((p) => p.figures === null && /mats/.test(p.problem ?? ''))).toBe(true);
  });

  it('decodes indices with cells per word line fastest and the process slowest', () => {
    expect(sweepCoordinates(request, 0)).toEqual({
      cellsPerBitline: 64,
      cellsPerWordline: 8,
      cellIndex: 0,
      processIndex: 0,
      spareRows: null,
      spareColumns: null,
    });
    expect(sweepCoordinates(request, 1)).toEqual({
      cellsPerBitline: 64,
      cellsPerWordline: 256,
      cellIndex: 0,
      processIndex: 0,
      spareRows: null,
      spareColumns: null,
    });
    expect(sweepCoordinates(request, 3).cellsPerBitline).toBe(128);
    expect(sweepCoordinates(request, 12).cellIndex).toBe(1);
    expect(sweepCoordinates(request, 12 * BUILTIN_CELLS.length).processIndex).toBe(1);
  });

  it('steps values inclusively and refuses a step that goes nowhere', () => {
    expect(steppedValues(64, 256, 64)).toEqual([64, 128, 192, 256]);
    expect(steppedValues(100, 120, 7)).toEqual([100, 107, 114]);
    expect(steppedValues(5, 1, 1)).toEqual([]);
    expect(steppedValues(1, 5, 0)).toEqual([]);
  });
});

describe('sweeping spares', () => {
  const withSpares: SweepRequest = {
    ...request,
    cellsPerBitline: [512],
    cellsPerWordline: [512],
    cells: request.cells.slice(0, 1),
    processes: request.processes.slice(0, 1),
    spares: { rows: [0, 1, 2], columns: [0, 2] },
  };

  it('assesses every partition with every spare pair, spare rows slowest; each point as built alone', () => {
    expect(sweepSize(withSpares)).toBe(6);
    const points = runSweepRange(withSpares, 0, 6);
    expect(points.map((p) => [p.spareRows, p.spareColumns])).toEqual([
      [0, 0],
      [0, 2],
      [1, 0],
      [1, 2],
      [2, 0],
      [2, 2],
    ]);
    expect(points.every((p) => p.figures && Number.isFinite(p.figures.dieYield))).toBe(true);
    for (const p of points) {
      const direct = partitionFigures(pointBuildSpec(withSpares, p));
      expect(direct.ok ? direct.figures : null).toEqual(p.figures);
    }
  });

  it('more spares: repair probability never falls and redundancy area grows; no spare sweep leaves yield out', () => {
    const points = runSweepRange(withSpares, 0, 6);
    const at = (r: number, c: number) =>
      points.find((p) => p.spareRows === r && p.spareColumns === c)?.figures;
    expect(at(2, 2)?.repairProbability ?? 0).toBeGreaterThanOrEqual(at(0, 0)?.repairProbability ?? 1);
    expect(at(2, 2)?.redundancyArea ?? 0).toBeGreaterThan(at(0, 0)?.redundancyArea ?? Infinity);
    const plain = runSweepRange({ ...withSpares, spares: undefined }, 0, 1)[0];
    expect(plain?.spareRows).toBeNull();
    expect(Number.isNaN(plain?.figures?.dieYield)).toBe(true);
  });
});
