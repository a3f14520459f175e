import { describe, expect, it } from 'vitest';
import { chartModel, infeasibleBecause, infeasibleReasons, isFeasible } from '../../src/explore/chartData';
import { AXIS_FIGURES, bankFigureEntry, explainFigure, TABLE_FIGURES } from '../../src/engine';
import { dominates } from '../../src/explore/pareto';
import { runSweepRange, sweepSize } from '../../src/explore/sweep';
import { defaultSweepSettings, sweepRequestFor } from '../../src/explore/sweepSettings';
import { demoDesign } from '../../src/designs/demoDesign';

const design = demoDesign();
const request = sweepRequestFor(
  {
    ...defaultSweepSettings(design),
    cellsPerBitline: { from: 64, to: 1024, step: 128 },
    cellsPerWordline: { from: 128, to: 2048, step: 256 },
  },
  design,
);
const points = runSweepRange(request, 0, sweepSize(request));
const limits = { minMargin: 0.02, maxDelay: 0.5e-9 };

describe('chart model', () => {
  it('marks exactly the points that pass the checks and both limits as feasible', () => {
    const model = chartModel(points, 'areaPerBit', 'senseMargin', limits);
    for (const p of model.plotted) {
      const f = points[p.point]?.figures;
      if (!f) throw new Error('plotted a point without figures');
      const ok = f.errorKinds.length === 0 && f.senseMargin >= 0.02 && f.wordlineDelay <= 0.5e-9;
      expect(p.state !== 'infeasible').toBe(ok);
      expect(infeasibleBecause(f, limits).length === 0).toBe(ok);
      expect(infeasibleReasons(f, limits).length === 0).toBe(ok);
      expect(isFeasible(f, limits)).toBe(ok);
    }
    expect(model.counts.feasible).toBeGreaterThan(0);
    expect(model.counts.feasible).toBeLessThan(model.counts.plotted);
  });

  // Every pair of axes over the whole sweep: its own time limit on a busy machine.
  it('puts on the front only feasible points that no feasible point dominates, for every pair of axes', () => {
    for (const x of AXIS_FIGURES) {
      for (const y of AXIS_FIGURES) {
        if (x === y) continue;
        const model = chartModel(points, x, y, limits);
        const dx = bankFigureEntry(x).better === 'higher' ? 'max' : 'min';
        const dy = bankFigureEntry(y).better === 'higher' ? 'max' : 'min';
        const feasible = model.plotted.filter((p) => p.state !== 'infeasible');
        const onFront = new Set(model.front);
        model.plotted.forEach((p, i) => {
          const dominated = feasible.some((q) => dominates(q, p, dx, dy));
          expect(onFront.has(i)).toBe(p.state !== 'infeasible' && !dominated);
        });
      }
    }
  }, 60_000);

  it('says why a point is infeasible', () => {
    const failing = points.find((p) => p.figures && p.figures.errorKinds.includes('senseAmpPitch'));
    if (!failing?.figures) throw new Error('expected a point failing the pitch check');
    expect(infeasibleBecause(failing.figures, limits).join('; ')).toMatch(
      /failing check: .*sense-amplifier pitch/,
    );
  });
});

describe('figure explanations', () => {
  it('explain every charted and compared figure with its own value, a formula and a source', () => {
    const f = points.find((p) => p.figures)?.figures;
    if (!f) throw new Error('no figures');
    for (const key of new Set([...AXIS_FIGURES, ...TABLE_FIGURES])) {
      const e = explainFigure(key, f, {
        featureSize: 18e-9,
        wordlineDriverResistance: 3e3,
        refreshWindow: 64e-3,
      });
      expect(e.value).toBe(f[key]);
      expect(e.formula.length).toBeGreaterThan(3);
      expect(e.source.length).toBeGreaterThan(3);
      expect(e.quantity).toBe(bankFigureEntry(key).quantity);
    }
  });
});
