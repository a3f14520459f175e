import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { deleteBlocks } from '../../src/commands/deleteBlocks';
import { duplicateBlocks } from '../../src/commands/duplicateBlocks';
import { duplicateVariant } from '../../src/commands/duplicateVariant';
import { moveBlocks } from '../../src/commands/moveBlocks';
import { setBlockProperties } from '../../src/commands/setBlockProperties';
import { demoDesign } from '../../src/designs/demoDesign';
import { designFilePieces, INDENTED_FILE_BLOCKS, MAX_DESIGN_TEXT_LENGTH } from '../../src/io/designText';
import { designTextLength } from '../../src/io/designTextLength';
import { editProblems } from '../../src/io/editCheck';
import { restoreDesign } from '../../src/io/restore';
import type { Block } from '../../src/model/block';
import type { Design } from '../../src/model/design';
import { variantEntries } from '../../src/model/variants';

// Arithmetic checks: the length is JSON.stringify's own, counted another way.

function applied(result: ReturnType<typeof moveBlocks.run>): Design {
  if (!result.ok) throw new Error(result.error);
  return result.design;
}

describe('the design text length', () => {
  it('equals JSON.stringify(design).length, fresh and measured from the design an edit started from', () => {
    const demo = demoDesign();
    expect(designTextLength(demo)).toBe(JSON.stringify(demo).length);
    const ids = demo.blocks.map((b) => b.id);
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            kind: fc.constantFrom('move', 'rename', 'duplicate', 'delete', 'variant'),
            pick: fc.nat(),
            name: fc.string({ maxLength: 40 }),
          }),
          { minLength: 1, maxLength: 8 },
        ),
        (steps) => {
          let design = demo;
          for (const s of steps) {
            const blocks = design.blocks;
            const id = blocks.length > 0 ? (blocks[s.pick % blocks.length] as Block).id : (ids[0] as string);
            const before = design;
            const result =
              s.kind === 'move'
                ? moveBlocks.run(design, { ids: [id], dx: 36e-9 * (s.pick % 7), dy: 0 })
                : s.kind === 'rename'
                  ? setBlockProperties.run(design, { ids: [id], patch: { name: s.name } })
                  : s.kind === 'duplicate'
                    ? duplicateBlocks.run(design, { ids: [id], dx: 0, dy: 200e-6 })
                    : s.kind === 'delete'
                      ? deleteBlocks.run(design, { ids: [id] })
                      : duplicateVariant.run(design, {
                          variantId: (variantEntries(design)[0] as { id: string }).id,
                        });
            if (!result.ok) continue;
            design = result.design;
            expect(designTextLength(design, before, () => null)).toBe(JSON.stringify(design).length);
          }
        },
      ),
      { numRuns: 60 },
    );
  }, 60_000);

  it('refuses an edit whose text restore could not read back, in restore’s terms, and accepts it below', () => {
    // A floorplan of long-named spacer-free mats copied until one more copy would pass the text limit.
    const demo = demoDesign();
    const mat = demo.blocks.find((b) => b.type === 'mat') as Block;
    const longName = 'M'.repeat(120);
    const perBlock = JSON.stringify({ ...mat, id: 'x'.repeat(80), name: longName }).length + 1;
    const count = Math.floor(MAX_DESIGN_TEXT_LENGTH / 2 / perBlock) + 1000;
    const blocks: Block[] = [];
    for (let i = 0; i < count; i++) {
      blocks.push({
        ...mat,
        id: `${'x'.repeat(74)}${String(i).padStart(6, '0')}`,
        name: longName,
      });
    }
    const big: Design = { ...demo, blocks };
    const length = designTextLength(big);
    expect(length).toBeGreaterThan(MAX_DESIGN_TEXT_LENGTH / 2);
    expect(length).toBeLessThan(MAX_DESIGN_TEXT_LENGTH);
    // Moving one mat stays within the limit: accepted.
    const moved = applied(moveBlocks.run(big, { ids: [(blocks[0] as Block).id], dx: 36e-9, dy: 0 }));
    expect(editProblems(moved, big)).toEqual([]);
    // Duplicating the variant would double the text: refused, with the length and the limit.
    const copied = duplicateVariant.run(moved, {
      variantId: (variantEntries(moved)[0] as { id: string }).id,
    });
    if (!copied.ok) throw new Error(copied.error);
    const problems = editProblems(copied.design, moved);
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatch(/characters as text; the limit is 67,108,864/);
    expect(JSON.stringify(copied.design).length + 1).toBeGreaterThan(MAX_DESIGN_TEXT_LENGTH);
  }, 120_000);

  it('saves a small design whose indented text would be too long compact, so that it opens again', () => {
    const demo = demoDesign();
    const mat = demo.blocks.find((b) => b.type === 'mat') as Block;
    // Ids and names of control characters, each written as a six-character escape: under the
    // indented-file block count, yet past the text limit when indented and within it when compact.
    const make = (i: number): Block => ({
      ...mat,
      id: `${'\u0001'.repeat(74)}${String(i).padStart(6, '0')}`,
      name: '\u0001'.repeat(120),
    });
    const compactEach = JSON.stringify(make(0)).length + 1;
    const indentedEach = JSON.stringify([make(0)], null, 2).length - 4;
    const count = Math.floor((MAX_DESIGN_TEXT_LENGTH - 100_000) / compactEach);
    expect(count).toBeLessThanOrEqual(INDENTED_FILE_BLOCKS);
    expect(count * indentedEach).toBeGreaterThan(MAX_DESIGN_TEXT_LENGTH);
    const design: Design = { ...demo, blocks: Array.from({ length: count }, (_, i) => make(i)) };
    expect(editProblems(design, null)).toEqual([]);
    const text = [...designFilePieces(design)].join('');
    expect(text.length).toBeLessThanOrEqual(MAX_DESIGN_TEXT_LENGTH);
    const restored = restoreDesign(text);
    expect(restored.ok ? [] : restored.errors).toEqual([]);
  }, 120_000);
});
