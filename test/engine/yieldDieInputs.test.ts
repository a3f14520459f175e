import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/designs/demoDesign';
import { evaluate, yieldFiguresOf } from '../../src/engine';
import type { Design } from '../../src/model/design';

// Arithmetic and wiring checks (no published value): the yield model reads the die's copy count from the
// operating conditions (the same one the offset budget uses) and the weak-cell tail from the process (the
// same two-population model as the weakest-cell retention).
function yieldOf(design: Design) {
  return yieldFiguresOf(evaluate(design), design);
}

describe('yield inputs shared with the physics', () => {
  it('uses the operating conditions’ floorplan copies per die', () => {
    const demo = demoDesign();
    const one = yieldOf({ ...demo, operating: { ...demo.operating, floorplanCopiesPerDie: 1 } });
    const many = yieldOf({ ...demo, operating: { ...demo.operating, floorplanCopiesPerDie: 64 } });
    expect(one.floorplanCopiesPerDie).toBe(1);
    expect(many.floorplanCopiesPerDie).toBe(64);
    expect(many.rowDomainsPerDie).toBe(64 * one.rowDomainsPerDie);
    expect(many.columnDomainsPerDie).toBe(64 * one.columnDomainsPerDie);
    // Defects scale with the die; the parametric share also moves, since k grows with the die.
    expect(many.defectFaults.cells / one.defectFaults.cells).toBeCloseTo(64, 9);
  });

  it('counts the weak-cell tail: tail cells leaking far more than the window allows fail, none without a tail', () => {
    const demo = demoDesign();
    const refresh = { ...demo.operating, refreshWindow: 0.064 };
    const noTail = yieldOf({
      ...demo,
      operating: refresh,
      process: { ...demo.process, tailCellFraction: 0 },
    });
    const leakyTail = yieldOf({
      ...demo,
      operating: refresh,
      process: {
        ...demo.process,
        tailCellFraction: 1e-4,
        tailLeakageMultiplier: 1e6,
        tailLeakageSpread: 0.5,
      },
    });
    expect(noTail.weakCellFraction).toBe(0);
    // Every tail cell leaks ~1e6× the typical one, so nearly the whole tail share misses the window.
    expect(leakyTail.weakCellFraction).toBeGreaterThan(0.9e-4);
    expect(leakyTail.weakCellFraction).toBeLessThanOrEqual(1e-4 + 1e-12);
    expect(leakyTail.parametricFaults.cells).toBeGreaterThan(noTail.parametricFaults.cells);
  });
});
