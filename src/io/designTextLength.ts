import type { Block } from '../model/block';
import type { Design, VariantDesign } from '../model/design';

/**
 * The exact length of `JSON.stringify(design)` (the compact text the browser stores and large files are
 * saved as), kept up to date edit by edit. Restore refuses text longer than MAX_DESIGN_TEXT_LENGTH, so the
 * edit check needs this length to refuse an edit (duplicating a huge variant, very long names on a whole
 * die) whose result could not be read back. Stringifying a whole die on every edit would cost about
 * 150 ms, so each block list's length is cached by identity and a new list is measured from the list it
 * came from: only the blocks that differ are stringified.
 */

/** Σ (JSON length of a block + 1) over a block list, by list identity. */
const listSums = new WeakMap<readonly Block[], number>();

function blockLength(block: Block): number {
  return JSON.stringify(block).length + 1;
}

function fullSum(blocks: readonly Block[]): number {
  // One stringify of the whole list is faster than one per block: [a,b,c] is Σ|b| + (n − 1) + 2.
  return blocks.length === 0 ? 0 : JSON.stringify(blocks).length - 1;
}

/** Σ (|block| + 1) of `blocks`, measured from `base` (the list it came from) where there is one. */
function blockSum(blocks: readonly Block[], base: readonly Block[] | null): number {
  const cached = listSums.get(blocks);
  if (cached !== undefined) return cached;
  // The list an edit started from is measured once too: undo brings it back, and the edit after the
  // undo then starts from a known length instead of measuring the whole list again.
  const baseSum = base ? (listSums.get(base) ?? blockSum(base, null)) : undefined;
  let sum: number;
  if (base && baseSum !== undefined) {
    sum = baseSum;
    if (blocks.length === base.length) {
      for (let i = 0; i < blocks.length; i++) {
        const now = blocks[i] as Block;
        const was = base[i] as Block;
        if (now !== was) sum += blockLength(now) - blockLength(was);
      }
    } else {
      const inBase = new Set<Block>(base);
      const inNext = new Set<Block>(blocks);
      for (const block of base) if (!inNext.has(block)) sum -= blockLength(block);
      for (const block of blocks) if (!inBase.has(block)) sum += blockLength(block);
    }
  } else {
    sum = fullSum(blocks);
  }
  listSums.set(blocks, sum);
  return sum;
}

/** JSON length of a block list: `[]`, or `[` + blocks joined by commas + `]`. */
function listLength(blocks: readonly Block[], base: readonly Block[] | null): number {
  return blocks.length === 0 ? 2 : blockSum(blocks, base) + 1;
}

/** The design with every block list emptied: its JSON length is the rest of the text. */
function withoutBlocks(design: Design): Design {
  const shelf = design.variants;
  return {
    ...design,
    blocks: [],
    variants: shelf && {
      ...shelf,
      entries: shelf.entries.map((e) => ({ ...e, design: e.design && { ...e.design, blocks: [] } })),
    },
  };
}

/**
 * `JSON.stringify(design).length`, exactly. `earlier` (the design the edit started from) and
 * `earlierVariant` (its copy of a stored variant, by variant id) let unchanged blocks be skipped.
 */
export function designTextLength(
  design: Design,
  earlier: Design | null = null,
  earlierVariant: (id: string) => VariantDesign | null = () => null,
): number {
  let length =
    JSON.stringify(withoutBlocks(design)).length - 2 + listLength(design.blocks, earlier?.blocks ?? null);
  for (const entry of design.variants?.entries ?? []) {
    if (!entry.design) continue;
    const base = earlierVariant(entry.id);
    length += listLength(entry.design.blocks, base?.blocks ?? null) - 2;
  }
  return length;
}

/** Blocks stringified per priming step: a few milliseconds each, so idle time is not overrun. */
const PRIMING_SLICE_BLOCKS = 4_000;

/**
 * Measures, a slice of blocks per step, every block list of `design` whose length is not known yet, so
 * that the first edit after opening a whole die does not stringify it on the edit's path (~150 ms at
 * 197,000 blocks). The caller runs the steps in idle time and may drop the generator at any point
 * (nothing is recorded for a list until it is measured whole). Lists already known cost nothing.
 */
export function* textLengthPriming(design: Design): Generator<void, void, void> {
  const lists = [design.blocks];
  for (const entry of design.variants?.entries ?? []) if (entry.design) lists.push(entry.design.blocks);
  for (const blocks of lists) {
    if (blocks.length === 0 || listSums.has(blocks)) continue;
    let sum = 0;
    for (let start = 0; start < blocks.length; start += PRIMING_SLICE_BLOCKS) {
      // Each slice's compact JSON is [b1,…,bk]: its length − 1 is Σ (|b| + 1) over the slice.
      sum += fullSum(blocks.slice(start, start + PRIMING_SLICE_BLOCKS));
      yield;
    }
    // An edit may have measured the list meanwhile; both values are exact, so either may stay.
    if (!listSums.has(blocks)) listSums.set(blocks, sum);
  }
}

/** True when every block list of `design` has its length recorded (for tests and the priming runner). */
export function textLengthKnown(design: Design): boolean {
  if (design.blocks.length > 0 && !listSums.has(design.blocks)) return false;
  for (const entry of design.variants?.entries ?? []) {
    const blocks = entry.design?.blocks;
    if (blocks && blocks.length > 0 && !listSums.has(blocks)) return false;
  }
  return true;
}
