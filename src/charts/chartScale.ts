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
  return extentScale(min, max, from, to);
}

/** Whether values from `min` to `max` go on a log axis. */
export const logAxisFor = (min: number, max: number): boolean => min > 0 && max / min > LOG_SPAN;

/** axisScale() for values whose least and greatest finite value are known (Infinity, −Infinity: none). */
export function extentScale(
  min: number,
  max: number,
  from: number,
  to: number,
  log = logAxisFor(min, max),
): AxisScale {
  if (!(min <= max)) return { scale: scaleLinear().domain([0, 1]).range([from, to]), log: false };
  if (log && min > 0) {
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

/** The extent an axis shows while its points still arrive, and whether it is logarithmic. */
export interface ShownExtent {
  readonly min: number;
  readonly max: number;
  readonly log: boolean;
}

/** How far past the points a growing axis reaches, as a share of their span (in decades on a log axis). */
const GROWTH_ROOM = 0.25;

/**
 * The extent a growing chart shows for points from `min` to `max`: the one it showed before while the
 * points still fit in it and the axis kind stays, so the scale and every point drawn so far stay put;
 * else the points' extent with room to grow on the sides they passed, so the next points likely fit too.
 * Once the points stop arriving the chart shows their exact extent (the caller passes no `shown`).
 */
export function grownExtent(shown: ShownExtent | null, min: number, max: number): ShownExtent {
  const log = logAxisFor(min, max);
  if (!(min <= max)) return { min, max, log };
  if (shown && shown.log === log && shown.min <= min && max <= shown.max) return shown;
  const below = !shown || min < shown.min;
  const above = !shown || max > shown.max;
  if (log) {
    const decades = Math.max(Math.log10(max / min), 0.3) * GROWTH_ROOM;
    return {
      min: below ? min / 10 ** decades : Math.min(min, shown?.min ?? min),
      max: above ? max * 10 ** decades : Math.max(max, shown?.max ?? max),
      log,
    };
  }
  const room = (max - min || Math.abs(max) || 1) * GROWTH_ROOM;
  return {
    min: below ? min - room : Math.min(min, shown?.min ?? min),
    max: above ? max + room : Math.max(max, shown?.max ?? max),
    log,
  };
}
