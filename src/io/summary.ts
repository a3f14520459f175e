import {
  allMats,
  matAt,
  MAT_FIGURE_CATALOGUE,
  senseAmpStripIdsOf,
  TOTAL_FIGURE_CATALOGUE,
  wordlineDriverIdsOf,
  type Finding,
  type MatFigures,
  type MatReport,
  type MatTable,
  type Report,
} from '../engine';
import type { BitlineArchitecture, CellKind } from '../model/cell';
import type { Design } from '../model/design';
import { formatMatSize } from '../model/matSize';

/**
 * The report as a plain JSON object for export files and `npm run evaluate -- --json`. Every number
 * keeps its SI value and names its unit at the end of its key (see {@link REPORT_UNITS}), so a script
 * reading the file never guesses; counts (bits, cells, lines, mats) are named for what they count.
 * The same report as text for people is reportTable() in reportTable.ts. Formatting lives in io,
 * never in the engine.
 */

/** Name every Matloom report export carries, so that a reader can tell it from a design file. */
export const REPORT_FORMAT = 'matloom-report';
/** Version of the report export; bump it when a key changes meaning or disappears. */
export const REPORT_VERSION = 1;

/** Said with every figure Matloom exports: the model is first-order. */
export const REPORT_CAUTION =
  'Figures are first-order estimates from a lumped model. Confirm them with extracted parasitics, ' +
  'foundry design rules and measured silicon before relying on them.';

/** What each key suffix means. */
export const REPORT_UNITS = {
  _m: 'metre (m)',
  _m2: 'square metre (m²)',
  _F: 'farad (F)',
  _V: 'volt (V)',
  _A: 'ampere (A)',
  _ohm: 'ohm (Ω)',
  _s: 'second (s)',
  _J: 'joule (J)',
  _W: 'watt (W)',
  _K: 'kelvin (K)',
  _ratio: 'dimensionless ratio (1 = 100 %)',
  InF2_ratio: 'area divided by the square of the feature size F (dimensionless)',
  counts: 'keys without a unit suffix (bits, cellsPerBitline, bitlines, mats, …) are plain counts',
  null: 'a figure that does not exist or is unbounded (no mats; no leakage gives unlimited retention)',
} as const;

/** A physics figure in SI units; null where the engine gives NaN or ±Infinity, which JSON cannot carry. */
export type Figure = number | null;

/** The read of a 1T1C cell (charge sharing) or of a gain cell: its kind and its read figures' export keys. */
export interface ReadSummary {
  readonly kind: MatFigures['read']['kind'];
  readonly [exportKey: string]: Figure | string;
}

/**
 * One mat: who it is, every per-mat figure of the catalogue under its export key (engine/figures), the read
 * figures under `read`, and how it is served.
 */
export interface MatSummary {
  readonly id: string;
  readonly name: string;
  readonly cellId: string;
  readonly cellKind: CellKind;
  readonly architecture: BitlineArchitecture;
  readonly read: ReadSummary;
  readonly senseAmpFits: boolean;
  readonly senseAmpStripIds: readonly string[];
  readonly wordlineDriverIds: readonly string[];
  readonly unsensedBitlines: number;
  readonly undrivenWordlines: number;
  readonly [exportKey: string]: Figure | string | boolean | readonly string[] | ReadSummary;
}

/** The whole design: every whole-design figure of the catalogue under its export key, and the rest. */
export interface TotalsSummary {
  /** placedArea split by block type (m²). */
  readonly areaByType_m2: Readonly<Record<string, Figure>>;
  /** The worst mats by name (as every message names them), with their ids beside. */
  readonly worstSenseSignalMat: string | null;
  readonly worstSenseSignalMatId: string | null;
  readonly worstSenseMarginMat: string | null;
  readonly worstSenseMarginMatId: string | null;
  readonly worstWordlineDelayMat: string | null;
  readonly worstWordlineDelayMatId: string | null;
  readonly worstRowToColumnDelayMat: string | null;
  readonly worstRowToColumnDelayMatId: string | null;
  readonly worstRowCycleTimeMat: string | null;
  readonly worstRowCycleTimeMatId: string | null;
  readonly shortestWeakestRetentionMat: string | null;
  readonly shortestWeakestRetentionMatId: string | null;
  readonly storedHighLimitedByWordline: boolean;
  readonly errors: number;
  readonly warnings: number;
  readonly [exportKey: string]: Figure | string | boolean | Readonly<Record<string, Figure>>;
}

export interface FindingSummary {
  readonly kind: Finding['kind'];
  readonly severity: Finding['severity'];
  /** The blocks by name, as the message names them; `blockIds` holds their ids in the same order. */
  readonly blocks: readonly string[];
  readonly blockIds: readonly string[];
  readonly message: string;
}

export interface ReportSummary {
  readonly format: typeof REPORT_FORMAT;
  readonly version: typeof REPORT_VERSION;
  readonly design: {
    readonly name: string;
    readonly process: { readonly id: string; readonly name: string; readonly featureSize_m: number };
    readonly operating: {
      readonly temperature_K: number;
      readonly refreshWindow_s: number;
      readonly refreshCommandsPerWindow: number;
      readonly refreshRowsInParallel: number;
      readonly minimumSenseMargin_V: number;
      readonly allowedSenseFailures: number;
    };
  };
  readonly units: typeof REPORT_UNITS;
  readonly totals: TotalsSummary;
  readonly mats: readonly MatSummary[];
  readonly findings: readonly FindingSummary[];
  readonly caution: string;
}

