import { z } from 'zod';
import { repairSettingsSchema } from './repair';
import { nonNegative, positive, wholeCount } from './schemaParts';

/**
 * Operating conditions and targets a design is judged against (SI units). They belong to the design,
 * not the process: the same process serves a 64 ms commodity part and a hot embedded macro.
 */
export const operatingConditionsSchema = z.object({
  /** Junction temperature the figures are computed at (K). */
  temperature: positive('operating temperature', 200, 500),
  /** Refresh window tREFW: every row is refreshed once in this time (s). */
  refreshWindow: positive('refresh window', 1e-6, 1e4),
  /** Refresh commands per window (8192 in DDR3/DDR4). */
  refreshCommandsPerWindow: wholeCount('refresh commands per window', 1, 1_048_576),
  /** Rows one refresh command activates at the same time, in different sub-arrays. */
  refreshRowsInParallel: wholeCount('rows refreshed in parallel', 1, 65_536),
  /** Net sense margin below which a warning is raised (V). */
  minimumSenseMargin: nonNegative('minimum sense margin', 1),
  /** Expected number of failing sense amplifiers the array may have (repaired by redundancy). */
  allowedSenseFailures: positive('allowed sense-amplifier failures', 1e-9, 1e6),
  /** Defects, redundancy and wafer for the yield figures; absent = the built-in defaults. */
  repair: repairSettingsSchema.optional(),
});

export type OperatingConditions = z.infer<typeof operatingConditionsSchema>;
