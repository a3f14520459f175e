import { formatScaled } from '../model/units';

/**
 * The smallest "nice" step (1, 2 or 5 times a power of ten) that is at least `minimum`. Used for grid
 * spacing and ruler ticks so that lines stay a readable distance apart at any zoom.
 */
export function niceStep(minimum: number): number {
  if (!(minimum > 0) || !Number.isFinite(minimum)) return 1;
  const power = 10 ** Math.floor(Math.log10(minimum));
  for (const m of [1, 2, 5, 10]) if (m * power >= minimum * (1 - 1e-12)) return m * power;
  return 10 * power;
}

/** Multiples of `step` from the first at or after `start` up to `end`. */
export function ticksBetween(start: number, end: number, step: number): number[] {
  const ticks: number[] = [];
  if (!(step > 0)) return ticks;
  const first = Math.ceil(start / step);
  const last = Math.floor(end / step);
  for (let i = first; i <= last && ticks.length < 2000; i++) ticks.push(i * step);
  return ticks;
}

/** A ruler label in micrometres for a position (m), with as many decimals as the step (m) needs. */
export function micrometreLabel(position: number, step: number): string {
  const stepUm = step * 1e6;
  const decimals = Math.max(0, Math.min(6, -Math.floor(Math.log10(stepUm) + 1e-9)));
  const text = formatScaled(position, 'µ', decimals);
  return text === '-0' ? '0' : text;
}