/** JSON has no NaN or Infinity; write null on purpose rather than let JSON.stringify do it silently. */
function fig(value: number): Figure {
  return Number.isFinite(value) ? value : null;
}

/** Every exported per-mat figure in catalogue order; the read figures of the mat's read style go under `read`. */
function matSummary(m: MatReport, mats: MatTable, k: number): MatSummary {
  const f = m.figures;
  const out: Record<string, Figure | string | boolean | readonly string[] | ReadSummary> = {
    name: m.name || m.matId,
    id: m.matId,
    size: formatMatSize(f.cellsPerBitline, f.cellsPerWordline),
    cellId: f.cellId,
    cellKind: f.cellKind,
    architecture: f.architecture,
  };
  const read: Record<string, Figure | string> = { kind: f.read.kind };
  for (const entry of MAT_FIGURE_CATALOGUE) {
    if (entry.exportKey === null) continue;
    if (entry.read === undefined) out[entry.exportKey] = fig(entry.value(f));
    else {
      out.read ??= read as ReadSummary;
      if (entry.read === f.read.kind) read[entry.exportKey] = fig(entry.value(f));
    }
  }
  out.read = read as ReadSummary;
  out.senseAmpFits = f.senseAmpFits;
  out.senseAmpStripIds = senseAmpStripIdsOf(mats, k);
  out.wordlineDriverIds = wordlineDriverIdsOf(mats, k);
  out.unsensedBitlines = m.unsensedBitlines;
  out.undrivenWordlines = m.undrivenWordlines;
  return out as MatSummary;
}

/** Every exported whole-design figure in catalogue order, then what is not a number. */
function totalsSummary(design: Design, report: Report): TotalsSummary {
  const t = report.totals;
  const figures: Record<string, Figure> = {};
  for (const entry of TOTAL_FIGURE_CATALOGUE)
    if (entry.exportKey !== null) figures[entry.exportKey] = fig(entry.value(report, design));
  return {
    ...figures,
    areaByType_m2: Object.fromEntries(Object.entries(t.areaByType).map(([type, a]) => [type, fig(a)])),
    worstSenseSignalMat: t.worstSenseSignalMatName,
    worstSenseSignalMatId: t.worstSenseSignalMatId,
    worstSenseMarginMat: t.worstSenseMarginMatName,
    worstSenseMarginMatId: t.worstSenseMarginMatId,
    worstWordlineDelayMat: t.worstWordlineDelayMatName,
    worstWordlineDelayMatId: t.worstWordlineDelayMatId,
    worstRowToColumnDelayMat: t.worstRowToColumnDelayMatName,
    worstRowToColumnDelayMatId: t.worstRowToColumnDelayMatId,
    worstRowCycleTimeMat: t.worstRowCycleTimeMatName,
    worstRowCycleTimeMatId: t.worstRowCycleTimeMatId,
    shortestWeakestRetentionMat: t.shortestWeakestRetentionMatName,
    shortestWeakestRetentionMatId: t.shortestWeakestRetentionMatId,
    storedHighLimitedByWordline: report.storedHigh.limitedByWordline,
    ...countFindings(report.findings),
  };
}

/** Errors and warnings among the findings. */
export function countFindings(findings: readonly Finding[]): { errors: number; warnings: number } {
  let errors = 0;
  for (const f of findings) if (f.severity === 'error') errors++;
  return { errors, warnings: findings.length - errors };
}

/**
 * The report of `design` as one JSON-able object (only strings, finite numbers, booleans, null, arrays
 * and plain objects), SI values with the unit in each key.
 */
export function reportSummary(design: Design, report: Report): ReportSummary {
  return {
    ...summaryHead(design, report),
    mats: allMats(report.mats).map((m, k) => matSummary(m, report.mats, k)),
    ...summaryTail(design, report),
  };
}

/** The summary's fields before its mats, in their order. */
export function summaryHead(
  design: Design,
  report: Report,
): Pick<ReportSummary, 'format' | 'version' | 'design' | 'units' | 'totals'> {
  const o = design.operating;
  return {
    format: REPORT_FORMAT,
    version: REPORT_VERSION,
    design: {
      name: design.name,
      process: {
        id: design.process.id,
        name: design.process.name,
        featureSize_m: design.process.featureSize,
      },
      operating: {
        temperature_K: o.temperature,
        refreshWindow_s: o.refreshWindow,
        refreshCommandsPerWindow: o.refreshCommandsPerWindow,
        refreshRowsInParallel: o.refreshRowsInParallel,
        minimumSenseMargin_V: o.minimumSenseMargin,
        allowedSenseFailures: o.allowedSenseFailures,
      },
    },
    units: REPORT_UNITS,
    totals: totalsSummary(design, report),
  };
}

/** The per-mat part of the summary for mats `start` to `end` (exclusive), made only when asked for. */
export function matSummaries(report: Report, start: number, end: number): MatSummary[] {
  const out: MatSummary[] = [];
  for (let k = start; k < Math.min(end, report.mats.count); k++)
    out.push(matSummary(matAt(report.mats, k), report.mats, k));
  return out;
}

/** The summary's fields after its mats. */
export function summaryTail(design: Design, report: Report): Pick<ReportSummary, 'findings' | 'caution'> {
  const nameOf = new Map(design.blocks.map((b) => [b.id, b.name]));
  return {
    findings: report.findings.map((f) => ({
      kind: f.kind,
      severity: f.severity,
      blocks: f.blockIds.map((id) => nameOf.get(id) || id),
      blockIds: [...f.blockIds],
      message: f.message,
    })),
    caution: REPORT_CAUTION,
  };
}
