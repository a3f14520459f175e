import { activateVariant, filledEntries, shelfOf } from '../model/variants';
import type { Command, CommandResult } from './command';

/**
 * Deletes a variant. Deleting the active one makes its right-hand neighbour active (the left one when it
 * was last). The last remaining variant cannot be deleted.
 */
export const deleteVariant: Command<{ readonly variantId: string }> = {
  id: 'variant.delete',
  label: 'Delete variant',
  run(design, { variantId }): CommandResult {
    const shelf = shelfOf(design);
    const index = shelf.entries.findIndex((e) => e.id === variantId);
    if (index < 0) return { ok: false, error: `no variant "${variantId}"` };
    if (shelf.entries.length === 1) return { ok: false, error: 'the only variant cannot be deleted' };
    const remaining = filledEntries(design).filter((e) => e.id !== variantId);
    const nextActive =
      variantId === shelf.activeId
        ? (remaining[Math.min(index, remaining.length - 1)]?.id ?? shelf.activeId)
        : shelf.activeId;
    return { ok: true, design: activateVariant(design, nextActive, remaining) };
  },
};
