import { variantEntries } from '../model/variants';
import type { Command, CommandResult } from './command';
import { createVariant } from './createVariant';

/** Longest variant name, as the design schema allows. */
const MAX_NAME = 200;

/** Copies a variant under the name "… (copy)" and makes the copy active. */
export const duplicateVariant: Command<{ readonly variantId: string }> = {
  id: 'variant.duplicate',
  label: 'Duplicate variant',
  run(design, { variantId }): CommandResult {
    const source = variantEntries(design).find((v) => v.id === variantId);
    if (!source) return { ok: false, error: `no variant "${variantId}"` };
    const name = `${source.name.slice(0, MAX_NAME - 7)} (copy)`;
    return createVariant.run(design, { design: { ...source.design, name } });
  },
};
