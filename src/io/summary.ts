import type { Finding, MatFigures, MatReport, Report } from '../engine/report';
import { allMats, senseAmpStripIdsOf, wordlineDriverIdsOf, type MatTable } from '../engine/matTable';
import type { BitlineArchitecture, CellKind } from '../model/cell';
import type { Design } from '../model/design';

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

/** The read of a 1T1C cell (charge sharing) or of a gain cell (read current into a precharged line). */
export type ReadSummary =
  | {
      readonly kind: 'chargeSharing';
      readonly chargeTransferRatio_ratio: Figure;
      readonly signalHigh_V: Figure;
      readonly signalLow_V: Figure;
      readonly signalHighAfterRefresh_V: Figure;
    }
  | {
      readonly kind: 'gainRead';
      readonly readCurrent_A: Figure;
      readonly dropHigh_V: Figure;
      readonly dropLow_V: Figure;
      readonly dropHighAfterRefresh_V: Figure;
    };

export interface MatSummary {
  readonly id: string;
  readonly name: string;
  readonly cellId: string;
  readonly cellKind: CellKind;
  readonly architecture: BitlineArchitecture;
  readonly cellsPerBitline: number;
  readonly cellsPerWordline: number;
  readonly bitlines: number;
  readonly wordlines: number;
  readonly bits: number;
  readonly usableBits: number;
  readonly lostBits: number;
  readonly area_m2: Figure;
  readonly cellArea_m2: Figure;
  readonly cellFootprint_m2: Figure;
  readonly bitlineLength_m: Figure;
  readonly wordlineLength_m: Figure;
  readonly storageCapacitance_F: Figure;
  readonly bitlineCapacitance_F: Figure;
  readonly bitlineJunctionCapacitance_F: Figure;
  readonly bitlineToWordlineCapacitance_F: Figure;
  readonly bitlineToBitlineCapacitance_F: Figure;
  readonly bitlineWireCapacitance_F: Figure;
  readonly senseAmpInputCapacitance_F: Figure;
  readonly read: ReadSummary;
  readonly senseSignal_V: Figure;
  readonly senseSignalAfterRefresh_V: Figure;
  readonly senseAmps: number;
  readonly offsetSigma_V: Figure;
  readonly offsetBudget_V: Figure;
  readonly noiseAllowance_V: Figure;
  readonly requiredSignal_V: Figure;
  readonly senseMargin_V: Figure;
  readonly senseMarginAtRefresh_V: Figure;
  readonly leakage_A: Figure;
  readonly allowedDroop_V: Figure;
  readonly retentionTime_s: Figure;
  readonly wordlineResistance_ohm: Figure;
  readonly wordlineCapacitance_F: Figure;
  readonly wordlineDelay_s: Figure;
  readonly bitlineResistance_ohm: Figure;
  readonly bitlineDelay_s: Figure;
  readonly activationEnergy_J: Figure;
  readonly activationEnergyBitlines_J: Figure;
  readonly activationEnergyWordline_J: Figure;
  readonly activationEnergySenseAmps_J: Figure;
  readonly activationEnergyPerBit_J: Figure;
  readonly senseAmpPitchBudget_m: Figure;
  readonly senseAmpFits: boolean;
  readonly senseAmpStripIds: readonly string[];
  readonly wordlineDriverIds: readonly string[];
  readonly unsensedBitlines: number;
  readonly undrivenWordlines: number;
}

export interface TotalsSummary {
  readonly mats: number;
  readonly bits: number;
  readonly usableBits: number;
  readonly lostBits: number;
  readonly area_m2: Figure;
  readonly placedArea_m2: Figure;
  /** placedArea split by block type (m²). */
  readonly areaByType_m2: Readonly<Record<string, Figure>>;
  readonly cellArea_m2: Figure;
  readonly arrayEfficiency_ratio: Figure;
  readonly areaPerBit_m2: Figure;
  readonly areaPerBitInF2_ratio: Figure;
  readonly senseAmps: number;
  readonly offsetSigmaMultiplier_ratio: Figure;
  readonly worstSenseSignal_V: Figure;
  readonly worstSenseSignalMatId: string | null;
  readonly worstSenseMargin_V: Figure;
  readonly worstSenseMarginMatId: string | null;
  readonly shortestRetention_s: Figure;
  readonly worstWordlineDelay_s: Figure;
  readonly refreshRows: number;
  readonly refreshInterval_s: Figure;
  readonly refreshRowsPerCommand: number;
  readonly refreshCycleTime_s: Figure;
  readonly refreshBusyFraction_ratio: Figure;
  readonly refreshPower_W: Figure;
  readonly storedHighLevel_V: Figure;
  readonly storedHighThreshold_V: Figure;
  readonly storedHighLimitedByWordline: boolean;
  readonly wordlineHighNeeded_V: Figure;
  readonly errors: number;
  readonly warnings: number;
}

