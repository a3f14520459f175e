import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/designs/demoDesign';
import { evaluate, type MatFigures, type Report } from '../../src/engine';
import { figureProblems } from '../support/figureInvariants';

// The fuzz tests' figure rules must be able to fail: each broken report below is caught.
// Source: common practice (no source).

/** The demo's report with the first kind of mat's figures changed. */
function withMatFigures(change: (f: MatFigures) => MatFigures): {
  report: Report;
  design: ReturnType<typeof demoDesign>;
} {
  const design = demoDesign();
  const report = evaluate(design);
  const [first, ...rest] = report.mats.figures;
  if (!first) throw new Error('the demo has mats');
  return { report: { ...report, mats: { ...report.mats, figures: [change(first), ...rest] } }, design };
}

describe('figure rules of the fuzz tests', () => {
  it('the demo passes', () => {
    const design = demoDesign();
    expect(figureProblems(evaluate(design), design)).toEqual([]);
  });

  it('catches an infinite, a negative and an out-of-bound per-mat figure', () => {
    const { report, design } = withMatFigures((f) => ({
      ...f,
      retentionTime: Infinity,
      bitlineLength: -1e-6,
      read: f.read.kind === 'chargeSharing' ? { ...f.read, chargeTransferRatio: 1.5 } : f.read,
    }));
    const problems = figureProblems(report, design).join('\n');
    expect(problems).toMatch(/retentionTime = Infinity/);
    expect(problems).toMatch(/bitlineLength = -0\.000001 < 0/);
    expect(problems).toMatch(/chargeTransferRatio = 1\.5 > 1/);
  });

  it('catches a NaN figure with no specific reason, and accepts one with a reason', () => {
    // A bit-line capacitance has no reason to be missing in a mat with usable bits.
    const { report, design } = withMatFigures((f) => ({
      ...f,
      bitlineCapacitance: { ...f.bitlineCapacitance, total: Number.NaN },
    }));
    expect(figureProblems(report, design)).toContain(
      'mat kind 0 (dram-folded-8f2): bitlineCapacitance is NaN without a reason',
    );
    // A static cell has no retention time: NaN with its reason is fine.
    const staticCell = withMatFigures((f) => ({ ...f, needsRefresh: false, retentionTime: Number.NaN }));
    expect(figureProblems(staticCell.report, staticCell.design).join('\n')).not.toMatch(/retentionTime/);
  });

  it('catches usable bits above bits and a total beyond its bound', () => {
    const { report, design } = withMatFigures((f) => ({ ...f, usableBits: f.bits + 1 }));
    expect(figureProblems(report, design).join('\n')).toMatch(/usableBits \d+ > bits/);
    const demo = demoDesign();
    const r = evaluate(demo);
    const over: Report = { ...r, totals: { ...r.totals, arrayEfficiency: 1.2, standbyPower: -Infinity } };
    const problems = figureProblems(over, demo).join('\n');
    expect(problems).toMatch(/arrayEfficiency = 1\.2 > 1/);
    expect(problems).toMatch(/standbyPower = -Infinity/);
  });
});
