import { DEFAULT_REPAIR } from '../model/builtins';
import type { Design } from '../model/design';
import type { RepairNumericField } from '../model/fieldCatalog';
import type { RepairDomainKind } from '../model/repair';
import { repairSettingsSchema } from '../model/repairSchema';
import type { Command, CommandResult } from './command';
import { firstIssue } from './zodMessage';

/** Sets one yield input or the repair domain; a design without its own settings starts from the defaults. */
export const setRepairSetting: Command<
  | { readonly field: RepairNumericField; readonly value: number }
  | { readonly field: 'repairDomain'; readonly value: RepairDomainKind }
> = {
  id: 'operating.setRepair',
  label: 'Set yield input',
  run(design: Design, { field, value }): CommandResult {
    const current = design.operating.repair ?? DEFAULT_REPAIR;
    if (current[field] === value && design.operating.repair) return { ok: true, design };
    const parsed = repairSettingsSchema.safeParse({ ...current, [field]: value });
    if (!parsed.success) return { ok: false, error: firstIssue(parsed.error) };
    return { ok: true, design: { ...design, operating: { ...design.operating, repair: parsed.data } } };
  },
};
