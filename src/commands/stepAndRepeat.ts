import type { Block } from '../model/block';
import { MAX_BLOCKS, type Design } from '../model/design';
import { placeKey } from '../geometry/repeatPitch';
import { idAllocator, nameAllocator } from './blockIds';
import type { Command, CommandResult } from './command';
import { shiftedCopies } from './duplicateBlocks';
import { checkBlocks } from './validateBlocks';
import { formatWholeNumber } from '../model/units';

/** Most copies along one direction; a 256 × 256 array of mats is already a large die. */
export const MAX_REPEAT = 256;

export interface StepAndRepeatArgs {
  readonly ids: readonly string[];
  /** Copies across (x) and down (y), the originals included: 1 × 1 changes nothing. */
  readonly columns: number;
  readonly rows: number;
  /** Distance from one copy to the next (m). */
  readonly pitchX: number;
  readonly pitchY: number;
  /**
   * Leave out a copied sense-amplifier or driver strip that would land exactly on a strip already there
   * (same type and rectangle): at the sharing pitch neighbours then share one strip.
   */
  readonly shareStrips?: boolean;
}

function checkCount(label: string, n: number): string | null {
  return Number.isInteger(n) && n >= 1 && n <= MAX_REPEAT
    ? null
    : `${label} must be a whole number from 1 to ${MAX_REPEAT}`;
}

/** The copies less every strip that lands on a strip of its type already in the design or copied before it. */
function withoutCoincidentStrips(design: Design, copies: readonly Block[]): Block[] {
  const taken = new Set<string>();
  for (const b of design.blocks) if (b.type !== 'mat') taken.add(placeKey(b.type, b));
  const kept: Block[] = [];
  for (const c of copies) {
    if (c.type === 'senseAmpStrip' || c.type === 'wordlineDriverStrip') {
      const key = placeKey(c.type, c);
      if (taken.has(key)) continue;
      taken.add(key);
    }
    kept.push(c);
  }
  return kept;
}

/**
 * Tiles the selection n × m at a pitch: the originals stay at row 1, column 1, and each copy is named
 * after its original with its (row,column).
 */
export const stepAndRepeat: Command<StepAndRepeatArgs> = {
  id: 'block.stepAndRepeat',
  label: 'Step and repeat',
  run(design: Design, args: StepAndRepeatArgs): CommandResult {
    const error = checkCount('columns', args.columns) ?? checkCount('rows', args.rows);
    if (error) return { ok: false, error };
    if (!Number.isFinite(args.pitchX) || !Number.isFinite(args.pitchY)) {
      return { ok: false, error: 'the pitch must be a finite length' };
    }
    if ((args.columns > 1 && args.pitchX === 0) || (args.rows > 1 && args.pitchY === 0)) {
      return { ok: false, error: 'a pitch of zero would stack every copy on the original' };
    }
    const targets = new Set(args.ids);
    const originals = design.blocks.filter((b) => targets.has(b.id));
    if (originals.length === 0) return { ok: false, error: 'nothing selected to repeat' };
    const copiesWanted = originals.length * (args.columns * args.rows - 1);
    if (copiesWanted === 0) return { ok: true, design };
    if (design.blocks.length + copiesWanted > MAX_BLOCKS) {
      return {
        ok: false,
        error: `${formatWholeNumber(copiesWanted)} copies would pass the limit of ${formatWholeNumber(MAX_BLOCKS)} blocks`,
      };
    }
    const allocate = idAllocator(design);
    const rename = nameAllocator(design);
    const copies: Block[] = [];
    for (let row = 0; row < args.rows; row++) {
      for (let column = 0; column < args.columns; column++) {
        if (row === 0 && column === 0) continue;
        copies.push(
          ...shiftedCopies(originals, allocate, rename, column * args.pitchX, row * args.pitchY, {
            id: `-${row + 1}-${column + 1}`,
            name: ` (${row + 1},${column + 1})`,
          }),
        );
      }
    }
    const kept = args.shareStrips ? withoutCoincidentStrips(design, copies) : copies;
    const problem = checkBlocks(design, kept);
    if (problem) return { ok: false, error: problem };
    return { ok: true, design: { ...design, blocks: [...design.blocks, ...kept] } };
  },
};
