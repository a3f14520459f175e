import { describe, expect, it } from 'vitest';
import { generatedDemoGrid } from '../../src/designs/demoDesign';
import {
  estimateRepairProbability,
  evaluate,
  gridRepairPlan,
  matDomainShare,
  yieldFiguresOf,
  yieldOfDomains,
} from '../../src/engine';
import { DEFAULT_REPAIR } from '../../src/model/builtins';
import type { Design } from '../../src/model/design';
import type { RepairSettings } from '../../src/model/repair';

// Arithmetic and wiring checks (no published value): column repair per sense-amplifier strip segment in
// an evaluated floorplan, and the Monte Carlo on the very domains the closed form uses.

function withRepair(design: Design, repair: Partial<RepairSettings>, copies = 1): Design {
  return {
    ...design,
    operating: {
      ...design.operating,
      floorplanCopiesPerDie: copies,
      repair: { ...DEFAULT_REPAIR, dieArea: 1e-3, ...repair },
    },
  };
}

function yieldOf(design: Design) {
  return yieldFiguresOf(evaluate(design), design);
}

describe('column-repair domains are the sense-amplifier strip segments', () => {
  it('a 3 × 2 grid has 4 × 2 strips: the inner ones sense two mats, the edge ones one', () => {
    const design = withRepair(generatedDemoGrid(3, 2), { repairDomain: 'mat' });
    const y = yieldOf(design);
    expect(y.rowDomainsPerFloorplan).toBe(6);
    expect(y.columnDomainsPerFloorplan).toBe(8);
    const layout = y.monteCarlo?.layout;
    if (!layout) throw new Error('no layout');
    // Every mat meets two strips; each strip has half a mat's columns.
    expect(layout.tiles.count).toBe(12);
    const report = evaluate(design);
    const mat = report.mats.figures[0];
    if (!mat) throw new Error('no mat');
    const matColumns = mat.architecture === 'folded' ? mat.bitlineCount / 2 : mat.bitlineCount;
    for (const columns of layout.columnDomainColumns) expect(columns).toBe(matColumns / 2);
    const matsPerStrip = new Map<number, number>();
    for (const strip of layout.tiles.columnDomain)
      matsPerStrip.set(strip, (matsPerStrip.get(strip) ?? 0) + 1);
    expect([...matsPerStrip.values()].sort()).toEqual([1, 1, 1, 1, 2, 2, 2, 2]);
  });

  it('rows follow the row-domain setting; columns stay per strip', () => {
    const grid = generatedDemoGrid(3, 2);
    expect(yieldOf(withRepair(grid, { repairDomain: 'matRow' })).rowDomainsPerFloorplan).toBe(3);
    expect(yieldOf(withRepair(grid, { repairDomain: 'bank' })).rowDomainsPerFloorplan).toBe(1);
    expect(yieldOf(withRepair(grid, { repairDomain: 'bank' })).columnDomainsPerFloorplan).toBe(8);
  });

  it('spare columns cost a sense amplifier and one column of cells on each side they sense', () => {
    const grid = generatedDemoGrid(3, 2);
    const none = yieldOf(withRepair(grid, { spareRows: 0, spareColumns: 0, fuseArea: 0, compareBitArea: 0 }));
    const one = yieldOf(withRepair(grid, { spareRows: 0, spareColumns: 1, fuseArea: 0, compareBitArea: 0 }));
    expect(none.redundancyArea).toBe(0);
    const report = evaluate(grid);
    const mat = report.mats.figures[0];
    const strip = grid.blocks.find((b) => b.type === 'senseAmpStrip');
    if (!mat || !strip || strip.type === 'mat') throw new Error('no mat or strip');
    const matColumns = mat.architecture === 'folded' ? mat.bitlineCount / 2 : mat.bitlineCount;
    const half = matColumns / 2;
    const cellsPerColumn = mat.area / 2 / half;
    const stripPerColumn = (strip.width * strip.height) / half;
    // 4 edge strips (one side) and 4 inner strips (two sides).
    const expected = 4 * (stripPerColumn + cellsPerColumn) + 4 * (stripPerColumn + 2 * cellsPerColumn);
    expect(one.spareColumnArea).toBeCloseTo(expected, 18);
    expect(one.spareColumnArea / expected).toBeCloseTo(1, 9);
  });
});

