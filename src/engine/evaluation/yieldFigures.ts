import type { Design } from '../../model/design';
import { DEFAULT_REPAIR } from '../../model/builtins';
import type { RepairSettings } from '../../model/repair';
import { clusteredExpectation } from '../physics/defectClustering';
import {
  defectFaults,
  parametricFaults,
  senseAmpFailureProbability,
  weakCellFraction,
  type RetentionTail,
  type FaultCounts,
} from '../physics/faultRates';
import { crossedRepairLowerBound, type LineDomainClass } from '../physics/crossedRepair';
import { spareSetArea } from '../physics/redundancyArea';
import type { RepairMonteCarloRequest } from '../physics/repairMonteCarlo';
import { goodDiesPerWafer, grossDiesPerWafer, negativeBinomialYield } from '../physics/yield';
import { retentionTailAt } from './designContext';
import { figuresAt } from './matTable';
import { reportRepairPlan, type MatShare, type RepairDomainClass, type RepairPlan } from './repairDomains';
import type { MatFigures, Report } from './report';

/** The yield figures of a design on its die (SI; counts per die unless named otherwise). */
export interface YieldFigures {
  readonly settings: RepairSettings;
  /** Copies of the floorplan on the die (the operating conditions' one value). */
  readonly floorplanCopiesPerDie: number;
  /** Row-repair domains (mats, mat rows or floorplans) in one floorplan copy, and on the die. */
  readonly rowDomainsPerFloorplan: number;
  readonly rowDomainsPerDie: number;
  /** Column-repair domains (sense-amplifier strip segments) in one floorplan copy, and on the die. */
  readonly columnDomainsPerFloorplan: number;
  readonly columnDomainsPerDie: number;
  /** Expected faults per die from defects and from the parametric sources, and their sum. */
  readonly defectFaults: FaultCounts;
  readonly parametricFaults: FaultCounts;
  readonly faults: FaultCounts;
  /** Largest sense-amplifier failure probability of any mat, 2·Q(ΔV/σ). */
  readonly senseAmpFailure: number;
  /** Largest weak-cell share of any mat (retention shorter than the refresh window). */
  readonly weakCellFraction: number;
  /** Die area outside the floorplan copies (m²) and the killing defects expected there. */
  readonly peripheryArea: number;
  readonly fatalDefects: number;
  /**
   * Probability that every repair domain on the die is repaired (clustered defects). Exact when there are
   * no single-cell faults; otherwise a lower bound (see {@link repairProbabilityIsExact}).
   */
  readonly repairProbability: number;
  /** True when the closed form is exact (no single-cell faults expected), false when it is a lower bound. */
  readonly repairProbabilityIsExact: boolean;
  /** The same with no spares: the yield redundancy starts from (exact). */
  readonly repairProbabilityWithoutSpares: number;
  /** Repair probability times the periphery's survival, mixed over the clustered defect density. */
  readonly dieYield: number;
  /** Redundancy area of one floorplan copy: spare rows, spare columns, fuses and comparators (m²). */
  readonly redundancyArea: number;
  readonly spareRowArea: number;
  readonly spareColumnArea: number;
  readonly fuseAndCompareArea: number;
  /** Die area with the redundancy of every copy added (m²). */
  readonly dieAreaWithRedundancy: number;
  /** (floorplan area + its redundancy) / usable bits (m²). */
  readonly areaPerBitWithRedundancy: number;
  readonly grossDiesPerWafer: number;
  readonly goodDiesPerWafer: number;
  /** Monte-Carlo request for the same die and the same domains (for the worker); null without a layout. */
  readonly monteCarlo: RepairMonteCarloRequest | null;
  /** Why a figure cannot be trusted (die too small for its floorplans…); empty when none. */
  readonly problems: readonly string[];
}

/**
 * Retention as the weak-cell count reads it: a sensed, refreshed mat with no margin to lose has no
 * retention time (NaN in its figures), and for yield every one of its cells is weak, as with 0 s.
 */
function retentionForYield(f: MatFigures): number {
  return f.usableBits > 0 && f.needsRefresh && !(f.allowedDroop > 0) ? 0 : f.retentionTime;
}

/** The repair settings of a design: its own, or the built-in defaults. */
export function repairSettingsOf(design: Design): RepairSettings {
  return design.operating.repair ?? DEFAULT_REPAIR;
}

/** One mat's lines, area and expected faults of each source. */
export function matDomainShare(
  f: MatFigures,
  settings: RepairSettings,
  refreshWindow: number,
  tail?: RetentionTail,
): MatShare {
  const kill = {
    singleCell: settings.killRatioCell,
    wordLine: settings.killRatioWordline,
    bitLine: settings.killRatioBitline,
  };
  const saFailure = senseAmpFailureProbability(f.senseSignal, f.offsetSigma);
  const weak = weakCellFraction(retentionForYield(f), refreshWindow, tail);
  return {
    rows: f.wordlineCount,
    columns: f.architecture === 'folded' ? f.bitlineCount / 2 : f.bitlineCount,
    area: f.area,
    defects: defectFaults(f.area, settings.defectDensity, kill),
    parametric: parametricFaults(f.senseAmpCount, saFailure, f.usableBits, weak),
  };
}

