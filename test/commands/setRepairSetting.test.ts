import { describe, expect, it } from 'vitest';
import { setRepairSetting } from '../../src/commands/setRepairSetting';
import { yieldFiguresOf } from '../../src/engine';
import { expectRefused, runAndCheckChange } from '../support/commandSteps';

describe('yield-input commands', () => {
  it('set spare rows: run, undo, redo; the repair probability and the redundancy area follow', () => {
    const store = runAndCheckChange(
      setRepairSetting,
      { field: 'spareRows', value: 0 },
      (d) => d.operating.repair?.spareRows === 0,
    );
    const state = () => store.getState();
    const without = yieldFiguresOf(state().report, state().history.present);
    state().undo();
    const withSpares = yieldFiguresOf(state().report, state().history.present);
    expect(withSpares.redundancyArea).toBeGreaterThan(without.redundancyArea);
    expect(withSpares.repairProbability).toBeGreaterThanOrEqual(without.repairProbability);
  });

  it('set the repair domain: run, undo, redo', () => {
    runAndCheckChange(
      setRepairSetting,
      { field: 'repairDomain', value: 'bank' },
      (d) => d.operating.repair?.repairDomain === 'bank',
    );
  });

  it('refuses a negative defect density and a fractional spare count, and keeps the design', () => {
    expectRefused(setRepairSetting, { field: 'defectDensity', value: -1 }, /must not be negative/);
    expectRefused(setRepairSetting, { field: 'spareColumns', value: 1.5 }, /whole number/);
  });
});
