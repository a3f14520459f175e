import { describe, expect, it, vi } from 'vitest';
import { primeTextLengths } from '../../src/app/textLengthPrimer';
import { duplicateVariant } from '../../src/commands/duplicateVariant';
import { moveBlocks } from '../../src/commands/moveBlocks';
import { demoDesign } from '../../src/designs/demoDesign';
import { designTextLength, textLengthKnown, textLengthPriming } from '../../src/io/designTextLength';
import type { Block } from '../../src/model/block';
import type { Design } from '../../src/model/design';
import { variantEntries } from '../../src/model/variants';
import { createAppStore } from '../../src/store/appStore';

// Arithmetic checks: the primed length is JSON.stringify's own, counted slice by slice.

/** The demo with its blocks repeated to `count` (fresh ids, fresh list), and a stored copy as a variant. */
function bigDesign(count: number): Design {
  const demo = demoDesign();
  const blocks = Array.from({ length: count }, (_, i) => ({
    ...(demo.blocks[i % demo.blocks.length] as Block),
    id: `block-${i}`,
  }));
  const design = { ...demo, blocks };
  const copied = duplicateVariant.run(design, {
    variantId: (variantEntries(design)[0] as { id: string }).id,
  });
  if (!copied.ok) throw new Error(copied.error);
  return copied.design;
}

describe('measuring the text length ahead of the first edit', () => {
  it('measures every block list in slices, exactly, and a second run has nothing to do', () => {
    const design = bigDesign(9_001);
    expect(textLengthKnown(design)).toBe(false);
    const steps = [...textLengthPriming(design)].length;
    // 9,001 blocks in slices of 4,000 → 3 steps for the open list; the variant copy is measured too.
    expect(steps).toBeGreaterThanOrEqual(3);
    expect(textLengthKnown(design)).toBe(true);
    expect(designTextLength(design)).toBe(JSON.stringify(design).length);
    expect([...textLengthPriming(design)]).toHaveLength(0);
  });

  it('records nothing for a list it was stopped in the middle of', () => {
    const design = bigDesign(9_001);
    const steps = textLengthPriming(design);
    steps.next();
    expect(textLengthKnown(design)).toBe(false);
    // An edit measured from the design still gets the exact length.
    const moved = moveBlocks.run(design, { ids: ['block-0'], dx: 36e-9, dy: 0 });
    if (!moved.ok) throw new Error(moved.error);
    expect(designTextLength(moved.design, design, () => null)).toBe(JSON.stringify(moved.design).length);
  });

  // Builds and evaluates two designs of 5,000+ blocks (~3 s alone): its own limit for a busy machine.
  it('runs in idle time for the store’s present design and follows a newly opened one', () => {
    vi.useFakeTimers();
    try {
      const first = bigDesign(5_000);
      const app = createAppStore(first);
      const stop = primeTextLengths(app);
      expect(textLengthKnown(first)).toBe(false);
      vi.runAllTimers();
      expect(textLengthKnown(first)).toBe(true);
      const second = bigDesign(6_000);
      app.getState().startDocument(second, { documentId: 'second', inFile: true });
      vi.runAllTimers();
      expect(textLengthKnown(second)).toBe(true);
      stop();
    } finally {
      vi.useRealTimers();
    }
  }, 60_000);
});
