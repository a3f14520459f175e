import { describe, expect, it } from 'vitest';
import { sameVisibleFigures } from '../../src/canvas/sameFigures';
import { evaluate, preparePreview, previewReport } from '../../src/engine';
import { demoDesign } from '../../src/designs/demoDesign';

describe('skipping panel updates that would show nothing new', () => {
  const design = demoDesign();
  const report = evaluate(design);
  const strip = design.blocks.find((b) => b.id === 'sa-r0c0');
  if (!strip) throw new Error('demo lacks sa-r0c0');
  const base = preparePreview(design, report, ['sa-r0c0']);

  it('a strip moved back to where it was shows the same figures', () => {
    expect(sameVisibleFigures(report, previewReport(base, [strip]), [])).toBe(true);
  });

  it('a move that grows the bounding box changes the totals', () => {
    const far = previewReport(base, [{ ...strip, y: strip.y - 50e-6 }]);
    expect(sameVisibleFigures(report, far, [])).toBe(false);
  });

  it('a move that creates an overlap adds a finding', () => {
    const onto = previewReport(base, [{ ...strip, y: strip.y + 10e-6 }]);
    expect(onto.findings.length).toBeGreaterThan(0);
    expect(sameVisibleFigures(report, onto, [])).toBe(false);
  });
});
