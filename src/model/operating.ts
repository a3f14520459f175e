import { z } from 'zod';
import { repairSettingsSchema } from './repairSchema';
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
  /** Expected number of failing sense amplifiers the die may have (repaired by redundancy). */
  allowedSenseFailures: positive('allowed sense-amplifier failures', 1e-9, 1e6),
  /** Defects, redundancy and wafer for the yield figures; absent = the built-in defaults. */
  repair: repairSettingsSchema.optional(),
  /**
   * How many times this floorplan is repeated on the die: the offset budget is spread over the die's
   * sense amplifiers and the weakest cell is sought among the die's cells. 1 = the floorplan is the die.
   */
  floorplanCopiesPerDie: wholeCount('floorplan copies per die', 1, 1_000_000),
  /** Time from the far end of the word line turning the access transistors on to sense-amplifier firing (s). */
  senseFireTime: positive('sense fire time', 1e-12, 1e-3),
  /** Share of the stored-1 level the restore (write-back) must reach before the word line falls (ratio). */
  restoreFraction: positive('restore fraction', 0.5, 0.9999),
  /** Pair difference left after equalising that the next activation tolerates (V). */
  equaliseResidual: positive('equalise residual', 1e-6, 1),
});

export type OperatingConditions = z.infer<typeof operatingConditionsSchema>;
