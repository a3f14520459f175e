import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildPartition } from '../../src/designs/buildPartition';
import { evaluate } from '../../src/engine';
import { figuresFromReport, type FigureKey } from '../../src/engine';
import { partitionFigures, ProcessCache } from '../../src/explore/partitionFigures';
import { matGeometry } from '../../src/geometry/matGeometry';
import {
  BUILTIN_CELLS,
  BUILTIN_PROCESSES,
  DEFAULT_OPERATING,
  DEMO_PROCESS,
  FOLDED_8F2_CELL,
} from '../../src/model/builtins';
import { expectRelativelyClose } from '../support/close';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';

const NUMERIC: readonly FigureKey[] = [
  'matCount',
  'usableBits',
  'totalArea',
  'cellArea',
  'areaPerBit',
  'areaPerBitInF2',
  'arrayEfficiency',
  'senseMargin',
  'senseSignalAtRefresh',
  'requiredSignal',
  'wordlineDelay',
  'wordlineResistance',
  'wordlineCapacitance',
  'activationEnergyPerBit',
  'activationEnergy',
  'cellsPerWordline',
  'rowToColumnDelay',
  'wordlineTurnOn',
  'senseFireWait',
  'latchTime',
  'rowCycleTime',
  'rowActiveTime',
  'rowPrechargeTime',
  'retentionTime',
  'weakestRetentionTime',
  'refreshCycleTime',
  'refreshInterval',
  'refreshBusyFraction',
  'refreshPower',
  'dieYield',
  'repairProbability',
  'redundancyArea',
  'areaPerBitWithRedundancy',
  'goodDiesPerWafer',
];

const specArbitrary = fc
  .record({
    cell: fc.constantFrom(...BUILTIN_CELLS),
    process: fc.constantFrom(...BUILTIN_PROCESSES),
    cellsPerBitline: fc.integer({ min: 8, max: 2048 }),
    cellsPerWordline: fc.integer({ min: 8, max: 2048 }),
    mats: fc.double({ min: 0.01, max: 150, noNaN: true }),
    senseAmpStripHeight: fc.double({ min: 0.5e-6, max: 20e-6, noNaN: true }),
    wordlineDriverStripWidth: fc.double({ min: 0.5e-6, max: 10e-6, noNaN: true }),
    rowDecoderWidth: fc.constantFrom(0, 7e-6, 18e-6),
    columnDecoderHeight: fc.constantFrom(0, 5e-6, 14e-6),
    refreshWindow: fc.constantFrom(64e-3, 32e-3, 50e-6),
  })
  .map((r) => {
    const g = matGeometry(
      {
        id: 'p',
        name: '',
        type: 'mat',
        x: 0,
        y: 0,
        cellId: r.cell.id,
        cellsPerBitline: r.cellsPerBitline,
        cellsPerWordline: r.cellsPerWordline,
        bitlineAxis: 'vertical',
      },
      r.cell,
      r.process.featureSize,
    );
    return {
      targetBits: Math.max(1, Math.round(r.mats * g.bits)),
      cell: r.cell,
      process: r.process,
      operating: { ...DEFAULT_OPERATING, refreshWindow: r.refreshWindow },
      cellsPerBitline: r.cellsPerBitline,
      cellsPerWordline: r.cellsPerWordline,
      strips: {
        senseAmpStripHeight: r.senseAmpStripHeight,
        wordlineDriverStripWidth: r.wordlineDriverStripWidth,
        rowDecoderWidth: r.rowDecoderWidth,
        columnDecoderHeight: r.columnDecoderHeight,
      },
    };
  });

describe('fast partition figures agree with evaluate() on the built design', () => {
  it('for every figure, within 1e-9 relative (property, arithmetic)', () => {
    const cache = new ProcessCache();
    fc.assert(
      fc.property(specArbitrary, (spec) => {
        const fast = partitionFigures(spec, cache);
        const built = buildPartition(spec);
        expect(fast.ok).toBe(built.ok);
        if (!fast.ok || !built.ok) return;
        const slow = figuresFromReport(evaluate(built.design), built.design);
        for (const key of NUMERIC) expectRelativelyClose(fast.figures[key], slow[key], 1e-9, key);
        expect(fast.figures.errorKinds).toEqual(slow.errorKinds);
        expect(fast.figures.warningKinds).toEqual(slow.warningKinds);
      }),
      { numRuns: 150, seed: 20_240_611 },
    );
  }, 60_000);

  it('a cell that does not leak: the explorer floors the leakage as evaluate() does (finite retention, same checks)', () => {
    const spec = {
      targetBits: 4 * 2 ** 20,
      cell: FOLDED_8F2_CELL,
      process: { ...DEMO_PROCESS, cellLeakageCurrent: 0 },
      operating: DEFAULT_OPERATING,
      cellsPerBitline: 512,
      cellsPerWordline: 512,
      strips: {
        ...DEMO_STRIPS,
        rowDecoderWidth: 0,
        columnDecoderHeight: 0,
      },
    };
    const fast = partitionFigures(spec);
    const built = buildPartition(spec);
    if (!fast.ok || !built.ok) throw new Error('expected a plan');
    const slow = figuresFromReport(evaluate(built.design), built.design);
    expect(Number.isFinite(fast.figures.retentionTime)).toBe(true);
    for (const key of NUMERIC) expectRelativelyClose(fast.figures[key], slow[key], 1e-9, key);
    expect(fast.figures.errorKinds).toEqual(slow.errorKinds);
    expect(fast.figures.warningKinds).toEqual(slow.warningKinds);
  });

  it('for the demo-like 64 Mib folded bank, figure by figure', () => {
    const spec = {
      targetBits: 64 * 2 ** 20,
      cell: FOLDED_8F2_CELL,
      process: DEMO_PROCESS,
      operating: DEFAULT_OPERATING,
      cellsPerBitline: 512,
      cellsPerWordline: 512,
      strips: DEMO_STRIPS,
    };
    const fast = partitionFigures(spec);
    const built = buildPartition(spec);
    if (!fast.ok || !built.ok) throw new Error('expected a plan');
    const slow = figuresFromReport(evaluate(built.design), built.design);
    for (const key of NUMERIC) expectRelativelyClose(fast.figures[key], slow[key], 1e-9, key);
    expect(fast.figures.errorKinds).toEqual([]);
  });
});
