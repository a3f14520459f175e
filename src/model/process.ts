import { z } from 'zod';
import { finite, nonNegative, positive } from './schemaParts';

/** Linear stacking adds offset and noise (worst case); 'rss' takes the root sum of squares (independent). */
export const OFFSET_STACKINGS = ['linear', 'rss'] as const;
export type OffsetStacking = (typeof OFFSET_STACKINGS)[number];

/**
 * A process profile: the technology numbers the engine needs, all in SI units.
 * Parasitics are counted by crossing, not by cell: a bit line crosses every word line of its mat and a
 * word line every bit line, and in a folded array a line crosses twice as many lines as it has cells.
 * A crossing where the word line is the gate of that bit line's cell is "active"; elsewhere the word
 * line passes by (over isolation or a neighbour's active area).
 */
export const processProfileSchema = z
  .object({
    id: z.string().min(1).max(80),
    name: z.string().min(1).max(120),
    description: z.string().max(2000).default(''),
    /** Minimum feature size F (m). */
    featureSize: positive('feature size', 1e-9, 1e-5),
    /** Array supply: the full bit-line swing and the stored-1 target (V). */
    arrayVoltage: positive('array voltage', 0.1, 10),
    /** Boosted word-line high level VPP (V). */
    wordlineHighVoltage: positive('word-line high voltage', 0.1, 20),
    /** Bit-line precharge level (V); half the array voltage in most DRAM. */
    prechargeVoltage: nonNegative('precharge voltage', 10),
    /** Access-transistor threshold at zero source-body bias (V). */
    accessThresholdVoltage: finite('access threshold voltage', -2, 5),
    /** Body-effect coefficient γ (V^½). */
    bodyEffectCoefficient: nonNegative('body-effect coefficient', 5),
    /** Twice the Fermi potential, 2φF (V). */
    surfacePotential: positive('surface potential 2φF', 0.1, 3),
    /** Bit-line capacitance per cell from the cell's junction and contact (F). */
    bitlineJunctionCapacitancePerCell: nonNegative('bit-line junction capacitance per cell', 1e-12),
    /** Bit-line to word-line coupling at one crossing (F); seen by the bit line and by the word line. */
    bitlineToWordlineCapacitancePerCrossing: nonNegative(
      'bit-line to word-line capacitance per crossing',
      1e-12,
    ),
    /** Coupling of a bit line to its two neighbours over one word-line pitch of its run (F). */
    bitlineToBitlineCapacitancePerCrossing: nonNegative(
      'bit-line to bit-line capacitance per crossing',
      1e-12,
    ),
    /** Bit-line wire capacitance to everything else, per metre of bit line (F/m). */
    bitlineWireCapacitancePerLength: nonNegative('bit-line wire capacitance per length', 1e-6),
    /** Bit-line resistance per metre (Ω/m). */
    bitlineResistancePerLength: nonNegative('bit-line resistance per length', 1e15),
    /** Word-line gate load where the word line is the gate of a cell's access transistor (F). */
    wordlineGateCapacitancePerActiveCrossing: nonNegative(
      'word-line gate capacitance per active crossing',
      1e-12,
    ),
    /** Word-line load where it passes a bit line without gating a cell (folded arrays) (F). */
    wordlinePassingCapacitancePerCrossing: nonNegative('word-line passing capacitance per crossing', 1e-12),
    /** Word-line wire capacitance per metre (F/m). */
    wordlineWireCapacitancePerLength: nonNegative('word-line wire capacitance per length', 1e-6),
    /** Word-line resistance per metre (Ω/m). */
    wordlineResistancePerLength: nonNegative('word-line resistance per length', 1e15),
    /** Sense-amplifier input capacitance added to each bit line (F). */
    senseAmpInputCapacitance: nonNegative('sense-amplifier input capacitance', 1e-12),
    /** Capacitance the sense-amplifier latch switches rail to rail per sense (F). */
    senseAmpSwitchedCapacitance: nonNegative('sense-amplifier switched capacitance', 1e-12),
    /**
     * 1/gm of the sense-amplifier latch's cross-coupled pair (Ω): with the bit line on each latch node the
     * regeneration time constant is τ = C_bl / gm.
     */
    senseAmpLatchResistance: positive('sense-amplifier latch resistance 1/gm', 1, 1e9),
    /** On-resistance of the equaliser that shorts a bit-line pair during precharge (Ω). */
    equaliserResistance: positive('equaliser resistance', 1, 1e9),
    /** Pelgrom matching coefficient A_VT of the sense-amplifier pair (V·m); 2.5 mV·µm = 2.5e-9 V·m. */
    senseAmpMatchingCoefficient: nonNegative('sense-amplifier matching coefficient A_VT', 1e-6),
    /** Gate width W of one sense-amplifier input transistor (m). */
    senseAmpTransistorWidth: positive('sense-amplifier transistor width', 1e-9, 1e-4),
    /** Gate length L of one sense-amplifier input transistor (m). */
    senseAmpTransistorLength: positive('sense-amplifier transistor length', 1e-9, 1e-4),
    /** Layout width one sense amplifier needs along its strip (m); checked against the bit-line pitch budget. */
    senseAmpWidth: positive('sense-amplifier width', 1e-9, 1e-4),
    /** How offset and noise add up: linearly (worst case) or as a root sum of squares. */
    offsetStacking: z.enum(OFFSET_STACKINGS),
    /** Share of bit-line coupling noise a folded pair does not reject as common mode (ratio). */
    foldedNoiseFactor: nonNegative('folded-bit-line noise factor', 1),
    /** Share of bit-line coupling noise an open pair does not reject (ratio); larger than folded. */
    openNoiseFactor: nonNegative('open-bit-line noise factor', 1),
    /** Output resistance of a sub-word-line driver (Ω). */
    wordlineDriverResistance: nonNegative('word-line driver resistance', 1e9),
    /** On-resistance of the access (write) transistor (Ω). */
    accessTransistorResistance: nonNegative('access transistor resistance', 1e12),
    /** Time a gain-cell read bit line is allowed to develop before sensing (s). */
    gainCellSenseTime: positive('gain-cell sense time', 1e-12, 1e-3),
    /**
     * Row cycle time tRC the refresh figures use instead of the computed one (s); 0 keeps the computed
     * tRC = tRAS + tRP of the slowest mat.
     */
    rowCycleTimeOverride: nonNegative('row cycle time override', 1e-3),
    /** Storage-node leakage current of one cell at the reference temperature (A). */
    cellLeakageCurrent: nonNegative('cell leakage current', 1e-6),
    /** Temperature at which the leakage current is given (K). */
    leakageReferenceTemperature: positive('leakage reference temperature', 200, 500),
    /**
     * Arrhenius activation energy of the leakage (J); 0.79 eV ≈ 1.27e-19 J halves retention per 10 °C near
     * 90 °C. Capped at 2 eV (silicon's band gap is 1.12 eV), which with temperatures of 200–500 K keeps the
     * scaled leakage finite.
     */
    leakageActivationEnergy: nonNegative('leakage activation energy', 3.2e-19),
    /**
     * Weak-cell tail of the retention distribution (two-population model): the share of cells in the tail,
     * the median tail leakage as a multiple of the main cell's, the spread σ of ln(leakage) within the
     * tail, and the tail's own activation energy (J).
     */
    tailCellFraction: nonNegative('tail cell fraction', 1),
    tailLeakageMultiplier: positive('tail leakage multiplier', 1, 1e9),
    tailLeakageSpread: nonNegative('tail leakage spread σ(ln I)', 5),
    tailActivationEnergy: nonNegative('tail activation energy', 3.2e-19),
  })
  .superRefine((p, ctx) => {
    if (p.prechargeVoltage > p.arrayVoltage) {
      ctx.addIssue({
        code: 'custom',
        path: ['prechargeVoltage'],
        message: 'precharge voltage must not exceed the array voltage',
      });
    }
  });

export type ProcessProfile = z.infer<typeof processProfileSchema>;
