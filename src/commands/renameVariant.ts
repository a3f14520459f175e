import { shelfOf } from '../model/variants';
import type { Command, CommandResult } from './command';

/** Longest variant name, as the design schema allows. */
const MAX_NAME = 200;

/** Renames a variant (its design name). */
export const renameVariant: Command<{ readonly variantId: string; readonly name: string }> = {
  id: 'variant.rename',
  label: 'Rename variant',
  run(design, { variantId, name }): CommandResult {
    const trimmed = name.trim();
    if (trimmed.length === 0) return { ok: false, error: 'a variant needs a name' };
    if (trimmed.length > MAX_NAME) return { ok: false, error: `a name has at most ${MAX_NAME} characters` };
    const shelf = shelfOf(design);
    const entry = shelf.entries.find((e) => e.id === variantId);
    if (!entry) return { ok: false, error: `no variant "${variantId}"` };
    if (entry.design === null) {
      return { ok: true, design: design.name === trimmed ? design : { ...design, name: trimmed } };
    }
    if (entry.design.name === trimmed || !design.variants) return { ok: true, design };
    const entries = shelf.entries.map((e) =>
      e.id === variantId && e.design ? { id: e.id, design: { ...e.design, name: trimmed } } : e,
    );
    return { ok: true, design: { ...design, variants: { ...design.variants, entries } } };
  },
};
