import type { MatFigures, Totals } from '../evaluation/report';
import type { FigureKey, PartitionFigures } from './bankFigure';

/**
 * Why a figure does not exist (its value is NaN, shown "—"): one home for the reason texts that the
 * figures panel, the explanation cards, the variants table and the explorer's point card print beside
 * the dash. A figure that does not exist is never shown as 0 s or 0 µm².
 */
export const MISSING_REASONS = {
  noMat: 'no mat is placed',
  noUsableBit:
    'no usable bit: no bit line reaches a sense amplifier with a partner line, or no word line reaches a driver',
  noBitForArea: 'no usable bit: there is nothing to spread the area over',
  nothingSensed: 'no usable bit: nothing is sensed',
  staticCell: 'a static cell keeps its data without refresh: no retention time',
  noMarginToLose: 'no margin to lose: the fresh signal already falls short of what the sense amplifier needs',
  neverTurnsOn: 'the word line never rises to the access turn-on level (Vpre + Vt)',
  noSignal: 'no signal to latch: the developed sense signal is not positive',
  neverOff: 'the access threshold Vt0 is not above 0 V: the access device never turns off',
  noRowCycle:
    'the row cycle does not complete: the word line never reaches turn-on, there is no signal to latch, or the access device never turns off',
  noRowCycleTime:
    'no row cycle time: no sensed mat completes a row cycle (its word line never rises to the turn-on level, or there is no signal to latch), so a refresh command has no length',
  noYield: 'yield was not computed for this sweep (turn on the yield figures to see it)',
} as const;

/** The reason a figure of one mat does not exist. */
export function matMissingReason(key: string, f: MatFigures): string {
  if (f.usableBits <= 0) return MISSING_REASONS.noUsableBit;
  if (/retention/i.test(key) && !f.needsRefresh) return MISSING_REASONS.staticCell;
  if (/retention/i.test(key) && !(f.allowedDroop > 0)) return MISSING_REASONS.noMarginToLose;
  if (key === 'wordlineTurnOn' || (key === 'rowToColumnDelay' && Number.isNaN(f.wordlineTiming.toTurnOn)))
    return MISSING_REASONS.neverTurnsOn;
  if (Number.isNaN(f.timing.latch) && !(f.senseSignal > 0)) return MISSING_REASONS.noSignal;
  if (Number.isNaN(f.wordlineTiming.toFallOff)) return MISSING_REASONS.neverOff;
  return 'this figure does not exist for this mat';
}

/** The reason a whole-floorplan figure does not exist. */
export function totalMissingReason(key: string, t: Totals): string {
  if (t.matCount === 0) return MISSING_REASONS.noMat;
  if (key.startsWith('areaPerBit')) return MISSING_REASONS.noBitForArea;
  if (/retention/i.test(key))
    return t.worstSenseMargin <= 0
      ? 'a mat has no margin to lose: its fresh signal already falls short'
      : 'no mat with a usable bit needs refresh';
  if (t.usableBits <= 0) return MISSING_REASONS.nothingSensed;
  if (/^worst(WordlineTurnOn|RowToColumnDelay|RowCycleTime)$/.test(key))
    return 'no sensed mat completes this step: its word line never rises to the turn-on level (Vpre + Vt), or there is no signal to latch';
  if (key.startsWith('refresh') && Number.isNaN(t.refresh.rowCycleTime))
    return MISSING_REASONS.noRowCycleTime;
  return 'no mat has this figure';
}

/** Bank figures computed only when the sweep (or the variant) asks for yield. */
const YIELD_KEYS: ReadonlySet<FigureKey> = new Set([
  'dieYield',
  'repairProbability',
  'redundancyArea',
  'areaPerBitWithRedundancy',
  'goodDiesPerWafer',
  'spareRows',
  'spareColumns',
]);

/**
 * The reason a bank's comparison figure does not exist (explorer point card, variants table). A bank
 * with no rows to refresh (refresh cycle 0) holds static cells.
 */
export function bankMissingReason(key: FigureKey, f: PartitionFigures): string {
  if (f.matCount === 0) return MISSING_REASONS.noMat;
  if (YIELD_KEYS.has(key)) return MISSING_REASONS.noYield;
  if (f.usableBits <= 0)
    return key.startsWith('areaPerBit') ? MISSING_REASONS.noBitForArea : MISSING_REASONS.noUsableBit;
  if (key === 'retentionTime' || key === 'weakestRetentionTime')
    return f.refreshCycleTime === 0 && f.refreshPower === 0
      ? MISSING_REASONS.staticCell
      : MISSING_REASONS.noMarginToLose;
  if (key === 'wordlineTurnOn') return MISSING_REASONS.neverTurnsOn;
  if (key === 'latchTime') return MISSING_REASONS.noSignal;
  if (
    key === 'rowToColumnDelay' ||
    key === 'rowCycleTime' ||
    key === 'rowActiveTime' ||
    key === 'rowPrechargeTime'
  )
    return MISSING_REASONS.noRowCycle;
  return 'this bank has no such figure';
}
