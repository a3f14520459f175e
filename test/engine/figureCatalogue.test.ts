import { describe, expect, it } from 'vitest';
import {
  AXIS_FIGURES,
  BANK_FIGURE_CATALOGUE,
  bankFigureEntry,
  pointCardFigures,
  TABLE_FIGURES,
  MAT_FIGURE_CATALOGUE,
  MAT_FIGURE_GROUPS,
  MAT_FIGURE_PANEL,
  TOTAL_FIGURE_CATALOGUE,
  TOTAL_FIGURE_GROUPS,
  TOTAL_FIGURE_PANEL,
} from '../../src/engine';

const duplicates = (values: readonly (string | null | undefined)[]) =>
  values.filter((v, i) => v != null && values.indexOf(v) !== i);

describe('the figure catalogue', () => {
  it('has one entry per key and one figure per export key, in each scope', () => {
    for (const catalogue of [MAT_FIGURE_CATALOGUE, TOTAL_FIGURE_CATALOGUE, BANK_FIGURE_CATALOGUE]) {
      expect(duplicates(catalogue.map((e) => e.key))).toEqual([]);
      expect(duplicates(catalogue.map((e) => e.exportKey))).toEqual([]);
      for (const e of catalogue) expect(e.label).not.toBe('');
    }
  });

  it('explains every figure a panel shows, and every panel group shows a figure', () => {
    for (const e of [...MAT_FIGURE_CATALOGUE, ...TOTAL_FIGURE_CATALOGUE])
      if (e.group !== null) expect(typeof e.explain, e.key).toBe('function');
    expect(MAT_FIGURE_PANEL.map((g) => g.title)).toEqual([...MAT_FIGURE_GROUPS]);
    expect(TOTAL_FIGURE_PANEL.map((g) => g.title)).toEqual([...TOTAL_FIGURE_GROUPS]);
    for (const g of [...MAT_FIGURE_PANEL, ...TOTAL_FIGURE_PANEL]) expect(g.keys.length).toBeGreaterThan(0);
  });

  it('names a unit suffix in every export key of a non-count figure', () => {
    const suffix = /_(m|m2|F|V|A|ohm|s|J|W|K|ratio)$/;
    for (const e of [...MAT_FIGURE_CATALOGUE, ...TOTAL_FIGURE_CATALOGUE]) {
      if (e.exportKey === null) continue;
      if (e.quantity === 'count') expect(e.exportKey, e.key).not.toMatch(suffix);
      else expect(e.exportKey, e.key).toMatch(suffix);
    }
  });

  it('offers a bank figure where its entry says, in catalogue order, and nowhere else', () => {
    const order = BANK_FIGURE_CATALOGUE.map((e) => e.key);
    const inOrder = (keys: readonly string[]) =>
      [...keys].sort((a, b) => order.indexOf(a as never) - order.indexOf(b as never));
    expect(AXIS_FIGURES).toEqual(inOrder(AXIS_FIGURES));
    expect(TABLE_FIGURES).toEqual(inOrder(TABLE_FIGURES));
    for (const e of BANK_FIGURE_CATALOGUE) {
      expect(AXIS_FIGURES.includes(e.key), e.key).toBe(e.offeredIn.includes('chartAxis'));
      expect(TABLE_FIGURES.includes(e.key), e.key).toBe(e.offeredIn.includes('variantsTable'));
      expect(pointCardFigures(true).includes(e.key), e.key).toBe(e.offeredIn.includes('pointCard'));
    }
  });

  it('charts only figures with a better direction (the Pareto front needs one)', () => {
    for (const key of AXIS_FIGURES) expect(bankFigureEntry(key).better, key).not.toBe('neither');
  });

  it('lists the row timing on the point card, and the yield figures only when the sweep assessed yield', () => {
    expect(pointCardFigures(false)).toEqual(expect.arrayContaining(['rowToColumnDelay', 'rowCycleTime']));
    expect(pointCardFigures(false)).not.toContain('dieYield');
    expect(pointCardFigures(true)).toEqual(expect.arrayContaining(['dieYield', 'spareRows', 'spareColumns']));
  });
});
