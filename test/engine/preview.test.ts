import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate, preparePreview, previewReport } from '../../src/engine';
import type { Block } from '../../src/model/block';
import { demoDesign } from '../../src/designs/demoDesign';
import type { Design } from '../../src/model/design';
import { expectSameReport } from '../support/sameReport';

function withChanges(design: Design, changed: readonly Block[]): Design {
  const byId = new Map(changed.map((b) => [b.id, b]));
  return { ...design, blocks: design.blocks.map((b) => byId.get(b.id) ?? b) };
}

describe('live preview of a gesture equals a full evaluation', () => {
  const design = demoDesign();
  const report = evaluate(design);

  it('moving both sense-amplifier strips of a mat away unsenses it, and moving them back clears it', () => {
    const ids = ['sa-r0c1', 'sa-r1c1'];
    const strips = design.blocks.filter((b) => ids.includes(b.id));
    const base = preparePreview(design, report, ids);
    const away = strips.map((s) => ({ ...s, x: s.x + 500e-6 }));
    const preview = previewReport(base, away);
    expectSameReport(preview, evaluate(withChanges(design, away)));
    expect(preview.findings.map((f) => f.blockIds.join())).toContain('mat-r0c1');
    expectSameReport(previewReport(base, strips), report);
  });

  it('holds for random moves and resizes of a few blocks', () => {
    const ids = design.blocks.map((b) => b.id);
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.constantFrom(...ids), { minLength: 1, maxLength: 3 }),
        fc.double({ min: -60e-6, max: 60e-6, noNaN: true }),
        fc.double({ min: -60e-6, max: 60e-6, noNaN: true }),
        fc.integer({ min: 1, max: 1024 }),
        (chosen, dx, dy, cells) => {
          const changed = design.blocks
            .filter((b) => chosen.includes(b.id))
            .map((b): Block =>
              b.type === 'mat'
                ? { ...b, x: b.x + dx, y: b.y + dy, cellsPerBitline: cells }
                : { ...b, x: b.x + dx, y: b.y + dy },
            );
          const base = preparePreview(design, report, chosen);
          expectSameReport(previewReport(base, changed), evaluate(withChanges(design, changed)));
        },
      ),
      { numRuns: 150 },
    );
    // Its own limit: a long property run must hold on a busy 2-core CI machine.
  }, 60_000);

  it('follows a move of whole rows, where many mats share strips', () => {
    const row = design.blocks
      .filter((b) => b.id.includes('-r1c') || b.id.startsWith('sa-r2c'))
      .map((b) => b.id);
    const changed = design.blocks.filter((b) => row.includes(b.id)).map((b) => ({ ...b, y: b.y + 3e-6 }));
    const base = preparePreview(design, report, row);
    expectSameReport(previewReport(base, changed), evaluate(withChanges(design, changed)));
  });
});