export interface FindingSummary {
  readonly kind: Finding['kind'];
  readonly severity: Finding['severity'];
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

function readSummary(read: MatFigures['read']): ReadSummary {
  return read.kind === 'chargeSharing'
    ? {
        kind: 'chargeSharing',
        chargeTransferRatio_ratio: fig(read.chargeTransferRatio),
        signalHigh_V: fig(read.signalHigh),
        signalLow_V: fig(read.signalLow),
        signalHighAfterRefresh_V: fig(read.signalHighAfterRefresh),
      }
    : {
        kind: 'gainRead',
        readCurrent_A: fig(read.readCurrent),
        dropHigh_V: fig(read.dropHigh),
        dropLow_V: fig(read.dropLow),
        dropHighAfterRefresh_V: fig(read.dropHighAfterRefresh),
      };
}

function matSummary(m: MatReport, mats: MatTable, k: number): MatSummary {
  const f = m.figures;
  const cbl = f.bitlineCapacitance;
  const e = f.activationEnergy;
  return {
    id: m.matId,
    name: m.name,
    cellId: f.cellId,
    cellKind: f.cellKind,
    architecture: f.architecture,
    cellsPerBitline: f.cellsPerBitline,
    cellsPerWordline: f.cellsPerWordline,
    bitlines: f.bitlineCount,
    wordlines: f.wordlineCount,
    bits: f.bits,
    usableBits: f.usableBits,
    lostBits: f.lostBits,
    area_m2: fig(f.area),
    cellArea_m2: fig(f.cellArea),
    cellFootprint_m2: fig(f.cellFootprint),
    bitlineLength_m: fig(f.bitlineLength),
    wordlineLength_m: fig(f.wordlineLength),
    storageCapacitance_F: fig(f.storageCapacitance),
    bitlineCapacitance_F: fig(cbl.total),
    bitlineJunctionCapacitance_F: fig(cbl.junction),
    bitlineToWordlineCapacitance_F: fig(cbl.wordlineCoupling),
    bitlineToBitlineCapacitance_F: fig(cbl.bitlineCoupling),
    bitlineWireCapacitance_F: fig(cbl.wire),
    senseAmpInputCapacitance_F: fig(cbl.senseAmp),
    read: readSummary(f.read),
    senseSignal_V: fig(f.senseSignal),
    senseSignalAfterRefresh_V: fig(f.senseSignalAfterRefresh),
    senseAmps: f.senseAmpCount,
    offsetSigma_V: fig(f.offsetSigma),
    offsetBudget_V: fig(f.offsetBudget),
    noiseAllowance_V: fig(f.noiseAllowance),
    requiredSignal_V: fig(f.requiredSignal),
    senseMargin_V: fig(f.senseMargin),
    senseMarginAtRefresh_V: fig(f.senseMarginAtRefresh),
    leakage_A: fig(f.leakage),
    allowedDroop_V: fig(f.allowedDroop),
    retentionTime_s: fig(f.retentionTime),
    wordlineResistance_ohm: fig(f.wordlineResistance),
    wordlineCapacitance_F: fig(f.wordlineCapacitance),
    wordlineDelay_s: fig(f.wordlineDelay),
    bitlineResistance_ohm: fig(f.bitlineResistance),
    bitlineDelay_s: fig(f.bitlineDelay),
    activationEnergy_J: fig(e.total),
    activationEnergyBitlines_J: fig(e.bitlines),
    activationEnergyWordline_J: fig(e.wordline),
    activationEnergySenseAmps_J: fig(e.senseAmps),
    activationEnergyPerBit_J: fig(e.perBit),
    senseAmpPitchBudget_m: fig(f.senseAmpPitchBudget),
    senseAmpFits: f.senseAmpFits,
    senseAmpStripIds: senseAmpStripIdsOf(mats, k),
    wordlineDriverIds: wordlineDriverIdsOf(mats, k),
    unsensedBitlines: m.unsensedBitlines,
    undrivenWordlines: m.undrivenWordlines,
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
  const t = report.totals;
  const r = t.refresh;
  const s = report.storedHigh;
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
    totals: {
      mats: t.matCount,
      bits: t.bits,
      usableBits: t.usableBits,
      lostBits: t.lostBits,
      area_m2: fig(t.totalArea),
      placedArea_m2: fig(t.placedArea),
      areaByType_m2: Object.fromEntries(Object.entries(t.areaByType).map(([type, a]) => [type, fig(a)])),
      cellArea_m2: fig(t.cellArea),
      arrayEfficiency_ratio: fig(t.arrayEfficiency),
      areaPerBit_m2: fig(t.areaPerBit),
      areaPerBitInF2_ratio: fig(t.areaPerBitInF2),
      senseAmps: t.senseAmpCount,
      offsetSigmaMultiplier_ratio: fig(t.offsetSigmaMultiplier),
      worstSenseSignal_V: fig(t.worstSenseSignal),
      worstSenseSignalMatId: t.worstSenseSignalMatId,
      worstSenseMargin_V: fig(t.worstSenseMargin),
      worstSenseMarginMatId: t.worstSenseMarginMatId,
      shortestRetention_s: fig(t.shortestRetention),
      worstWordlineDelay_s: fig(t.worstWordlineDelay),
      refreshRows: r.rows,
      refreshInterval_s: fig(r.interval),
      refreshRowsPerCommand: r.rowsPerCommand,
      refreshCycleTime_s: fig(r.cycleTime),
      refreshBusyFraction_ratio: fig(r.busyFraction),
      refreshPower_W: fig(r.power),
      storedHighLevel_V: fig(s.level),
      storedHighThreshold_V: fig(s.threshold),
      storedHighLimitedByWordline: s.limitedByWordline,
      wordlineHighNeeded_V: fig(s.wordlineHighNeeded),
      ...countFindings(report.findings),
    },
    mats: allMats(report.mats).map((m, k) => matSummary(m, report.mats, k)),
    findings: report.findings.map((f) => ({
      kind: f.kind,
      severity: f.severity,
      blockIds: [...f.blockIds],
      message: f.message,
    })),
    caution: REPORT_CAUTION,
  };
}
