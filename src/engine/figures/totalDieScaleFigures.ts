import { formatQuantity } from '../../model/units';
import { input, SOURCES } from './explanation';
import { totalFigure } from './totalFigure';

/**
 * Die-scale statistics and standby power: the sense amplifiers the offset budget is spread over (the
 * floorplan's count times its copies on the die), the two-tailed k that follows, and the hold power of
 * static cells.
 */
export const TOTAL_DIE_SCALE_FIGURES = [
  totalFigure({
    key: 'senseAmpCount',
    label: 'Sense amplifiers in the floorplan',
    quantity: 'count',
    group: 'Die scale',
    exportKey: 'senseAmps',
    cli: { label: 'sense amplifiers in the floorplan' },
    value: (r) => r.totals.senseAmpCount,
    explain: (r) => ({
      symbol: 'n_sa',
      formula:
        'n_sa = Σ over mats of (bit lines / 2 for 1T1C pairs; bit lines for gain cells, 4T and 6T columns)',
      inputs: [input('mats', 'mats', r.totals.matCount, 'count')],
      method: 'One amplifier per pair of bit lines a mat reads, whether its strip is placed or not.',
      source: SOURCES.common,
    }),
  }),
  totalFigure({
    key: 'senseAmpsOnDie',
    label: 'Sense amplifiers on the die',
    quantity: 'count',
    group: 'Die scale',
    exportKey: 'senseAmpsOnDie',
    cli: { label: 'sense amplifiers on the die' },
    value: (r) => r.totals.senseAmpsOnDie,
    explain: (r, design) => ({
      symbol: 'N',
      formula: 'N = n_sa × floorplan copies per die',
      inputs: [
        input('n_sa', 'sense amplifiers in this floorplan', r.totals.senseAmpCount, 'count'),
        input('copies', 'floorplan copies per die', design.operating.floorplanCopiesPerDie, 'count'),
      ],
      method: 'The offset budget and the weakest cell are sought over the whole die, not over the sketch.',
      source: SOURCES.common,
    }),
  }),
  totalFigure({
    key: 'offsetSigmaMultiplier',
    label: 'Offset σ multiplier k (two-tailed)',
    quantity: 'ratio',
    group: 'Die scale',
    exportKey: 'offsetSigmaMultiplier_ratio',
    cli: {
      label: 'offset k (two-tailed)',
      text: (r) =>
        `${formatQuantity(r.totals.offsetSigmaMultiplier, 'ratio')} over ${formatQuantity(r.totals.senseAmpsOnDie, 'count')} sense amplifiers`,
    },
    value: (r) => r.totals.offsetSigmaMultiplier,
    explain: (r, design) => ({
      symbol: 'k',
      formula: 'k = Q⁻¹(f / (2·N)),  Q(k) = ½·erfc(k/√2)',
      inputs: [
        input(
          'f',
          'sense amplifiers allowed to fail per die',
          design.operating.allowedSenseFailures,
          'count',
        ),
        input('N', 'sense amplifiers on the die', r.totals.senseAmpsOnDie, 'count'),
      ],
      method:
        'An offset beyond k·σ either way opposes one of the two data, so both Gaussian tails count (P = 2·Q(k) per amplifier).',
      source: `${SOURCES.acklam}; two tails: ${SOURCES.common}`,
    }),
  }),
  totalFigure({
    key: 'standbyPower',
    label: 'Standby power of static cells',
    quantity: 'power',
    group: 'Die scale',
    exportKey: 'standbyPower_W',
    cli: { label: 'standby power of static cells' },
    value: (r) => r.totals.standbyPower,
    explain: (r, design) => {
      const held = design.cells.filter((c) => c.holdCurrent > 0);
      return {
        symbol: 'P_sb',
        formula:
          'P_sb = Σ over mats of bits · I_hold · VDD (DRAM cells hold no current: their cost is refresh)',
        inputs: [
          input('bits', 'bits of cells with a hold current', r.totals.heldBits, 'count'),
          ...held.map((c) => input('I_hold', `hold current per cell (${c.name})`, c.holdCurrent, 'current')),
          input('VDD', 'array voltage', design.process.arrayVoltage, 'voltage'),
        ],
        method: 'Static cells draw their hold (leakage) current from the array supply all the time.',
        source: SOURCES.common,
      };
    },
  }),
] as const;
