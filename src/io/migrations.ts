/**
 * Migrations of older design files, keyed by the version they upgrade from. Each takes the parsed JSON
 * of that version and returns the next version's shape; the schema validates the result afterwards, so
 * a migration only renames and fills in, and leaves checking to the one restore path.
 */

type Json = Record<string, unknown>;

function isRecord(value: unknown): value is Json {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** A copy of `record` with `from` renamed to `to` (kept when `to` is already there). */
function renamed(record: Json, from: string, to: string): Json {
  const { [from]: value, ...rest } = record;
  if (value !== undefined && !(to in rest)) rest[to] = value;
  return rest;
}

/** Sets `key` only when the file does not have it. */
function fill(record: Json, key: string, value: unknown): void {
  if (!(key in record)) record[key] = value;
}

/**
 * Version 1 → 2: parasitics are counted by crossing, not by cell (the per-cell values are kept as
 * per-crossing values: for open arrays the totals are unchanged, for folded arrays the passing crossings
 * now add their share); a word line's passing crossings get half its active-gate load; the timing chain,
 * the weak-cell tail and the die-scale inputs get neutral starting values; a file's own row cycle time
 * becomes an override of the computed one, since its author chose it.
 */
function fromVersion1(old: Json): Json {
  const next: Json = { ...old, version: 2 };
  if (isRecord(old.process)) {
    let p: Json = old.process;
    p = renamed(p, 'bitlineToWordlineCapacitancePerCell', 'bitlineToWordlineCapacitancePerCrossing');
    p = renamed(p, 'bitlineToBitlineCapacitancePerCell', 'bitlineToBitlineCapacitancePerCrossing');
    p = renamed(p, 'wordlineGateCapacitancePerCell', 'wordlineGateCapacitancePerActiveCrossing');
    p = renamed(p, 'rowCycleTime', 'rowCycleTimeOverride');
    const gate = p.wordlineGateCapacitancePerActiveCrossing;
    fill(p, 'wordlinePassingCapacitancePerCrossing', typeof gate === 'number' ? gate / 2 : 0);
    fill(p, 'senseAmpLatchResistance', 10e3);
    fill(p, 'equaliserResistance', 3e3);
    fill(p, 'tailCellFraction', 0);
    fill(p, 'tailLeakageMultiplier', 1);
    fill(p, 'tailLeakageSpread', 0);
    fill(p, 'tailActivationEnergy', p.leakageActivationEnergy ?? 0);
    next.process = p;
  }
  if (isRecord(old.operating)) {
    const o: Json = { ...old.operating };
    fill(o, 'floorplanCopiesPerDie', 1);
    fill(o, 'senseFireTime', 3e-9);
    fill(o, 'restoreFraction', 0.95);
    fill(o, 'equaliseResidual', 5e-3);
    next.operating = o;
  }
  const migrateDesign = (d: unknown): unknown => (isRecord(d) ? fromVersion1Variant(d) : d);
  if (Array.isArray(old.variants)) next.variants = old.variants.map(migrateDesign);
  return next;
}

/** A variant on the shelf is a whole design of the same version (or null for the active one). */
function fromVersion1Variant(variant: Json): Json {
  if (isRecord(variant.design)) return { ...variant, design: fromVersion1(variant.design) };
  return fromVersion1(variant);
}

export const MIGRATIONS: Readonly<Record<number, (old: Json) => Json>> = { 1: fromVersion1 };
