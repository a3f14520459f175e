import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import { restoreDesign } from '../../src/io/restore';
import { DESIGN_VERSION } from '../../src/model/design';

// A version-1 file (the demo as saved before parasitics were counted by crossing) must still load,
// through the one restore path, with its values carried over under their new names.
const VERSION_1 = readFileSync(new URL('../fixtures/design-version-1.json', import.meta.url), 'utf8');

describe('design format migration 1 → 2', () => {
  it('loads a version-1 file and keeps its per-cell values as per-crossing values', () => {
    const old = JSON.parse(VERSION_1) as { version: number; process: Record<string, number> };
    expect(old.version).toBe(1);
    const result = restoreDesign(VERSION_1);
    if (!result.ok) throw new Error(result.errors.join('; '));
    expect(result.migratedFrom).toBe(1);
    const p = result.design.process;
    expect(result.design.version).toBe(DESIGN_VERSION);
    expect(p.bitlineToWordlineCapacitancePerCrossing).toBe(old.process.bitlineToWordlineCapacitancePerCell);
    expect(p.wordlineGateCapacitancePerActiveCrossing).toBe(old.process.wordlineGateCapacitancePerCell);
    expect(p.wordlinePassingCapacitancePerCrossing).toBe(
      (old.process.wordlineGateCapacitancePerCell ?? 0) / 2,
    );
    // The file's own row cycle time was its author's choice: it becomes the override.
    expect(p.rowCycleTimeOverride).toBe(old.process.rowCycleTime);
    expect(result.design.operating.floorplanCopiesPerDie).toBe(1);
    const report = evaluate(result.design);
    expect(report.totals.refresh.rowCycleTimeOverridden).toBe(true);
    expect(report.totals.usableBits).toBe(report.totals.bits);
  });
});
