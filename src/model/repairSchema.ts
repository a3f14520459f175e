import { z } from 'zod';
import { REPAIR_DOMAINS } from './repair';
import { nonNegative, positive, wholeCount } from './schemaParts';

/**
 * Defects, redundancy and wafer: the operating inputs of the yield figures (SI units: defect density in
 * defects per m², lengths in m, areas in m²). Optional on the operating conditions; a design without them
 * uses {@link DEFAULT_REPAIR}.
 */
export const repairSettingsSchema = z.object({
  /** Killing-defect density D0 (defects per m²; 0.1 /cm² = 1000 /m²). */
  defectDensity: nonNegative('defect density', 1e7),
  /** Negative-binomial cluster parameter α of the defects (small = strongly clustered). */
  defectClustering: positive('defect clustering α', 0.01, 1e6),
  /** Share of the defects in a mat that kill one cell (ratio). */
  killRatioCell: nonNegative('single-cell kill ratio', 1),
  /** Share of the defects in a mat that kill a whole word line (ratio). */
  killRatioWordline: nonNegative('word-line kill ratio', 1),
  /** Share of the defects in a mat that kill a whole bit-line pair (ratio). */
  killRatioBitline: nonNegative('bit-line kill ratio', 1),
  /** Share of the defects outside the mats (periphery) that kill the die (ratio). */
  killRatioPeriphery: nonNegative('periphery kill ratio', 1),
  /** Spare word lines per row-repair domain. */
  spareRows: wholeCount('spare rows per row domain', 0, 256),
  /** Spare bit-line pairs (columns, each with its sense amplifier) per sense-amplifier strip segment. */
  spareColumns: wholeCount('spare columns per sense-amp strip segment', 0, 256),
  repairDomain: z.enum(REPAIR_DOMAINS),
  /** Area of one fuse with its programming device and sense latch (m²). */
  fuseArea: nonNegative('fuse area', 1e-6),
  /** Area of one address-compare bit (XOR and its share of the match gate) (m²). */
  compareBitArea: nonNegative('compare-bit area', 1e-6),
  /** Die area (m²); must hold the floorplan copies. */
  dieArea: positive('die area', 1e-8, 1e-2),
  /** Usable wafer diameter (m). */
  waferDiameter: positive('wafer diameter', 0.01, 0.5),
});

export type RepairSettings = z.infer<typeof repairSettingsSchema>;
