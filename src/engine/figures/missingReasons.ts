import type { MatFigures, Totals } from '../evaluation/report';

/**
 * Why a figure does not exist (its value is NaN, shown "—"): one home for the reason texts the panels
 * print beside the dash. A figure that does not exist is never shown as 0 s or 0 µm².
 */

/** The reason a figure of one mat does not exist. */
export function matMissingReason(key: string, f: MatFigures): string {
  if (f.usableBits <= 0)
    return 'no usable bit: no bit line of this mat reaches a sense amplifier with a partner line, or no word line reaches a driver';
  if (/retention/i.test(key) && !f.needsRefresh)
    return 'a static cell keeps its data without refresh: no retention time';
  if (/retention/i.test(key) && !(f.allowedDroop > 0))
    return 'no margin to lose: the fresh signal already falls short of what the sense amplifier needs';
  if (key === 'wordlineTurnOn' || (key === 'rowToColumnDelay' && Number.isNaN(f.wordlineTiming.toTurnOn)))
    return 'the word line never rises to the access turn-on level (Vpre + Vt)';
  if (Number.isNaN(f.timing.latch) && !(f.senseSignal > 0))
    return 'no signal to latch: the developed sense signal is not positive';
  if (Number.isNaN(f.wordlineTiming.toFallOff))
    return 'the access threshold Vt0 is not above 0 V: the access device never turns off';
  return 'this figure does not exist for this mat';
}

/** The reason a whole-floorplan figure does not exist. */
export function totalMissingReason(key: string, t: Totals): string {
  if (t.matCount === 0) return 'no mat is placed';
  if (key.startsWith('areaPerBit')) return 'no usable bit: there is nothing to spread the area over';
  if (/retention/i.test(key))
    return t.worstSenseMargin <= 0
      ? 'a mat has no margin to lose: its fresh signal already falls short'
      : 'no mat with a usable bit needs refresh';
  if (t.usableBits <= 0) return 'no usable bit: nothing is sensed';
  if (/^worst(WordlineTurnOn|RowToColumnDelay|RowCycleTime)$/.test(key))
    return 'no sensed mat completes this step: its word line never rises to the turn-on level (Vpre + Vt), or there is no signal to latch';
  if (key.startsWith('refresh') && Number.isNaN(t.refresh.rowCycleTime))
    return 'no row cycle time: no sensed mat completes a row cycle (its word line never rises to the turn-on level, or there is no signal to latch), so a refresh command has no length';
  return 'no mat has this figure';
}
