import { describe, expect, it } from 'vitest';
import { AXIS_FIGURES } from '../../src/engine';
import { chartModel, type FeasibilityLimits } from '../../src/explore/chartData';
import { cellProcessTallies, familyTallies, infeasibleFamilySentences } from '../../src/explore/familyTally';
import { ChartModelBuilder, type ColumnChartModel } from '../../src/explore/chartModelBuilder';
import { runSweepRange, sweepSize } from '../../src/explore/sweep';
import { encodeSweepChunk, SweepTable, SweepTextTables } from '../../src/explore/sweepColumns';
import { defaultSweepSettings, sweepRequestFor } from '../../src/explore/sweepSettings';
import { demoDesign } from '../../src/designs/demoDesign';

const design = demoDesign();
const request = sweepRequestFor(
  {
    ...defaultSweepSettings(design),
    cellsPerBitline: { from: 64, to: 1024, step: 128 },
    cellsPerWordline: { from: 8, to: 2048, step: 256 },
  },
  design,
);
const points = runSweepRange(request, 0, sweepSize(request));

function tableOf(chunkSize: number): SweepTable {
  const tables = new SweepTextTables();
  const table = new SweepTable();
  for (let s = 0; s < points.length; s += chunkSize)
    table.append(encodeSweepChunk(points.slice(s, s + chunkSize), tables));
  return table;
}

/** The builder's model in chartModel()'s terms. */
function asBatch(model: ColumnChartModel) {
  const plotted = [];
  const onFront = new Set(model.front);
  for (let i = 0; i < model.count; i++) {
    plotted.push({
      point: model.row[i],
      x: model.x[i],
      y: model.y[i],
      cellIndex: model.cellIndex[i],
      processIndex: model.processIndex[i],
      state: onFront.has(i) ? 'front' : model.infeasible[i] ? 'infeasible' : 'feasible',
    });
  }
  return { plotted, front: [...model.front], counts: model.counts };
}

describe('chart model built as the points arrive', () => {
  it('equals the batch chart model after every chunk, for every pair of axes and several limits', () => {
    const limitsList: FeasibilityLimits[] = [
      { minMargin: 0.02, maxDelay: 0.5e-9 },
      { minMargin: 0, maxDelay: 3e-9 },
      { minMargin: -1, maxDelay: Infinity },
    ];
    const table = tableOf(37);
    let checks = 0;
    for (const limits of limitsList) {
      for (const x of AXIS_FIGURES) {
        for (const y of AXIS_FIGURES) {
          if (x === y) continue;
          const builder = new ChartModelBuilder(table, x, y, limits);
          // Rows taken in unevenly, as flushes take them.
          for (const upTo of [1, 40, 41, 200, points.length]) {
            builder.update(upTo);
            const model = builder.snapshot();
            expect(asBatch(model)).toEqual(chartModel(points.slice(0, upTo), x, y, limits));
            const xs = Array.from(model.x.subarray(0, model.count));
            const ys = Array.from(model.y.subarray(0, model.count));
            expect(model.extent.x).toEqual(
              xs.length ? [Math.min(...xs), Math.max(...xs)] : [Infinity, -Infinity],
            );
            expect(model.extent.y).toEqual(
              ys.length ? [Math.min(...ys), Math.max(...ys)] : [Infinity, -Infinity],
            );
            checks++;
          }
        }
      }
    }
    expect(checks).toBeGreaterThan(100);
  }, 60_000);

  it('covers a front with ties and points that leave it as better ones arrive', () => {
    const limits = { minMargin: 0, maxDelay: 3e-9 };
    const model = chartModel(points, 'areaPerBit', 'senseMargin', limits);
    expect(model.front.length).toBeGreaterThan(1);
    const early = chartModel(points.slice(0, 60), 'areaPerBit', 'senseMargin', limits);
    const finalFront = new Set(model.front.map((i) => model.plotted[i]?.point));
    // Some point on the early front is not on the final one: the merge must drop it.
    expect(early.front.some((i) => !finalFront.has(early.plotted[i]?.point))).toBe(true);
  });

  it('tallies why families are infeasible as the batch tallies do', () => {
    const table = tableOf(100);
    const limits = { minMargin: 0.05, maxDelay: 1e-9 };
    const builder = new ChartModelBuilder(table, 'areaPerBit', 'senseMargin', limits);
    for (const upTo of [150, 151, points.length]) {
      builder.update(upTo);
      const seen = points.slice(0, upTo);
      expect(builder.tallies.cells()).toEqual(familyTallies(seen, limits));
      expect(builder.tallies.cellProcesses()).toEqual(cellProcessTallies(seen, limits));
    }
    const names = request.cells.map((c) => c.name);
    expect(infeasibleFamilySentences(points, names, limits).length).toBeGreaterThan(0);
  });

  it('takes in nothing twice: updating again without new rows changes nothing', () => {
    const table = tableOf(500);
    const builder = new ChartModelBuilder(table, 'areaPerBit', 'senseMargin', {
      minMargin: 0,
      maxDelay: 3e-9,
    });
    builder.update();
    const once = asBatch(builder.snapshot());
    builder.update();
    builder.update(10);
    expect(asBatch(builder.snapshot())).toEqual(once);
    expect(builder.taken).toBe(points.length);
  });
});
