import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import { matFiguresCsv } from '../../src/io/matCsv';
import { reportTable } from '../../src/io/reportTable';
import { reportSummary } from '../../src/io/summary';
import { demoDesign } from '../../src/designs/demoDesign';
import type { Design } from '../../src/model/design';

/** The demo with one mat moved onto its neighbour: an overlap finding that names two mats. */
function overlapping(): Design {
  const demo = demoDesign();
  const neighbour = demo.blocks.find((b) => b.id === 'mat-r0c1');
  return {
    ...demo,
    blocks: demo.blocks.map((b) => (b.id === 'mat-r0c0' && neighbour ? { ...b, x: neighbour.x - 1e-6 } : b)),
  };
}

describe('exports name blocks as people see them', () => {
  it('messages, summary JSON findings and worst mats use names; ids stay beside them', () => {
    const design = overlapping();
    const report = evaluate(design);
    const overlap = report.findings.find((f) => f.kind === 'overlap');
    expect(overlap?.message).toMatch(/^Mat 1\.1 and Mat 1\.2 overlap by /);
    const summary = reportSummary(design, report);
    const json = summary.findings.find((f) => f.kind === 'overlap');
    expect(json?.blocks).toEqual(['Mat 1.1', 'Mat 1.2']);
    expect(json?.blockIds).toEqual(['mat-r0c0', 'mat-r0c1']);
    expect(summary.totals.worstSenseMarginMat).toMatch(/^Mat \d\.\d$/);
    expect(summary.mats[0]).toMatchObject({
      name: 'Mat 1.1',
      id: 'mat-r0c0',
      size: '512 × 512 cells/BL × cells/WL',
    });
  });

  it('the CLI table and the CSV lead with the name, then the id', () => {
    const design = demoDesign();
    const report = evaluate(design);
    expect(reportTable(design, report)).toMatch(/\n {2}Mat 1\.1 +mat-r0c0 +512 +512 /);
    expect(reportTable(design, report)).toMatch(/worst margin[^\n]*\(Mat \d\.\d\)/i);
    expect(matFiguresCsv(report).split('\r\n')[1]).toMatch(/^Mat 1\.1,mat-r0c0,/);
  });
});
