/**
 * The one place where SI values meet people: engineering notation in, engineering notation out.
 *
 * Inside Matloom every value is in SI base units (m, F, V, s, A, Ω, J, K). Panels, exports and the CLI
 * format through {@link formatQuantity} and parse what people type through {@link parseQuantity}
 * ("25f", "25 fF", "0.12u", "1.1 V", "120 µm", "85 °C").
 */

/** The physical quantities Matloom shows, each with its SI unit symbol and preferred display prefix. */
export const QUANTITIES = {
  length: { unit: 'm', preferredPrefix: 'µ' },
  area: { unit: 'm²', preferredPrefix: null },
  capacitance: { unit: 'F', preferredPrefix: 'f' },
  capacitancePerLength: { unit: 'F/m', preferredPrefix: null },
  voltage: { unit: 'V', preferredPrefix: null },
  time: { unit: 's', preferredPrefix: null },
  current: { unit: 'A', preferredPrefix: null },
  resistance: { unit: 'Ω', preferredPrefix: null },
  resistancePerLength: { unit: 'Ω/m', preferredPrefix: null },
  energy: { unit: 'J', preferredPrefix: null },
  power: { unit: 'W', preferredPrefix: null },
  temperature: { unit: 'K', preferredPrefix: null },
  sqrtVoltage: { unit: 'V^½', preferredPrefix: null },
  /** Pelgrom A_VT, shown in the trade's mV·µm (1 mV·µm = 1e-9 V·m); a bare number is read as mV·µm. */
  matchingCoefficient: { unit: 'V·m', preferredPrefix: null },
  /** MOS gain factor β = µ·Cox·W/L. */
  transconductance: { unit: 'A/V²', preferredPrefix: null },
  /** Activation energy, shown in eV; a bare number is read as eV. */
  activationEnergy: { unit: 'J', preferredPrefix: null },
  /** Defects per area, shown per cm² as the trade quotes D0; a bare number is read as per cm². */
  defectDensity: { unit: '/m²', preferredPrefix: null },
  ratio: { unit: '', preferredPrefix: null },
  percent: { unit: '%', preferredPrefix: null },
  count: { unit: '', preferredPrefix: null },
} as const;

export type Quantity = keyof typeof QUANTITIES;

const PREFIXES: readonly { symbol: string; exponent: number }[] = [
  { symbol: 'a', exponent: -18 },
  { symbol: 'f', exponent: -15 },
  { symbol: 'p', exponent: -12 },
  { symbol: 'n', exponent: -9 },
  { symbol: 'µ', exponent: -6 },
  { symbol: 'm', exponent: -3 },
  { symbol: '', exponent: 0 },
  { symbol: 'k', exponent: 3 },
  { symbol: 'M', exponent: 6 },
  { symbol: 'G', exponent: 9 },
  { symbol: 'T', exponent: 12 },
];

const PREFIX_EXPONENT = new Map<string, number>([
  ...PREFIXES.map((p): [string, number] => [p.symbol, p.exponent]),
  ['u', -6],
  ['μ', -6], // Greek mu (U+03BC) as well as the micro sign (U+00B5)
]);

const ZERO_CELSIUS_IN_KELVIN = 273.15;
/** 1 mV·µm in V·m. */
const MILLIVOLT_MICROMETRE = 1e-9;
/** 1 per cm² in per m². */
const PER_SQUARE_CENTIMETRE = 1e4;
/** 1 eV in J (exact, SI 2019). */
const ELECTRONVOLT = 1.602176634e-19;

/** Significant digits used when formatting, unless a caller asks for more. */
const DEFAULT_DIGITS = 4;

function trimNumber(value: number, digits: number): string {
  // toPrecision gives significant digits; Number() drops trailing zeros; keep an integer-looking value short.
  const text = Number(value.toPrecision(digits)).toString();
  return text.includes('e') ? value.toPrecision(digits) : text;
}

/**
 * Groups thousands the one way Matloom shows whole numbers ("1,048,576"): a count, a limit, a size in a
 * message. One formatter made once — `Number#toLocaleString` builds a new locale formatter on each call,
 * which showed as a tenth of the CLI's start-up and costs far more in Chromium.
 */
const WHOLE_NUMBER = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/** A whole number with its thousands grouped, e.g. 1048576 → "1,048,576" (rounded to the nearest unit). */
export function formatWholeNumber(value: number): string {
  return WHOLE_NUMBER.format(Math.round(value));
}