const add = (a: FaultCounts, b: FaultCounts): FaultCounts => ({
  cells: a.cells + b.cells,
  rows: a.rows + b.rows,
  columns: a.columns + b.columns,
});

/**
 * The yield figures: expected faults from the three sources per mat, spare rows per row domain and spare
 * columns per sense-amplifier strip segment, the die's repair probability (exact for line faults, a lower
 * bound with single-cell faults), times the periphery's survival, averaged over the gamma-distributed
 * defect density (negative-binomial clustering); then redundancy area, gross and good dies per wafer.
 */
export function computeYieldFigures(report: Report, design: Design): YieldFigures {
  const settings = repairSettingsOf(design);
  const retentionTail = retentionTailAt(design.process, design.operating);
  const mats = report.mats;
  const shares = new Map<number, MatShare>();
  const plan = reportRepairPlan(mats, settings, (k) => {
    const index = mats.figureIndex[k] ?? -1;
    let share = shares.get(index);
    if (!share) {
      share = matDomainShare(figuresAt(mats, k), settings, design.operating.refreshWindow, retentionTail);
      shares.set(index, share);
    }
    return share;
  });
  return yieldOfDomains({
    plan,
    mats: mats.figures,
    settings,
    floorplanCopiesPerDie: design.operating.floorplanCopiesPerDie,
    retentionTail,
    refreshWindow: design.operating.refreshWindow,
    floorplanArea: report.totals.totalArea,
    usableBits: report.totals.usableBits,
  });
}

/** What the yield figures need of a floorplan, from a report or from the explorer's closed form. */
export interface YieldInputs {
  readonly plan: RepairPlan;
  /** The kinds of mat (for the worst sense-amp failure and weak-cell share). */
  readonly mats: readonly MatFigures[];
  readonly settings: RepairSettings;
  /** Copies of the floorplan on the die. */
  readonly floorplanCopiesPerDie: number;
  /** The weak-cell tail at the operating temperature (two-population retention). */
  readonly retentionTail: RetentionTail;
  readonly refreshWindow: number;
  readonly floorplanArea: number;
  readonly usableBits: number;
}

const countOf = (classes: readonly RepairDomainClass[]) => classes.reduce((n, c) => n + c.count, 0);

/** The classes at a defect density x times the mean: line and cell faults as the closed form reads them. */
function atDensity(classes: readonly RepairDomainClass[], copies: number, x: number): LineDomainClass[] {
  return classes.map(({ count, domain, tiles }) => ({
    count: count * copies,
    lines: domain.lines,
    lineFaults: domain.defectLines * x + domain.parametricLines,
    cellFaults: domain.defectCells * x + domain.parametricCells,
    ...(tiles
      ? {
          tiles: tiles.map((t) => ({
            count: t.count,
            cellFaults: t.defectCells * x + t.parametricCells,
            columnFaults: t.defectColumns * x + t.parametricColumns,
            columnSpares: t.columnSpares,
          })),
        }
      : {}),
  }));
}

