import { describe, expect, it } from 'vitest';
import { ChartModelBuilder } from '../../src/explore/chartModelBuilder';
import { familySentences } from '../../src/explore/familyTally';
import { runSweepRange, sweepSize } from '../../src/explore/sweep';
import { encodeSweepChunk, SweepTable, SweepTextTables } from '../../src/explore/sweepColumns';
import { defaultSweepSettings, sweepRequestFor } from '../../src/explore/sweepSettings';
import { demoDesign } from '../../src/designs/demoDesign';

function sweptTable(): SweepTable {
  const design = demoDesign();
  const request = sweepRequestFor(
    {
      ...defaultSweepSettings(design),
      cellsPerBitline: { from: 64, to: 1024, step: 64 },
      cellsPerWordline: { from: 256, to: 1024, step: 256 },
    },
    design,
  );
  const table = new SweepTable();
  const tables = new SweepTextTables();
  const total = sweepSize(request);
  for (let s = 0; s < total; s += 97)
    table.append(encodeSweepChunk(runSweepRange(request, s, s + 97), tables));
  return table;
}

describe('a chart model built elsewhere (the sweep worker) and taken over by the page', () => {
  const table = sweptTable();
  const limits = { minMargin: 0.05, maxDelay: 3e-9 };

  it('gives the same model, tallies and sentences after a structured clone of its state', () => {
    const built = new ChartModelBuilder(table, 'areaPerBit', 'senseMargin', limits);
    built.update();
    const expected = built.snapshot();
    const state = structuredClone(built.state());
    const taken = new ChartModelBuilder(table, 'areaPerBit', 'senseMargin', limits, state);
    taken.update();
    const got = taken.snapshot();
    expect(got.count).toBe(expected.count);
    expect(got.count).toBeGreaterThan(0);
    expect(got.front).toEqual(expected.front);
    expect(got.counts).toEqual(expected.counts);
    expect(got.extent).toEqual(expected.extent);
    for (const column of ['row', 'x', 'y', 'cellIndex', 'processIndex', 'infeasible'] as const)
      expect([...got[column].subarray(0, got.count)]).toEqual([
        ...expected[column].subarray(0, expected.count),
      ]);
    expect(taken.tallies.cells()).toEqual(built.tallies.cells());
    expect(taken.tallies.cellProcesses()).toEqual(built.tallies.cellProcesses());
    const names = ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h'];
    expect(familySentences(taken.tallies, names, ['p', 'q'])).toEqual(
      familySentences(built.tallies, names, ['p', 'q']),
    );
  });

  it('goes on taking rows from where the state stopped', () => {
    const half = Math.floor(table.count / 2);
    const first = new ChartModelBuilder(table, 'areaPerBit', 'wordlineDelay', limits);
    first.update(half);
    const taken = new ChartModelBuilder(
      table,
      'areaPerBit',
      'wordlineDelay',
      limits,
      structuredClone(first.state()),
    );
    taken.update();
    const whole = new ChartModelBuilder(table, 'areaPerBit', 'wordlineDelay', limits);
    whole.update();
    expect(taken.snapshot().front).toEqual(whole.snapshot().front);
    expect(taken.snapshot().counts).toEqual(whole.snapshot().counts);
    expect(taken.tallies.cells()).toEqual(whole.tallies.cells());
  });
});