/** Formats an SI value with an engineering prefix, e.g. 2.5e-14 F → "25 fF", 3.6e-5 m → "36 µm". */
export function formatQuantity(value: number, quantity: Quantity, digits = DEFAULT_DIGITS): string {
  if (!Number.isFinite(value)) return Number.isNaN(value) ? '—' : value > 0 ? '∞' : '−∞';
  const { unit } = QUANTITIES[quantity];
  switch (quantity) {
    case 'ratio':
      return trimNumber(value, digits);
    case 'count':
      return formatWholeNumber(value);
    case 'percent':
      return `${trimNumber(value * 100, digits)} %`;
    case 'temperature':
      return `${trimNumber(value - ZERO_CELSIUS_IN_KELVIN, digits)} °C`;
    case 'area':
      return formatArea(value, digits);
    case 'sqrtVoltage':
      // A prefix would scale V^½ wrongly (1 mV^½ ≠ 1e-3 V^½), so this one stays unprefixed.
      return `${trimNumber(value, digits)} V^½`;
    case 'matchingCoefficient':
      return `${trimNumber(value / MILLIVOLT_MICROMETRE, digits)} mV·µm`;
    case 'activationEnergy':
      return `${trimNumber(value / ELECTRONVOLT, digits)} eV`;
    case 'defectDensity':
      return `${trimNumber(value / PER_SQUARE_CENTIMETRE, digits)} /cm²`;
    default:
      return formatWithPrefix(value, unit, digits);
  }
}

function formatWithPrefix(value: number, unit: string, digits: number): string {
  if (value === 0) return `0 ${unit}`;
  // Pick the prefix from the value as it will be shown, so 9.99996e-13 F reads "1 pF", not "1000 fF".
  const shown = Number(value.toPrecision(digits));
  const exponent = Math.floor(Math.log10(Math.abs(shown)) / 3) * 3;
  const clamped = Math.min(12, Math.max(-18, exponent));
  const prefix = PREFIXES.find((p) => p.exponent === clamped) ?? { symbol: '', exponent: 0 };
  return `${trimNumber(value / 10 ** prefix.exponent, digits)} ${prefix.symbol}${unit}`;
}

/**
 * An SI value as a bare number in a fixed prefix with fixed decimals, for table columns whose header
 * already names the unit (e.g. "Cbl (fF)"): formatScaled(8.5e-14, 'f', 2) → "85.00". NaN → "—".
 */
export function formatScaled(value: number, prefix: string, decimals: number): string {
  if (!Number.isFinite(value)) return Number.isNaN(value) ? '—' : value > 0 ? '∞' : '−∞';
  const exponent = PREFIX_EXPONENT.get(prefix);
  if (exponent === undefined) throw new Error(`unknown prefix "${prefix}"`);
  return (value / 10 ** exponent).toFixed(decimals);
}

/** Position decimals in µm: at least whole nanometres (every length of a floorplan is), at most 0.1 nm. */
const MIN_POSITION_DECIMALS = 3;
const MAX_POSITION_DECIMALS = 4;

/**
 * How many decimals of a micrometre show every whole multiple of a grid step `step` (m) exactly, and never
 * fewer than whole nanometres (a block placed on another cell's grid keeps its nanometres): 3 for a 36 nm
 * or a 2 µm pitch, 4 for 7.5 nm; at most 4 (0.1 nm).
 */
export function positionDecimals(step: number): number {
  const micrometres = Math.abs(step) * 1e6;
  if (!(micrometres > 0) || !Number.isFinite(micrometres)) return MIN_POSITION_DECIMALS;
  for (let d = MIN_POSITION_DECIMALS; d < MAX_POSITION_DECIMALS; d++) {
    const scaled = micrometres * 10 ** d;
    if (Math.abs(scaled - Math.round(scaled)) < 1e-6 * Math.max(1, scaled)) return d;
  }
  return MAX_POSITION_DECIMALS;
}

/**
 * A position or shift on the floorplan at the precision of its grid step (m): always in µm, with the
 * decimals positionDecimals(step) gives, however far from the origin ("12345.678 µm", never "12.35 mm").
 */
export function formatPosition(value: number, step: number): string {
  if (!Number.isFinite(value)) return Number.isNaN(value) ? '—' : value > 0 ? '∞' : '−∞';
  const text = (value * 1e6).toFixed(positionDecimals(step));
  // "-0.000" is zero.
  return `${Number(text) === 0 ? text.replace('-', '') : text} µm`;
}

/** Areas read best in µm² for cells and mats and mm² for dies. */
function formatArea(value: number, digits: number): string {
  const squareMicrometres = value * 1e12;
  // Decide on the rounded figure, so 99 999.9 µm² shows as "0.1 mm²" rather than "100000 µm²".
  if (Math.abs(Number(squareMicrometres.toPrecision(digits))) >= 1e5)
    return `${trimNumber(value * 1e6, digits)} mm²`;
  return `${trimNumber(squareMicrometres, digits)} µm²`;
}

/** The result of reading what someone typed: a value in SI units or a message saying what is wrong. */
export type ParseResult = { ok: true; value: number } | { ok: false; error: string };

const NUMBER_AND_REST = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(.*?)\s*$/;

/**
 * Reads a value typed in engineering notation and returns it in SI units.
 * Accepts a bare number (taken as SI), a prefix alone ("25f"), or prefix and unit ("25 fF", "0.12 um").
 * Temperatures accept "85 °C", "85 C" or "358 K"; a bare temperature number is °C.
 */
