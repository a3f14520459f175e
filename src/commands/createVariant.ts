import type { VariantDesign } from '../model/design';
import { variantDesignSchema } from '../model/designSchema';
import {
  activateVariant,
  activeVariantId,
  filledEntries,
  freshVariantId,
  hasRoomForVariant,
} from '../model/variants';
import type { Command, CommandResult } from './command';
import { firstIssue } from './zodMessage';

export interface CreateVariantArgs {
  /** The new variant's design (a partition built in the explorer, a copy, …); its name names the variant. */
  readonly design: VariantDesign;
}

/**
 * Adds a variant after the active one and makes it active. The design is validated like a loaded file,
 * so a builder bug can never put an invalid design in the document.
 */
export const createVariant: Command<CreateVariantArgs> = {
  id: 'variant.create',
  label: 'New variant',
  run(design, { design: content }): CommandResult {
    if (!hasRoomForVariant(design)) return { ok: false, error: 'a document holds at most 32 variants' };
    const parsed = variantDesignSchema.safeParse(content);
    if (!parsed.success)
      return { ok: false, error: `the new variant is invalid: ${firstIssue(parsed.error)}` };
    const id = freshVariantId(design);
    const entries = filledEntries(design);
    const activeIndex = entries.findIndex((e) => e.id === activeVariantId(design));
    const next = [...entries];
    next.splice(activeIndex + 1, 0, { id, design: parsed.data });
    return { ok: true, design: activateVariant(design, id, next) };
  },
};
