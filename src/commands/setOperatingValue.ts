import type { Design } from '../model/design';
import type { OperatingNumericField } from '../model/fieldCatalog';
import { operatingConditionsSchema } from '../model/operating';
import type { Command, CommandResult } from './command';
import { firstIssue } from './zodMessage';

/** Sets one operating condition or target (temperature, refresh window, margin target…). */
export const setOperatingValue: Command<{ readonly field: OperatingNumericField; readonly value: number }> = {
  id: 'operating.setValue',
  label: 'Set operating condition',
  run(design: Design, { field, value }): CommandResult {
    if (design.operating[field] === value) return { ok: true, design };
    const parsed = operatingConditionsSchema.safeParse({ ...design.operating, [field]: value });
    if (!parsed.success) return { ok: false, error: firstIssue(parsed.error) };
    return { ok: true, design: { ...design, operating: parsed.data } };
  },
};
