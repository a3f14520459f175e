import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/designs/demoDesign';
import { evaluate, explainMatFigure, explainTotal, findMatReport } from '../../src/engine';

// Source: common practice (no source): a figure that does not exist shows "—" with its reason, never 0.

describe('figures that do not exist carry a reason', () => {
  const demo = demoDesign();
  const noStrips = { ...demo, blocks: demo.blocks.filter((b) => b.type !== 'senseAmpStrip') };
  const report = evaluate(noStrips);

  it('area per bit without a usable bit is NaN with the reason, not 0 µm²', () => {
    const e = explainTotal('areaPerBit', report, noStrips);
    expect(e?.value).toBeNaN();
    expect(e?.missingReason).toMatch(/no usable bit/);
  });

  it('a mat with no usable bit: its margin and tRC say why they do not exist', () => {
    const firstMat = noStrips.blocks.find((b) => b.type === 'mat');
    const mat = findMatReport(report, firstMat?.id ?? '');
    expect(mat).toBeDefined();
    if (!mat) return;
    for (const key of ['senseMargin', 'rowCycleTime'] as const) {
      const e = explainMatFigure(key, mat, noStrips, report);
      expect(e?.value).toBeNaN();
      expect(e?.missingReason).toMatch(/no usable bit/);
    }
  });

  it('retention with no margin to lose is NaN with the reason, not 0 s', () => {
    // Cs of 1 aF leaves far too little signal: nothing may droop.
    const starved = {
      ...demo,
      cells: demo.cells.map((c) => ({ ...c, storageCapacitance: 1e-18 })),
    };
    const r = evaluate(starved);
    const firstMat = starved.blocks.find((b) => b.type === 'mat');
    const mat = findMatReport(r, firstMat?.id ?? '');
    expect(mat?.figures.allowedDroop).toBe(0);
    if (!mat) return;
    const e = explainMatFigure('retentionTime', mat, starved, r);
    expect(e?.value).toBeNaN();
    expect(e?.missingReason).toMatch(/no margin to lose/);
    expect(r.totals.shortestRetention).toBeNaN();
    expect(explainTotal('shortestRetention', r, starved)?.missingReason).toMatch(/no margin to lose/);
  });

  it('a figure that exists carries no reason', () => {
    const full = evaluate(demo);
    expect(explainTotal('areaPerBit', full, demo)?.missingReason).toBeUndefined();
  });
});
