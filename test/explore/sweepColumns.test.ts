import { describe, expect, it } from 'vitest';
import { BANK_FIGURE_CATALOGUE, bankMissingReason, type FigureKey } from '../../src/engine';
import { runSweepRange, sweepSize, type SweepPoint, type SweepRequest } from '../../src/explore/sweep';
import {
  chunkBuffers,
  encodeSweepChunk,
  FIGURE_COLUMNS,
  SweepTable,
  SweepTextTables,
} from '../../src/explore/sweepColumns';
import { BUILTIN_CELLS, BUILTIN_PROCESSES, DEFAULT_OPERATING } from '../../src/model/builtins';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';

const request: SweepRequest = {
  targetBits: 32 * 2 ** 20,
  strips: DEMO_STRIPS,
  operating: DEFAULT_OPERATING,
  // 8 cells per word line: too many mats for the capacity, so those points have no plan.
  cellsPerBitline: [64, 256, 1024],
  cellsPerWordline: [8, 256, 2048],
  cells: BUILTIN_CELLS,
  processes: BUILTIN_PROCESSES,
};
/** The same partitions with spares swept: yield figures finite, spare columns set. */
const withSpares: SweepRequest = {
  ...request,
  cellsPerBitline: [256],
  cellsPerWordline: [8, 512],
  spares: { rows: [0, 2], columns: [1] },
};

/** Encodes the points in chunks of `size` (one run's text tables) and appends them to a table. */
function throughColumns(points: readonly SweepPoint[], size: number): SweepTable {
  const tables = new SweepTextTables();
  const table = new SweepTable();
  for (let s = 0; s < points.length; s += size) {
    const chunk = encodeSweepChunk(points.slice(s, s + size), tables);
    // What crosses to the page is a structured clone with the buffers moved: do the same here.
    table.append(structuredClone(chunk, { transfer: chunkBuffers(chunk) }));
  }
  return table;
}

describe('sweep points as columns', () => {
  const plain = runSweepRange(request, 0, sweepSize(request));
  const spared = runSweepRange(withSpares, 0, sweepSize(withSpares));

  it('a table takes over the rows of another (the worker’s, through a structured clone) and goes on', () => {
    for (const points of [plain, spared]) {
      const whole = throughColumns(points, 7);
      const page = throughColumns(points.slice(0, 10), 7);
      const state = whole.state();
      page.adopt(structuredClone(state, { transfer: SweepTable.buffers(state) }));
      expect(page.count).toBe(points.length);
      expect(page.points()).toEqual(points);
      // Rows appended after the takeover land after it.
      const tables = new SweepTextTables();
      const more = points.slice(0, 3);
      encodeSweepChunk(points, tables);
      page.append(encodeSweepChunk(more, tables));
      expect(page.points().slice(points.length)).toEqual(more);
    }
    expect(() =>
      throughColumns(plain.slice(0, 5), 5).adopt(throughColumns(plain.slice(0, 2), 2).state()),
    ).toThrow();
  });

  it('has a column for every numeric figure of a point', () => {
    const f = plain.find((p) => p.figures)?.figures;
    if (!f) throw new Error('expected a planned point');
    const numeric = Object.keys(f).filter((k) => typeof f[k as keyof typeof f] === 'number');
    expect([...FIGURE_COLUMNS].sort()).toEqual(numeric.sort());
    for (const entry of BANK_FIGURE_CATALOGUE) expect(FIGURE_COLUMNS).toContain(entry.key);
  });

  it('gives back every point exactly: indices, spares, every figure, check kinds and problems', () => {
    for (const points of [plain, spared]) {
      for (const size of [1, 7, 500]) {
        const table = throughColumns(points, size);
        expect(table.count).toBe(points.length);
        expect(table.points()).toEqual(points);
      }
    }
    // The data holds what the test means to cover.
    expect(plain.some((p) => p.figures === null && /mats/.test(p.problem ?? ''))).toBe(true);
    expect(plain.some((p) => (p.figures?.errorKinds.length ?? 0) > 1)).toBe(true);
    expect(plain.some((p) => (p.figures?.warningKinds.length ?? 0) > 0)).toBe(true);
    expect(spared.some((p) => p.spareRows === 2 && p.figures && Number.isFinite(p.figures.dieYield))).toBe(
      true,
    );
  });

  it('keeps each missing figure missing for the same reason', () => {
    const table = throughColumns(plain, 50);
    let missing = 0;
    plain.forEach((p, row) => {
      const before = p.figures;
      const after = table.point(row).figures;
      if (!before || !after) {
        expect(after).toBe(before);
        return;
      }
      for (const key of FIGURE_COLUMNS as FigureKey[]) {
        expect(Number.isNaN(after[key])).toBe(Number.isNaN(before[key]));
        if (Number.isNaN(before[key])) {
          missing++;
          expect(bankMissingReason(key, after)).toBe(bankMissingReason(key, before));
        }
      }
    });
    // Without spares every yield figure is missing, at least.
    expect(missing).toBeGreaterThan(plain.length);
  });

  it('reads columns, plan state and check kinds by row, and finds a row by its sweep index', () => {
    const table = throughColumns(plain, 64);
    const margins = table.figure('senseMargin');
    plain.forEach((p, row) => {
      expect(table.planned(row)).toBe(p.figures !== null);
      expect(table.errorKinds(row)).toEqual(p.figures?.errorKinds ?? []);
      if (p.figures) expect(margins[row]).toBe(p.figures.senseMargin);
      expect(table.rowOf(p.index)).toBe(row);
    });
    expect(table.rowOf(plain.length + 3)).toBe(-1);
  });

  it('sends each check-kind list and problem text once per run', () => {
    const tables = new SweepTextTables();
    const first = encodeSweepChunk(plain.slice(0, plain.length / 2), tables);
    const second = encodeSweepChunk(plain.slice(plain.length / 2), tables);
    const firstLists = new Set(first.newKindLists.map((l) => l.join()));
    expect(firstLists.size).toBe(first.newKindLists.length);
    for (const list of second.newKindLists) expect(firstLists.has(list.join())).toBe(false);
  });
});
