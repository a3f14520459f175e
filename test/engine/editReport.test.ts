import { describe, expect, it } from 'vitest';
import { editReport, evaluate, type Report } from '../../src/engine';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { placedDesign, placedDesignAfterEdit } from '../../src/geometry/placedIndex';
import type { Block } from '../../src/model/block';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import type { Design } from '../../src/model/design';
import { blocksEditedInPlace } from '../../src/model/designEdit';
import { reportState } from '../../src/engine/evaluation/reportState';
import { designWith } from '../support/designs';
import { expectSameReport } from '../support/sameReport';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';

function grid(side: number): Design {
  return designWith(
    gridFloorplan({
      cell: FOLDED_8F2_CELL,
      featureSize: DEMO_PROCESS.featureSize,
      matRows: side,
      matColumns: side,
      cellsPerBitline: 512,
      cellsPerWordline: 512,
      ...DEMO_STRIPS,
    }),
  );
}

/** The design with the block of `id` replaced by `change(block)`: an edit in place, as commands make. */
function edited(design: Design, id: string, change: (b: Block) => Block): Design {
  return { ...design, blocks: design.blocks.map((b) => (b.id === id ? change(b) : b)) };
}

describe('an edit of a few blocks is evaluated incrementally and equals evaluate()', () => {
  it('follows a chain of moves and cell-count changes, each step checked against a full evaluation', () => {
    let design = grid(5);
    let report: Report = evaluate(design);
    const mats = design.blocks.filter((b) => b.type === 'mat');
    const strips = design.blocks.filter((b) => b.type !== 'mat');
    const steps: ((d: Design) => Design)[] = [
      // A mat pulled away from its strips: unserved lines, a finding.
      (d) => edited(d, mats[6]?.id ?? '', (b) => ({ ...b, x: b.x + 5e-6 })),
      // Fewer cells per bit line on another mat: it shrinks; its neighbours change partners.
      (d) => edited(d, mats[12]?.id ?? '', (b) => (b.type === 'mat' ? { ...b, cellsPerBitline: 256 } : b)),
      // A strip pushed onto a mat: an overlap.
      (d) => edited(d, strips[3]?.id ?? '', (b) => ({ ...b, y: b.y + 10e-6 })),
      // The first mat back where it was: its finding goes away.
      (d) => edited(d, mats[6]?.id ?? '', (b) => ({ ...b, x: b.x - 5e-6 })),
    ];
    for (const step of steps) {
      const next = step(design);
      const changed = blocksEditedInPlace(design, next, 64);
      expect(changed).toHaveLength(1);
      placedDesign(design);
      report = editReport(design, report, next, changed ?? []);
      expectSameReport(report, evaluate(next));
      design = next;
    }
  });

  it('updates the placement and its index in place, answering queries as a fresh one does', () => {
    const design = grid(4);
    placedDesign(design);
    const target = design.blocks.find((b) => b.type === 'mat');
    if (!target) throw new Error('grid has no mat');
    const next = edited(design, target.id, (b) => ({ ...b, x: b.x + 60e-6, y: b.y + 1e-6 }));
    const changed = blocksEditedInPlace(design, next, 64) ?? [];
    const updated = placedDesignAfterEdit(design, next, changed);
    const fresh = placedDesign({ ...next, blocks: next.blocks.slice() });
    expect(updated.placed.map((p) => p.rect)).toEqual(fresh.placed.map((p) => p.rect));
    for (const p of fresh.placed) {
      const box = { x: p.rect.x, y: p.rect.y, width: p.rect.width, height: p.rect.height };
      expect(updated.index.near(box, 1e-9).sort((a, b) => a - b)).toEqual(
        fresh.index.near(box, 1e-9).sort((a, b) => a - b),
      );
    }
  });

  it('says which blocks changed in place, and null for any other change', () => {
    const design = grid(2);
    const first = design.blocks[0];
    if (!first) throw new Error('empty grid');
    expect(blocksEditedInPlace(design, { ...design }, 64)).toEqual([]);
    expect(
      blocksEditedInPlace(
        design,
        edited(design, first.id, (b) => ({ ...b, x: b.x + 1e-6 })),
        64,
      ),
    ).toEqual([0]);
    expect(blocksEditedInPlace(design, { ...design, blocks: design.blocks.slice(1) }, 64)).toBeNull();
    expect(
      blocksEditedInPlace(
        design,
        edited(design, first.id, (b) => ({ ...b, id: 'other' })),
        64,
      ),
    ).toBeNull();
    expect(blocksEditedInPlace(design, { ...design, process: { ...design.process } }, 64)).toBeNull();
    const all = { ...design, blocks: design.blocks.map((b) => ({ ...b, x: b.x + 1e-6 })) };
    expect(blocksEditedInPlace(design, all, 3)).toBeNull();
  });
});

describe('edits that change the cell count, one after another', () => {
  it('compute every mat again from its kind and connections, never falling back to a whole evaluation', () => {
    let design = grid(4);
    let report: Report = evaluate(design);
    const mat = design.blocks.find((b) => b.type === 'mat');
    if (!mat) throw new Error('grid has no mat');
    for (const cells of [256, 128, 512, 256]) {
      const next = edited(design, mat.id, (b) => (b.type === 'mat' ? { ...b, cellsPerBitline: cells } : b));
      const changed = blocksEditedInPlace(design, next, 64) ?? [];
      placedDesign(design);
      const before = reportState(report)?.matIndexAt;
      report = editReport(design, report, next, changed);
      // A whole evaluation would have laid the mats out again; the incremental path keeps their index.
      expect(reportState(report)?.matIndexAt).toBe(before);
      expectSameReport(report, evaluate(next));
      design = next;
    }
  });
});
