import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/designs/demoDesign';
import { evaluate, explainTotal, yieldFiguresOf } from '../../src/engine';
import { weakCellFraction } from '../../src/engine/physics/faultRates';
import type { Design } from '../../src/model/design';
import { figureProblems } from '../support/figureInvariants';

// Inputs the figure fuzz (test/io/restore.fuzz.test.ts) once found, kept so that they stay fixed.
// Source for each expectation: arithmetic, or the rule "finite, or NaN with a reason" (common practice, no source).

function withProcess(change: Partial<Design['process']>): Design {
  const d = demoDesign();
  return { ...d, process: { ...d.process, ...change } };
}

describe('figures of designs the fuzzer found', () => {
  it('zero cell leakage with a mat that has no margin to lose: weak cells counted, not NaN', () => {
    // Bit-line resistance ×1000 leaves no margin to lose (retention for yield 0 s); zero leakage makes the
    // tail's median leakage 0 as well, and ln 0 − ln 0 made the weak-cell share NaN.
    const d = demoDesign();
    const design = withProcess({
      cellLeakageCurrent: 0,
      bitlineResistancePerLength: d.process.bitlineResistancePerLength * 1000,
    });
    const report = evaluate(design);
    const y = yieldFiguresOf(report, design);
    expect(y.weakCellFraction).toBe(1);
    expect(Number.isFinite(y.faults.cells)).toBe(true);
    expect(figureProblems(report, design)).toEqual([]);
  });

  it('the weak-cell share is 1 whenever typical cells miss the window, whatever the tail', () => {
    // Source: arithmetic (r = 0 / 64 ms < 1; tail median leakage 0 gives ln 0 in the tail's z).
    expect(weakCellFraction(0, 0.064, { fraction: 1e-3, medianLeakageMultiplier: 0, spread: 0.5 })).toBe(1);
    expect(weakCellFraction(0.032, 0.064, { fraction: 1e-3, medianLeakageMultiplier: 10, spread: 0.5 })).toBe(
      1,
    );
    // r = 10 with a tail median of 0: no tail cell fails.
    expect(weakCellFraction(0.64, 0.064, { fraction: 1e-3, medianLeakageMultiplier: 0, spread: 0.5 })).toBe(
      0,
    );
  });

  it('a word line that never turns on: refresh cycle time and busy fraction do not exist, with the reason', () => {
    // Word-line high voltage halved: no mat's word line reaches Vpre + Vt, so no row cycle ends.
    const d = demoDesign();
    const design = withProcess({ wordlineHighVoltage: d.process.wordlineHighVoltage * 0.5 });
    const report = evaluate(design);
    expect(Number.isNaN(report.totals.refresh.cycleTime)).toBe(true);
    const cycle = explainTotal('refreshCycleTime', report, design);
    expect(cycle?.missingReason).toMatch(/no row cycle time/);
    expect(explainTotal('refreshBusyFraction', report, design)?.missingReason).toMatch(/no row cycle time/);
    // The slowest tRCD and tRC rows (added after the fuzz first ran) say why as well.
    expect(Number.isNaN(report.totals.worstRowCycleTime)).toBe(true);
    expect(explainTotal('worstRowCycleTime', report, design)?.missingReason).toMatch(/turn-on level/);
    expect(explainTotal('worstRowToColumnDelay', report, design)?.missingReason).toMatch(/turn-on level/);
    expect(figureProblems(report, design)).toEqual([]);
  });
});
