import { describe, expect, it } from 'vitest';
import {
  formatPosition,
  formatQuantity,
  formatScaled,
  parseQuantity,
  positionDecimals,
  type Quantity,
} from '../../src/model/units';

/** The SI value of a parse that must succeed; fails the test with the parser's message otherwise. */
function parsed(text: string, quantity: Quantity): number {
  const result = parseQuantity(text, quantity);
  if (!result.ok) throw new Error(`expected "${text}" to parse as ${quantity}: ${result.error}`);
  return result.value;
}

describe('parseQuantity: engineering notation in, SI out', () => {
  // Source for every prefix factor: SI brochure, BIPM, 9th ed., 2019, table 7 (SI prefixes); arithmetic.
  it.each([
    ['25f', 'capacitance', 25e-15],
    ['25 fF', 'capacitance', 25e-15],
    ['0.12u', 'length', 0.12e-6],
    ['0.12 um', 'length', 0.12e-6],
    ['120 µm', 'length', 120e-6],
    ['1.1 V', 'voltage', 1.1],
    ['1.1v', 'voltage', 1.1],
    ['500m', 'voltage', 0.5],
    ['500mV', 'voltage', 0.5],
    ['10 kohm', 'resistance', 10e3],
    ['2.5e-14', 'capacitance', 2.5e-14],
  ] as const)('"%s" as %s is %s', (text, quantity, expected) => {
    expect(parsed(text, quantity) / expected).toBeCloseTo(1, 12);
  });

  it('"25f" is 25 femtofarads, never 25 farads', () => {
    // Source: common practice (no source): a lone prefix letter is a prefix, as in SPICE.
    expect(parsed('25f', 'capacitance')).toBeLessThan(1e-12);
  });

  it('percent: "65 %" and "65" are 0.65', () => {
    // Source: arithmetic (65/100).
    expect(parsed('65 %', 'percent')).toBeCloseTo(0.65, 12);
    expect(parsed('65', 'percent')).toBeCloseTo(0.65, 12);
  });

  it('temperature: "85 °C" is 358.15 K, "358 K" is 358 K', () => {
    // Source: SI brochure, BIPM, 9th ed., 2019, §2.3.1: t/°C = T/K − 273.15 (arithmetic).
    expect(parsed('85 °C', 'temperature')).toBeCloseTo(358.15, 9);
    expect(parsed('358 K', 'temperature')).toBe(358);
  });

  it('area prefixes square: "1 um2" is 1e-12 m²', () => {
    // Source: arithmetic, (1e-6 m)² = 1e-12 m².
    expect(parsed('1 um2', 'area')).toBeCloseTo(1e-12, 24);
  });

  it.each([
    ['abc', 'voltage', /not a number/],
    ['', 'voltage', /not a number/],
    ['5 xF', 'capacitance', /unknown unit or prefix "xF"/],
    ['1e400', 'voltage', /too large/],
    ['1.1 A', 'voltage', /unknown unit/],
    ['85 F', 'temperature', /expected a temperature/],
  ] as const)('"%s" as %s is refused with a message', (text, quantity, message) => {
    // Source: common practice (no source): bad input gives a message instead of a number.
    const result = parseQuantity(text, quantity);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error).toMatch(message);
  });
});

