import { describe, expect, it } from 'vitest';
import { blockAt, blocksInside, placedDesign } from '../../src/geometry/placedIndex';
import { blockRect } from '../../src/geometry/placedBlocks';
import { demoDesign } from '../../src/designs/demoDesign';

describe('placed design: hit-testing and box selection', () => {
  const design = demoDesign();
  const placed = placedDesign(design);

  it('is computed once per document', () => {
    expect(placedDesign(design)).toBe(placed);
  });

  it('finds the block under a point, and nothing outside the floorplan', () => {
    const block = design.blocks.find((b) => b.id === 'mat-r2c1');
    if (!block) throw new Error('demo lacks mat-r2c1');
    const r = blockRect(design, block);
    expect(blockAt(placed, r.x + r.width / 2, r.y + r.height / 2)).toBe('mat-r2c1');
    expect(blockAt(placed, -1e-3, -1e-3)).toBeNull();
    // Just above the mat lies its sense-amplifier strip.
    expect(blockAt(placed, r.x + r.width / 2, r.y - 1e-6)).toBe('sa-r2c1');
  });

  it('selects the blocks wholly inside a box', () => {
    const block = design.blocks.find((b) => b.id === 'mat-r0c0');
    if (!block) throw new Error('demo lacks mat-r0c0');
    const r = blockRect(design, block);
    const ids = blocksInside(placed, {
      x: r.x - 1e-9,
      y: r.y - 7e-6,
      width: r.width + 2e-9,
      height: r.height + 14e-6,
    });
    expect(ids).toEqual(['mat-r0c0', 'sa-r0c0', 'sa-r1c0']);
  });
});