export function parseQuantity(text: string, quantity: Quantity): ParseResult {
  const match = NUMBER_AND_REST.exec(text);
  if (!match) return { ok: false, error: `"${text}" is not a number` };
  const magnitude = Number(match[1]);
  const rest = (match[2] ?? '').replace(/\s+/g, '');
  if (!Number.isFinite(magnitude)) return { ok: false, error: `"${text}" is too large` };

  if (quantity === 'temperature') return parseTemperature(magnitude, rest, text);
  if (quantity === 'matchingCoefficient') {
    const unit = rest.replace(/[·*.]/g, '').replace('µ', 'u').replace('μ', 'u');
    if (unit === '' || unit === 'mVum') return { ok: true, value: magnitude * MILLIVOLT_MICROMETRE };
    if (unit === 'Vm') return { ok: true, value: magnitude };
    return { ok: false, error: `"${text}": expected a matching coefficient such as "2.5 mV·µm"` };
  }
  if (quantity === 'activationEnergy') {
    if (rest === '' || rest === 'eV') return { ok: true, value: magnitude * ELECTRONVOLT };
    if (rest === 'J') return { ok: true, value: magnitude };
    return { ok: false, error: `"${text}": expected an energy such as "0.79 eV"` };
  }
  if (quantity === 'defectDensity') {
    const unit = rest.replace('²', '2');
    if (unit === '' || unit === '/cm2') return { ok: true, value: magnitude * PER_SQUARE_CENTIMETRE };
    if (unit === '/m2') return { ok: true, value: magnitude };
    return { ok: false, error: `"${text}": expected a defect density such as "0.5 /cm²"` };
  }
  if (quantity === 'percent') {
    if (rest === '' || rest === '%') return { ok: true, value: magnitude / 100 };
    return { ok: false, error: `"${text}": expected a percentage such as "65 %"` };
  }

  const unit = QUANTITIES[quantity].unit;
  const unitAliases = unitSpellings(unit);
  let prefixText = rest;
  const spelledUnit = unitAliases.find((u) => u !== '' && endsWithUnit(rest, u));
  if (spelledUnit) prefixText = rest.slice(0, rest.length - spelledUnit.length);
  const exponent = PREFIX_EXPONENT.get(prefixText);
  if (quantity === 'sqrtVoltage' && prefixText !== '') {
    return { ok: false, error: `"${text}": give γ in V^½ without a prefix, e.g. "0.45"` };
  }
  if (exponent === undefined) {
    return {
      ok: false,
      error: `"${text}": unknown unit or prefix "${rest}" for ${unit || 'a plain number'}`,
    };
  }
  const power = quantity === 'area' ? exponent * 2 : exponent;
  const value = magnitude * 10 ** power;
  if (!Number.isFinite(value)) return { ok: false, error: `"${text}" is too large` };
  return { ok: true, value };
}

/**
 * Exact spelling first; a different case only where it cannot be a prefix ("1.1v" is volts, but "25f"
 * stays 25 femto and never 25 farad).
 */
function endsWithUnit(rest: string, unit: string): boolean {
  if (rest.endsWith(unit)) return true;
  const lower = unit.toLowerCase();
  return !PREFIX_EXPONENT.has(lower) && rest.toLowerCase().endsWith(lower);
}

function unitSpellings(unit: string): string[] {
  switch (unit) {
    case 'Ω':
      return ['Ω', 'ohm', 'ohms'];
    case 'm²':
      return ['m²', 'm2', 'm^2'];
    case 'V^½':
      return ['V^½', 'V^0.5', 'sqrtV'];
    default:
      return [unit];
  }
}

function parseTemperature(magnitude: number, rest: string, text: string): ParseResult {
  const unit = rest.toUpperCase();
  if (unit === '' || unit === '°C' || unit === 'C' || unit === 'DEGC') {
    return { ok: true, value: magnitude + ZERO_CELSIUS_IN_KELVIN };
  }
  if (unit === 'K') return { ok: true, value: magnitude };
  return { ok: false, error: `"${text}": expected a temperature such as "85 °C" or "358 K"` };
}

/** Converts kelvin to degrees Celsius, for the few places that must show a bare number. */
export function kelvinToCelsius(kelvin: number): number {
  return kelvin - ZERO_CELSIUS_IN_KELVIN;
}

/** Converts degrees Celsius to kelvin. */
export function celsiusToKelvin(celsius: number): number {
  return celsius + ZERO_CELSIUS_IN_KELVIN;
}

const BINARY_PREFIXES = ['', 'Ki', 'Mi', 'Gi', 'Ti'] as const;

/**
 * A memory capacity in bits with a binary prefix, the way array sizes are spoken of:
 * 524 288 → "512 Kib", 1 572 864 → "1.5 Mib", 1000 → "1,000 b" (below 1 Kib the plain count).
 */
export function formatBits(bits: number, digits = DEFAULT_DIGITS): string {
  if (!Number.isFinite(bits)) return '—';
  if (Math.abs(bits) < 1024) return `${formatWholeNumber(bits)} b`;
  let power = 0;
  let value = bits;
  while (Math.abs(value) >= 1024 && power < BINARY_PREFIXES.length - 1) {
    value /= 1024;
    power++;
  }
  return `${trimNumber(value, digits)} ${BINARY_PREFIXES[power]}b`;
}
