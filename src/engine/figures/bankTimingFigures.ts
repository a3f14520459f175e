import { input, SOURCES } from './explanation';
import { bankFigure, EVERY_VIEW } from './bankFigure';

const CHAIN = `JEDEC JESD79-4 (tRCD, tRAS, tRP, tRC); the first-order chain: ${SOURCES.common}`;

/** A step of the slowest mat's row timing chain, shown as an input of tRCD or tRC. */
const chainStep = <
  const Key extends 'wordlineTurnOn' | 'senseFireWait' | 'latchTime' | 'rowActiveTime' | 'rowPrechargeTime',
>(
  key: Key,
  label: string,
  symbol: string,
) =>
  bankFigure({
    key,
    label,
    quantity: 'time',
    better: 'lower',
    offeredIn: [],
    exportKey: null,
    explain: (f) => {
      const ofCycle = key === 'rowActiveTime' || key === 'rowPrechargeTime';
      const total = ofCycle ? f.rowCycleTime : f.rowToColumnDelay;
      const name = ofCycle ? 'tRC' : 'tRCD';
      const exists = !Number.isNaN(total);
      return {
        symbol,
        formula: exists
          ? `${symbol}: a step of ${name} in the mat with the longest ${name}`
          : `${symbol} of the first mat (no mat is sensed, so ${name} does not exist)`,
        inputs: [
          input(symbol, `this step (${label.toLowerCase()})`, f[key], 'time'),
          ...(exists ? [input(name, `the ${name} it is a part of`, total, 'time')] : []),
        ],
        method: 'A step of the row timing chain (engine/physics/rowTiming.ts); the mat figures explain it.',
        source: CHAIN,
      };
    },
  });

/**
 * Comparison figures of a bank's row timing (explorer axes, point card, variants table): tRCD and tRC of
 * its slowest mat, and the steps they add up. NaN (shown "—") when no mat is sensed.
 */
export const BANK_TIMING_FIGURES = [
  bankFigure({
    key: 'rowToColumnDelay',
    label: 'Row to column delay tRCD',
    quantity: 'time',
    better: 'lower',
    offeredIn: EVERY_VIEW,
    exportKey: null,
    explain: (f) => ({
      symbol: 'tRCD',
      formula: 'tRCD = t_on + t_fire + t_latch',
      inputs: [
        input('t_on', 'word line to turn-on', f.wordlineTurnOn, 'time'),
        input('t_fire', 'development until the sense amplifier fires', f.senseFireWait, 'time'),
        input('t_latch', 'latch', f.latchTime, 'time'),
      ],
      method: 'Slowest mat; first-order array core only (no decoding, no margins).',
      source: CHAIN,
    }),
  }),
  bankFigure({
    key: 'rowCycleTime',
    label: 'Row cycle tRC',
    quantity: 'time',
    better: 'lower',
    offeredIn: EVERY_VIEW,
    exportKey: null,
    explain: (f) => ({
      symbol: 'tRC',
      formula: 'tRC = tRAS + tRP',
      inputs: [
        input('tRAS', 'row active time', f.rowActiveTime, 'time'),
        input('tRP', 'row precharge time', f.rowPrechargeTime, 'time'),
      ],
      method:
        'Slowest mat; first-order array core only. The refresh figures use it unless the process overrides tRC.',
      source: CHAIN,
    }),
  }),
  chainStep('wordlineTurnOn', 'Word line to turn-on', 't_on'),
  chainStep('senseFireWait', 'Wait until the sense amplifier fires', 't_fire'),
  chainStep('latchTime', 'Sense-amplifier latch', 't_latch'),
  chainStep('rowActiveTime', 'Row active time tRAS', 'tRAS'),
  chainStep('rowPrechargeTime', 'Row precharge time tRP', 'tRP'),
] as const;
