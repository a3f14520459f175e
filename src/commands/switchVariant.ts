import { activateVariant, activeVariantId, filledEntries } from '../model/variants';
import type { Command, CommandResult } from './command';

/** Makes another variant the document being edited; the current one goes back on the shelf unchanged. */
export const switchVariant: Command<{ readonly variantId: string }> = {
  id: 'variant.switch',
  label: 'Switch variant',
  run(design, { variantId }): CommandResult {
    if (activeVariantId(design) === variantId) return { ok: true, design };
    const entries = filledEntries(design);
    if (!entries.some((e) => e.id === variantId)) return { ok: false, error: `no variant "${variantId}"` };
    return { ok: true, design: activateVariant(design, variantId, entries) };
  },
};
