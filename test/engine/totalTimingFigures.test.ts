import { describe, expect, it } from 'vitest';
import { demoDesign } from '../../src/designs/demoDesign';
import {
  allMats,
  evaluate,
  explainTotal,
  TOTAL_FIGURE_PANEL,
  upperTailQuantile,
  type TotalFigureKey,
} from '../../src/engine';
import { reportSummary } from '../../src/io/summary';
import { reportTable } from '../../src/io/reportTable';
import { SRAM_6T_CELL } from '../../src/model/builtins';

// Whole-design rows for the row timing chain, the weakest cell, die-scale statistics and standby power.
// Every expected value here is arithmetic on the engine's own per-mat figures (labelled so): the totals
// must agree with the mats they summarise and with the inputs their explanations list.

const NEW_KEYS = [
  'worstRowToColumnDelay',
  'worstRowCycleTime',
  'shortestWeakestRetention',
  'senseAmpCount',
  'senseAmpsOnDie',
  'offsetSigmaMultiplier',
  'standbyPower',
] as const satisfies readonly TotalFigureKey[];

describe('whole-design timing, weakest-cell and die-scale rows', () => {
  const demo = demoDesign();
  const report = evaluate(demo);
  const t = report.totals;
  const mats = allMats(report.mats);
  /** The value of one input of a whole-design figure's explanation on the demo. */
  const inputOf = (key: TotalFigureKey, symbol: string) =>
    explainTotal(key, report, demo)?.inputs.find((i) => i.symbol === symbol)?.value ?? Number.NaN;

  it('are shown in a panel group and explained (arithmetic)', () => {
    const shown = TOTAL_FIGURE_PANEL.flatMap((g) => g.keys);
    for (const key of NEW_KEYS) {
      expect(shown, key).toContain(key);
      const e = explainTotal(key, report, demo);
      expect(e?.inputs.length, key).toBeGreaterThan(0);
      expect(Number.isFinite(e?.value), key).toBe(true);
    }
  });

  it('slowest tRCD and tRC are the largest of the mats and add up from the listed steps (arithmetic)', () => {
    const rcd = Math.max(...mats.map((m) => m.figures.timing.rcd));
    const rc = Math.max(...mats.map((m) => m.figures.timing.rc));
    expect(t.worstRowToColumnDelay).toBe(rcd);
    expect(t.worstRowCycleTime).toBe(rc);
    const sumRcd =
      inputOf('worstRowToColumnDelay', 't_on') +
      inputOf('worstRowToColumnDelay', 't_fire') +
      inputOf('worstRowToColumnDelay', 't_latch');
    expect(sumRcd).toBeCloseTo(rcd, 18);
    const sumRc = inputOf('worstRowCycleTime', 'tRAS') + inputOf('worstRowCycleTime', 'tRP');
    expect(sumRc).toBeCloseTo(rc, 18);
    expect(t.worstRowCycleTimeMatName).toBe(mats[0]?.name);
  });

  it('shortest weakest-cell retention is Cs·ΔV_allowed / I_weak of the mat named (arithmetic)', () => {
    const v = (s: string) => inputOf('shortestWeakestRetention', s);
    expect(t.shortestWeakestRetention).toBe(Math.min(...mats.map((m) => m.figures.weakestRetentionTime)));
    expect((v('Cs') * v('ΔV_allowed')) / v('I_weak') / t.shortestWeakestRetention).toBeCloseTo(1, 12);
    // The weak tail sets it: far shorter than the typical cell's.
    expect(t.shortestWeakestRetention).toBeLessThan(t.shortestRetention);
  });

  it('sense amplifiers on the die are the floorplan’s times its copies, with the two-tailed k (arithmetic)', () => {
    expect(t.senseAmpCount).toBe(mats.reduce((s, m) => s + m.figures.senseAmpCount, 0));
    expect(t.senseAmpsOnDie).toBe(t.senseAmpCount * demo.operating.floorplanCopiesPerDie);
    const f = demo.operating.allowedSenseFailures;
    expect(t.offsetSigmaMultiplier).toBeCloseTo(upperTailQuantile(f / (2 * t.senseAmpsOnDie)), 9);
    const e = explainTotal('offsetSigmaMultiplier', report, demo);
    expect(e?.inputs.map((i) => i.value)).toEqual([f, t.senseAmpsOnDie]);
  });

  it('standby power is bits · I_hold · VDD of the static cells, 0 W for DRAM cells (arithmetic)', () => {
    expect(t.standbyPower).toBe(0);
    const sram = {
      ...demo,
      cells: [...demo.cells, SRAM_6T_CELL],
      blocks: demo.blocks.map((b, i) =>
        i === 0 && b.type === 'mat' ? { ...b, cellId: SRAM_6T_CELL.id } : b,
      ),
    };
    const r = evaluate(sram);
    const bits = allMats(r.mats)[0]?.figures.bits ?? 0;
    expect(r.totals.heldBits).toBe(bits);
    const expected = bits * SRAM_6T_CELL.holdCurrent * sram.process.arrayVoltage;
    expect(r.totals.standbyPower).toBeCloseTo(expected, 18);
    const e = explainTotal('standbyPower', r, sram);
    expect(e?.inputs.find((i) => i.symbol === 'I_hold')?.value).toBe(SRAM_6T_CELL.holdCurrent);
  });

  it('reach the JSON summary and the CLI table through the catalogue', () => {
    const summary = reportSummary(demo, report);
    expect(summary.totals.worstRowToColumnDelay_s).toBe(t.worstRowToColumnDelay);
    expect(summary.totals.worstRowCycleTime_s).toBe(t.worstRowCycleTime);
    expect(summary.totals.shortestWeakestRetention_s).toBe(t.shortestWeakestRetention);
    expect(summary.totals.senseAmpsOnDie).toBe(t.senseAmpsOnDie);
    expect(summary.totals.offsetSigmaMultiplier_ratio).toBe(t.offsetSigmaMultiplier);
    expect(summary.totals.standbyPower_W).toBe(0);
    expect(summary.totals.worstRowCycleTimeMat).toBe(t.worstRowCycleTimeMatName);
    const table = reportTable(demo, report);
    expect(table).toMatch(/slowest tRCD \(array core\) +5\.\d+ ns \(Mat 1\.1\)/);
    expect(table).toMatch(/slowest tRC \(array core\) +9\.\d+ ns/);
    expect(table).toMatch(/shortest retention, weakest cell +\d+(\.\d+)? ms/);
    expect(table).toMatch(/sense amplifiers on the die +2,097,152/);
    expect(table).toMatch(/offset k \(two-tailed\) +5\.0\d+ over 2,097,152 sense amplifiers/);
  });

  it('say why they do not exist when nothing is sensed', () => {
    const noStrips = { ...demo, blocks: demo.blocks.filter((b) => b.type !== 'senseAmpStrip') };
    const r = evaluate(noStrips);
    for (const key of ['worstRowToColumnDelay', 'worstRowCycleTime'] as const) {
      const e = explainTotal(key, r, noStrips);
      expect(e?.value, key).toBeNaN();
      expect(e?.missingReason, key).toMatch(/no usable bit/);
    }
    expect(reportTable(noStrips, r)).toMatch(/slowest tRC \(array core\) +—/);
  });
});