/** The yield figures of one floorplan's repair domains on its die. */
export function yieldOfDomains(inputs: YieldInputs): YieldFigures {
  const { settings, plan } = inputs;
  const problems: string[] = [];
  const copies = inputs.floorplanCopiesPerDie;
  const { rowClasses, columnClasses } = plan;

  let defectTotal: FaultCounts = { cells: 0, rows: 0, columns: 0 };
  let parametricTotal: FaultCounts = { cells: 0, rows: 0, columns: 0 };
  let spareRowArea = 0;
  let spareColumnArea = 0;
  let fuseAndCompareArea = 0;
  for (const { count, domain, spareArea } of rowClasses) {
    const n = count * copies;
    defectTotal = add(defectTotal, {
      cells: domain.defectCells * n,
      rows: domain.defectLines * n,
      columns: 0,
    });
    parametricTotal = add(parametricTotal, {
      cells: domain.parametricCells * n,
      rows: domain.parametricLines * n,
      columns: 0,
    });
    const cost = spareSetArea(
      settings.spareRows,
      domain.lines,
      spareArea,
      settings.fuseArea,
      settings.compareBitArea,
    );
    spareRowArea += cost.lines * count;
    fuseAndCompareArea += cost.fuseAndCompare * count;
  }
  for (const { count, domain, spareArea } of columnClasses) {
    const n = count * copies;
    defectTotal = add(defectTotal, { cells: 0, rows: 0, columns: domain.defectLines * n });
    parametricTotal = add(parametricTotal, { cells: 0, rows: 0, columns: domain.parametricLines * n });
    const cost = spareSetArea(
      settings.spareColumns,
      domain.lines,
      spareArea,
      settings.fuseArea,
      settings.compareBitArea,
    );
    spareColumnArea += cost.lines * count;
    fuseAndCompareArea += cost.fuseAndCompare * count;
  }
  let senseAmpFailure = 0;
  let weakCells = 0;
  for (const f of inputs.mats) {
    senseAmpFailure = Math.max(senseAmpFailure, senseAmpFailureProbability(f.senseSignal, f.offsetSigma));
    weakCells = Math.max(
      weakCells,
      weakCellFraction(retentionForYield(f), inputs.refreshWindow, inputs.retentionTail),
    );
  }
  const redundancy = spareRowArea + spareColumnArea + fuseAndCompareArea;
  const floorplanArea = inputs.floorplanArea;
  const peripheryArea = settings.dieArea - copies * floorplanArea;
  if (peripheryArea < 0) {
    problems.push(
      `the die (${(settings.dieArea * 1e6).toPrecision(3)} mm²) is smaller than its ${copies} floorplan copies ` +
        `(${(copies * floorplanArea * 1e6).toPrecision(3)} mm²)`,
    );
  }
  const fatalDefects = Math.max(0, peripheryArea) * settings.defectDensity * settings.killRatioPeriphery;

  const arrays = (x: number, spareRows: number, spareColumns: number): number =>
    crossedRepairLowerBound(
      atDensity(rowClasses, copies, x),
      atDensity(columnClasses, copies, x),
      spareRows,
      spareColumns,
    );
  const alpha = settings.defectClustering;
  const clamp = (p: number) => Math.min(1, Math.max(0, p));
  // The repair probability and the die yield integrate over the same density points: compute each once.
  const withSpares = new Map<number, number>();
  const arraysWithSpares = (x: number): number => {
    let p = withSpares.get(x);
    if (p === undefined) {
      p = arrays(x, settings.spareRows, settings.spareColumns);
      withSpares.set(x, p);
    }
    return p;
  };
  const repairProbability = clusteredExpectation(arraysWithSpares, alpha);
  // With no spares every fault kills: E_x[e^(−(a·x + b))] = (1 + a/α)^(−α)·e^(−b) (negative binomial).
  const defectsPerDie = defectTotal.cells + defectTotal.rows + defectTotal.columns;
  const parametricPerDie = parametricTotal.cells + parametricTotal.rows + parametricTotal.columns;
  const repairProbabilityWithoutSpares =
    negativeBinomialYield(defectsPerDie, 1, alpha) * Math.exp(-parametricPerDie);
  const dieYield = clusteredExpectation((x) => arraysWithSpares(x) * Math.exp(-fatalDefects * x), alpha);
  const dieAreaWithRedundancy = settings.dieArea + copies * redundancy;
  const gross = grossDiesPerWafer(settings.waferDiameter, dieAreaWithRedundancy);
  const usableBits = inputs.usableBits;
  const faults = add(defectTotal, parametricTotal);
  const rowDomains = countOf(rowClasses);
  const columnDomains = countOf(columnClasses);

  return {
    settings,
    floorplanCopiesPerDie: copies,
    rowDomainsPerFloorplan: rowDomains,
    rowDomainsPerDie: rowDomains * copies,
    columnDomainsPerFloorplan: columnDomains,
    columnDomainsPerDie: columnDomains * copies,
    defectFaults: defectTotal,
    parametricFaults: parametricTotal,
    faults,
    senseAmpFailure,
    weakCellFraction: weakCells,
    peripheryArea,
    fatalDefects,
    repairProbability: clamp(repairProbability),
    repairProbabilityIsExact: !(faults.cells > 0) || settings.spareRows + settings.spareColumns === 0,
    repairProbabilityWithoutSpares: clamp(repairProbabilityWithoutSpares),
    dieYield: clamp(dieYield),
    redundancyArea: redundancy,
    spareRowArea,
    spareColumnArea,
    fuseAndCompareArea,
    dieAreaWithRedundancy,
    areaPerBitWithRedundancy: usableBits > 0 ? (floorplanArea + redundancy) / usableBits : Number.NaN,
    grossDiesPerWafer: gross,
    goodDiesPerWafer: goodDiesPerWafer(gross, clamp(dieYield)),
    monteCarlo: plan.layout
      ? {
          layout: plan.layout,
          copies,
          spareRows: settings.spareRows,
          spareColumns: settings.spareColumns,
          fatalDefects,
          clustering: alpha,
          seed: 1,
        }
      : null,
    problems,
  };
}

const CACHE = new WeakMap<Report, { design: Design; figures: YieldFigures }>();

/** The yield figures of a report, computed once per report and design (the catalogue reads them often). */
export function yieldFiguresOf(report: Report, design: Design): YieldFigures {
  const cached = CACHE.get(report);
  if (cached && cached.design === design) return cached.figures;
  const figures = computeYieldFigures(report, design);
  CACHE.set(report, { design, figures });
  return figures;
}
