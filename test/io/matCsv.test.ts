import { matAt } from '../../src/engine/evaluation/matTable';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import { matFiguresCsv } from '../../src/io/matCsv';
import { demoDesign } from '../../src/designs/demoDesign';

describe('per-mat CSV', () => {
  it('has a header with units and one row per mat, numbers in SI', () => {
    const design = demoDesign();
    const report = evaluate(design);
    const lines = matFiguresCsv(report).trimEnd().split('\r\n');
    expect(lines).toHaveLength(1 + report.mats.count);
    const header = lines[0]?.split(',') ?? [];
    expect(header).toContain('bitline_capacitance_F');
    const row = lines[1]?.split(',') ?? [];
    const column = header.indexOf('bitline_capacitance_F');
    expect(Number(row[column])).toBe(matAt(report.mats, 0)?.figures.bitlineCapacitance.total);
  });

  it('quotes names with commas and quotes (RFC 4180)', () => {
    const design = demoDesign();
    design.blocks = design.blocks.map((b) => (b.id === 'mat-r0c0' ? { ...b, name: 'left, "outer"' } : b));
    expect(matFiguresCsv(evaluate(design))).toContain('"left, ""outer"""');
  });
});
