import { BUILTIN_PROCESSES } from '../model/builtins';
import type { Design } from '../model/design';
import type { ProcessNumericField } from '../model/fieldCatalog';
import { processProfileSchema } from '../model/process';
import type { Command, CommandResult } from './command';
import { firstIssue } from './zodMessage';

/** Replaces the design's process with a built-in profile (a copy: editing it never touches the built-in). */
export const applyBuiltinProcess: Command<{ readonly processId: string }> = {
  id: 'process.applyBuiltin',
  label: 'Use built-in process',
  run(design: Design, { processId }): CommandResult {
    const profile = BUILTIN_PROCESSES.find((p) => p.id === processId);
    if (!profile) return { ok: false, error: `no built-in process "${processId}"` };
    return { ok: true, design: { ...design, process: { ...profile } } };
  },
};

/** Sets one numeric process value; the whole profile is re-validated so cross-field rules hold. */
export const setProcessValue: Command<{ readonly field: ProcessNumericField; readonly value: number }> = {
  id: 'process.setValue',
  label: 'Set process value',
  run(design: Design, { field, value }): CommandResult {
    if (design.process[field] === value) return { ok: true, design };
    const parsed = processProfileSchema.safeParse({ ...design.process, [field]: value });
    if (!parsed.success) return { ok: false, error: firstIssue(parsed.error) };
    return { ok: true, design: { ...design, process: parsed.data } };
  },
};

/** Sets whether offset and noise add linearly or as a root sum of squares. */
export const setOffsetStacking: Command<{ readonly stacking: 'linear' | 'rss' }> = {
  id: 'process.setOffsetStacking',
  label: 'Set offset stacking',
  run(design: Design, { stacking }): CommandResult {
    if (design.process.offsetStacking === stacking) return { ok: true, design };
    return { ok: true, design: { ...design, process: { ...design.process, offsetStacking: stacking } } };
  },
};
