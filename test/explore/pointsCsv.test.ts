import { describe, expect, it } from 'vitest';
import { chartModel } from '../../src/explore/chartData';
import { BANK_FIGURE_CATALOGUE } from '../../src/engine';
import { displayUnit, sweepPointsCsv } from '../../src/explore/pointsCsv';
import { runSweepRange, sweepSize } from '../../src/explore/sweep';
import { defaultSweepSettings, sweepRequestFor } from '../../src/explore/sweepSettings';
import { demoDesign } from '../../src/designs/demoDesign';

const design = demoDesign();
const request = sweepRequestFor(
  {
    ...defaultSweepSettings(design),
    cellsPerBitline: { from: 128, to: 512, step: 128 },
    cellsPerWordline: { from: 256, to: 1024, step: 256 },
  },
  design,
);
const points = runSweepRange(request, 0, sweepSize(request));
const limits = { minMargin: 0.02, maxDelay: 0.5e-9 };

/** Splits one CSV line of plain or quoted fields (RFC 4180). */
function fields(line: string): string[] {
  const out: string[] = [];
  let current = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (quoted) {
      if (c === '"' && line[i + 1] === '"') {
        current += '"';
        i++;
      } else if (c === '"') quoted = false;
      else current += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') {
      out.push(current);
      current = '';
    } else current += c;
  }
  out.push(current);
  return out;
}

describe('sweep points as CSV', () => {
  it('picks the display unit of a column from its median (arithmetic)', () => {
    expect(displayUnit([1.2e-9, 0.8e-9, 3e-9], 'time')).toEqual({ unit: 'ns', scale: 1e9 });
    expect(displayUnit([2e-12, 3e-12], 'area')).toEqual({ unit: 'µm²', scale: 1e12 });
    expect(displayUnit([0.031, 0.05], 'voltage')).toEqual({ unit: 'mV', scale: 1e3 });
    expect(displayUnit([0.5], 'percent')).toEqual({ unit: '%', scale: 100 });
    expect(displayUnit([], 'energy')).toEqual({ unit: 'J', scale: 1 });
  });

  it('writes every point with every figure in the unit its header names, and the feasible and front flags', () => {
    const model = chartModel(points, 'areaPerBit', 'senseMargin', limits);
    const front = new Set(model.front.map((i) => model.plotted[i]?.point ?? -1));
    const csv = sweepPointsCsv(points, request, limits, front);
    const lines = csv.trimEnd().split('\r\n');
    expect(lines).toHaveLength(points.length + 1);
    const header = fields(lines[0] ?? '');
    for (const info of BANK_FIGURE_CATALOGUE)
      expect(header.some((h) => h === info.label || h.startsWith(`${info.label} (`))).toBe(true);
    const areaColumn = header.findIndex((h) => h.startsWith('Area per bit ('));
    const unit = /\((.*)\)/.exec(header[areaColumn] ?? '')?.[1];
    expect(unit).toBe('µm²');
    const feasibleColumn = header.indexOf('feasible');
    const frontColumn = header.indexOf('on Pareto front');
    let frontRows = 0;
    points.forEach((p, k) => {
      const row = fields(lines[k + 1] ?? '');
      expect(row).toHaveLength(header.length);
      const f = p.figures;
      if (f) expect(Number(row[areaColumn])).toBeCloseTo(f.areaPerBit * 1e12, 4);
      const feasible = model.plotted.some((q) => q.point === k && q.state !== 'infeasible');
      expect(row[feasibleColumn]).toBe(feasible ? 'yes' : 'no');
      if (row[frontColumn] === 'yes') frontRows++;
    });
    expect(frontRows).toBe(model.front.length);
    expect(frontRows).toBeGreaterThan(0);
  });
});