describe('the explorer’s grid plan is the plan the report finds', () => {
  it('same repair probability, die yield and redundancy area for every row domain and spare count', () => {
    for (const repairDomain of ['mat', 'matRow', 'bank'] as const) {
      for (const spareColumns of [0, 1, 3]) {
        const base = withRepair(
          generatedDemoGrid(3, 2),
          { repairDomain, spareRows: 1, spareColumns, defectDensity: 1e7, killRatioCell: 1 },
          64,
        );
        // No weak-cell tail, so the mat's share needs no tail here.
        const design = { ...base, process: { ...base.process, tailCellFraction: 0 } };
        const report = evaluate(design);
        const fromReport = yieldFiguresOf(report, design);
        const mat = report.mats.figures[0];
        const strip = design.blocks.find((b) => b.type === 'senseAmpStrip');
        if (!mat || !strip || strip.type === 'mat') throw new Error('no mat or strip');
        const settings = fromReport.settings;
        const plan = gridRepairPlan(
          { matRows: 3, matColumns: 2, stripArea: strip.width * strip.height },
          settings,
          matDomainShare(mat, settings, design.operating.refreshWindow),
        );
        const fromGrid = yieldOfDomains({
          plan,
          mats: report.mats.figures,
          settings,
          floorplanCopiesPerDie: 64,
          retentionTail: { fraction: 0, medianLeakageMultiplier: 1, spread: 0 },
          refreshWindow: design.operating.refreshWindow,
          floorplanArea: report.totals.totalArea,
          usableBits: report.totals.usableBits,
        });
        expect(fromReport.repairProbabilityIsExact).toBe(false);
        const label = `${repairDomain}, C = ${spareColumns}`;
        // Compare what the spares fail to repair, so that a repair probability near 1 still tells them apart.
        expect(1 - fromReport.repairProbability, label).toBeGreaterThan(1e-4);
        expect((1 - fromGrid.repairProbability) / (1 - fromReport.repairProbability), label).toBeCloseTo(
          1,
          7,
        );
        expect(fromGrid.redundancyArea / fromReport.redundancyArea, label).toBeCloseTo(1, 9);
        expect(fromGrid.rowDomainsPerDie, label).toBe(fromReport.rowDomainsPerDie);
        expect(fromGrid.columnDomainsPerDie, label).toBe(fromReport.columnDomainsPerDie);
      }
    }
  });
});

describe('the Monte Carlo runs on the closed form’s domains', () => {
  it('line faults only: the exact closed form lies in the 95 % interval', () => {
    // Dense defects and no cell faults: rows and columns are independent, so the closed form is exact.
    const design = withRepair(
      generatedDemoGrid(4, 4),
      {
        defectDensity: 4e7 / 4,
        killRatioCell: 0,
        killRatioWordline: 1,
        killRatioBitline: 1,
        killRatioPeriphery: 0,
        spareRows: 1,
        spareColumns: 1,
        repairDomain: 'mat',
      },
      16,
    );
    // No weak-cell tail, so that no single-cell faults arise.
    const y = yieldOf({ ...design, process: { ...design.process, tailCellFraction: 0 } });
    if (!y.monteCarlo) throw new Error('no request');
    expect(y.faults.rows + y.faults.columns).toBeGreaterThan(1);
    const mc = estimateRepairProbability({ ...y.monteCarlo, seed: 8 }, 20_000);
    expect(y.repairProbabilityIsExact).toBe(true);
    expect(y.repairProbability).toBeGreaterThanOrEqual(mc.low);
    expect(y.repairProbability).toBeLessThanOrEqual(mc.high);
    expect(y.repairProbability).toBeGreaterThan(0.05);
    expect(y.repairProbability).toBeLessThan(0.95);
  });

  it('with cell faults the shown closed form is a lower bound of the estimate', () => {
    const design = withRepair(
      generatedDemoGrid(4, 4),
      { defectDensity: 4e7 / 4, killRatioPeriphery: 0, spareRows: 1, spareColumns: 1, repairDomain: 'mat' },
      2,
    );
    const y = yieldOf(design);
    if (!y.monteCarlo) throw new Error('no request');
    expect(y.repairProbabilityIsExact).toBe(false);
    const mc = estimateRepairProbability({ ...y.monteCarlo, seed: 8 }, 20_000);
    expect(y.repairProbability).toBeLessThanOrEqual(mc.high);
  });
});
