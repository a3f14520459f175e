import { describe, expect, it, vi } from 'vitest';
import { primeEdits } from '../../src/app/editPrimer';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { prepareForEdits } from '../../src/engine';
import { ComponentsOnDemand } from '../../src/engine/evaluation/reachComponents';
import { reportState } from '../../src/engine/evaluation/reportState';
import type { Report } from '../../src/engine';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { createAppStore } from '../../src/store/appStore';
import { designWith } from '../support/designs';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';

function tiled(side: number) {
  return designWith(
    gridFloorplan({
      cell: FOLDED_8F2_CELL,
      featureSize: DEMO_PROCESS.featureSize,
      matRows: side,
      matColumns: side,
      cellsPerBitline: 256,
      cellsPerWordline: 256,
      ...DEMO_STRIPS,
    }),
  );
}

/** Whether every reach check of the report has its components labelled. */
function labelled(report: Report): boolean {
  const state = reportState(report);
  if (!state) throw new Error('the report has no state');
  return state.layout.reach.results.every(
    (r) => !(r.reach instanceof ComponentsOnDemand) || r.reach.isLabelled,
  );
}

describe('building the first edit’s starting point in idle time', () => {
  it('a whole evaluation leaves the components to first use; prepareForEdits labels them once', () => {
    const app = createAppStore(tiled(3));
    const { report } = app.getState();
    expect(labelled(report)).toBe(false);
    expect(prepareForEdits(report)).toBe(true);
    expect(labelled(report)).toBe(true);
    expect(prepareForEdits(report)).toBe(false);
  });

  it('runs in idle time for the store’s report and follows a newly opened design', () => {
    vi.useFakeTimers();
    try {
      const app = createAppStore(tiled(3));
      const stop = primeEdits(app);
      const first = app.getState().report;
      expect(labelled(first)).toBe(false);
      vi.runAllTimers();
      expect(labelled(first)).toBe(true);
      app.getState().startDocument(tiled(4), { documentId: 'second', inFile: true });
      const second = app.getState().report;
      expect(labelled(second)).toBe(false);
      vi.runAllTimers();
      expect(labelled(second)).toBe(true);
      stop();
    } finally {
      vi.useRealTimers();
    }
  });
});
