import { scaleLinear, scaleLog, type ScaleContinuousNumeric } from 'd3';

/** A chart axis scale and whether it is logarithmic. */
export interface AxisScale {
  readonly scale: ScaleContinuousNumeric<number, number>;
  readonly log: boolean;
}

/** Values spanning more than this ratio (all positive) are drawn on a log axis. */
const LOG_SPAN = 30;

/**
 * A scale for the given values onto [from, to] px: logarithmic when every value is positive and they
 * span more than a factor of 30 (area per bit from 6 F² DRAM to 150 F² gain cells), else linear and
 * rounded out to nice ticks; padded by 4 % of the span either way.
 */
export function axisScale(values: readonly number[], from: number, to: number): AxisScale {
  let min = Infinity;
  let max = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  if (min === Infinity) return { scale: scaleLinear().domain([0, 1]).range([from, to]), log: false };
  if (min > 0 && max / min > LOG_SPAN) {
    const pad = Math.pow(max / min, 0.04);
    // No nice(): on a log axis it rounds out to whole decades and squeezes the points together.
    return {
      scale: scaleLog()
        .domain([min / pad, max * pad])
        .range([from, to]),
      log: true,
    };
  }
  const span = max - min || Math.abs(max) || 1;
  return {
    scale: scaleLinear()
      .domain([min - span * 0.04, max + span * 0.04])
      .range([from, to])
      .nice(),
    log: false,
  };
}

/** Tick values: about `count` for a linear axis, the 1-2-5 decades for a log one. */
export function axisTicks(axis: AxisScale, count: number): number[] {
  const ticks = axis.scale.ticks(count);
  if (!axis.log) return ticks;
  const picked = ticks.filter((t) => {
    const mantissa = t / Math.pow(10, Math.floor(Math.log10(t) + 1e-9));
    return [1, 2, 5].some((m) => Math.abs(mantissa - m) < 1e-6);
  });
  return picked.length >= 2 ? picked : ticks;
}