describe('formatQuantity: SI in, engineering notation out', () => {
  // Source for every expected string: arithmetic with SI prefixes (BIPM SI brochure, 9th ed., 2019, table 7).
  it.each([
    [2.5e-14, 'capacitance', '25 fF'],
    [3.6864e-5, 'length', '36.86 µm'],
    [1.1, 'voltage', '1.1 V'],
    [0.08525, 'voltage', '85.25 mV'],
    [0, 'voltage', '0 V'],
    [10e3, 'resistance', '10 kΩ'],
    [9.99996e-13, 'capacitance', '1 pF'],
    [1.3589e-9, 'area', '1359 µm²'],
    [1.8e-4, 'area', '180 mm²'],
    [3.455e-8, 'area', '34550 µm²'],
    [0.65, 'percent', '65 %'],
    [0.6293, 'percent', '62.93 %'],
    [358.15, 'temperature', '85 °C'],
    [8388608, 'count', '8,388,608'],
    [0.155, 'ratio', '0.155'],
  ] as const)('%s as %s reads "%s"', (value, quantity, expected) => {
    expect(formatQuantity(value, quantity)).toBe(expected);
  });

  it('areas switch from µm² to mm² at 0.1 mm², deciding on the rounded figure', () => {
    // Source: common practice (no source) for the switch point; arithmetic for the values.
    expect(formatQuantity(99_000e-12, 'area')).toBe('99000 µm²');
    expect(formatQuantity(99_999.9e-12, 'area')).toBe('0.1 mm²');
    expect(formatQuantity(100_000e-12, 'area')).toBe('0.1 mm²');
  });

  it('NaN is a dash and infinities are signed', () => {
    // Source: common practice (no source).
    expect(formatQuantity(Number.NaN, 'voltage')).toBe('—');
    expect(formatQuantity(Number.POSITIVE_INFINITY, 'capacitance')).toBe('∞');
    expect(formatQuantity(Number.NEGATIVE_INFINITY, 'capacitance')).toBe('−∞');
  });

  it('formatScaled gives a bare number in a fixed prefix for table columns', () => {
    // Source: arithmetic (59.97e-15 F in fF; 85.25e-3 V in mV).
    expect(formatScaled(59.9712e-15, 'f', 2)).toBe('59.97');
    expect(formatScaled(0.08525, 'm', 1)).toBe('85.3');
    expect(formatScaled(0.155, '', 4)).toBe('0.1550');
    expect(formatScaled(Number.NaN, 'm', 1)).toBe('—');
    expect(() => formatScaled(1, 'x', 1)).toThrow(/unknown prefix/);
  });

  it('what formatQuantity prints, parseQuantity reads back', () => {
    // Source: common practice (no source): a round trip keeps the shown digits.
    for (const [value, quantity] of [
      [2.5e-14, 'capacitance'],
      [3.6864e-5, 'length'],
      [0.08525, 'voltage'],
      [358.15, 'temperature'],
      [0.65, 'percent'],
    ] as const) {
      expect(parsed(formatQuantity(value, quantity), quantity) / value).toBeCloseTo(1, 3);
    }
  });
});

describe('positions at the grid’s precision', () => {
  it('takes as many decimals of a micrometre as the grid step needs, never fewer than whole nm (arithmetic)', () => {
    expect(positionDecimals(36e-9)).toBe(3);
    expect(positionDecimals(54e-9)).toBe(3);
    expect(positionDecimals(0.1e-6)).toBe(3);
    expect(positionDecimals(2e-6)).toBe(3);
    expect(positionDecimals(7.5e-9)).toBe(4);
    expect(positionDecimals(0.5e-9)).toBe(4);
    // A step finer than 0.1 nm (or none) still stops at 0.1 nm, or nm when there is no step.
    expect(positionDecimals(1e-12)).toBe(4);
    expect(positionDecimals(0)).toBe(3);
  });

  it('shows a position in µm at that precision however far from the origin', () => {
    expect(formatPosition(21e-6, 36e-9)).toBe('21.000 µm');
    expect(formatPosition(12345.678e-6, 36e-9)).toBe('12345.678 µm');
    expect(formatPosition(0.036e-6 * 3e5, 36e-9)).toBe('10800.000 µm');
    expect(formatPosition(-1e-13, 36e-9)).toBe('0.000 µm');
    expect(formatPosition(-21.036e-6, 36e-9)).toBe('-21.036 µm');
    expect(formatPosition(Number.NaN, 36e-9)).toBe('—');
  });

  it('reads back what it shows', () => {
    for (const v of [21.036e-6, 12345.678e-6, -3.6e-8]) {
      expect(Math.abs(parsed(formatPosition(v, 36e-9), 'length') - v)).toBeLessThan(1e-15);
    }
  });
});
