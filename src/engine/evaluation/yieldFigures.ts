import type { Design } from '../../model/design';
import { DEFAULT_REPAIR } from '../../model/builtins';
import type { RepairSettings } from '../../model/repair';
import { clusteredExpectation } from '../physics/defectClustering';
import {
  defectFaults,
  NO_FAULTS,
  parametricFaults,
  senseAmpFailureProbability,
  weakCellFraction,
  type RetentionTail,
  type FaultCounts,
} from '../physics/faultRates';
import { sparseRepairProbability, type RepairDomain } from '../physics/redundancy';
import { redundancyArea } from '../physics/redundancyArea';
import type { MonteCarloDomainClass, RepairMonteCarloRequest } from '../physics/repairMonteCarlo';
import { goodDiesPerWafer, grossDiesPerWafer } from '../physics/yield';
import { retentionTailAt } from './designContext';
import { figuresAt, type MatTable } from './matTable';
import type { MatFigures, Report } from './report';

/** The yield figures of a design on its die (SI; counts per die unless named otherwise). */
export interface YieldFigures {
  readonly settings: RepairSettings;
  /** Copies of the floorplan on the die (the operating conditions' one value). */
  readonly floorplanCopiesPerDie: number;
  /** Repair domains in one floorplan copy, and on the die. */
  readonly domainsPerFloorplan: number;
  readonly domainsPerDie: number;
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
  /** Probability that every repair domain on the die is repaired (clustered defects). */
  readonly repairProbability: number;
  /** The same with no spares: the yield redundancy starts from. */
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
  /** Monte-Carlo request for the same die (for the worker). */
  readonly monteCarlo: RepairMonteCarloRequest;
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

/** One repair domain of a floorplan copy, before identical domains are counted together. */
export interface DomainSum {
  rows: number;
  columns: number;
  area: number;
  defects: FaultCounts;
  parametric: FaultCounts;
}

/** Positions closer than this share a mat-row band (m). */
const BAND_GRID = 1e-9;

/** One mat's share of a repair domain: its lines, area and expected faults of each source. */
export function matDomainShare(
  f: MatFigures,
  settings: RepairSettings,
  refreshWindow: number,
  tail?: RetentionTail,
): DomainSum {
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

/** A domain made of `n` copies of one mat's share. */
export function repeatedShare(share: DomainSum, n: number): DomainSum {
  return {
    rows: share.rows * n,
    columns: share.columns * n,
    area: share.area * n,
    defects: scale(share.defects, n),
    parametric: scale(share.parametric, n),
  };
}

/**
 * The repair domains of one floorplan copy. A mat is one domain; a mat row groups the mats of one band
 * along the word lines (same start across them, as the refresh rows count them); the bank is every mat.
 */
function domainsOf(
  mats: MatTable,
  design: Design,
  settings: RepairSettings,
  tail: RetentionTail,
): DomainSum[] {
  const byKey = new Map<string, DomainSum>();
  for (let k = 0; k < mats.count; k++) {
    const f = figuresAt(mats, k);
    const block = mats.blocks[mats.position[k] ?? -1];
    let key: string;
    if (settings.repairDomain === 'bank') key = 'bank';
    else if (settings.repairDomain === 'mat' || !block) key = `mat${k}`;
    else {
      const vertical = block.type === 'mat' && block.bitlineAxis === 'vertical';
      key = `${vertical ? 'v' : 'h'}${Math.round((vertical ? block.y : block.x) / BAND_GRID)}`;
    }
    const share = matDomainShare(f, settings, design.operating.refreshWindow, tail);
    const sum = byKey.get(key);
    if (!sum) byKey.set(key, { ...share });
    else {
      sum.rows += share.rows;
      sum.columns += share.columns;
      sum.area += share.area;
      sum.defects = add(sum.defects, share.defects);
      sum.parametric = add(sum.parametric, share.parametric);
    }
  }
  return [...byKey.values()];
}

const add = (a: FaultCounts, b: FaultCounts): FaultCounts => ({
  cells: a.cells + b.cells,
  rows: a.rows + b.rows,
  columns: a.columns + b.columns,
});
const scale = (a: FaultCounts, s: number): FaultCounts => ({
  cells: a.cells * s,
  rows: a.rows * s,
  columns: a.columns * s,
});

/** Identical domains counted together (most floorplans have one or two kinds). */
function domainClasses(domains: readonly DomainSum[]): { count: number; domain: DomainSum }[] {
  const classes = new Map<string, { count: number; domain: DomainSum }>();
  for (const d of domains) {
    const key = [
      d.rows,
      d.columns,
      d.area,
      d.defects.cells,
      d.defects.rows,
      d.defects.columns,
      d.parametric.cells,
      d.parametric.columns,
    ].join(',');
    const found = classes.get(key);
    if (found) found.count++;
    else classes.set(key, { count: 1, domain: d });
  }
  return [...classes.values()];
}

/**
 * The yield figures: expected faults from the three sources per mat, grouped into repair domains, each
 * domain's repair probability in the sparse limit (a lower bound; exact for row and column faults), the
 * die's product over domains and the periphery's survival, averaged over the gamma-distributed defect
 * density (negative-binomial clustering); then redundancy area, gross and good dies per wafer.
 */
export function computeYieldFigures(report: Report, design: Design): YieldFigures {
  const settings = repairSettingsOf(design);
  const areaByType = report.totals.areaByType;
  const retentionTail = retentionTailAt(design.process, design.operating);
  return yieldOfDomains({
    domains: domainsOf(report.mats, design, settings, retentionTail),
    mats: report.mats.figures,
    settings,
    floorplanCopiesPerDie: design.operating.floorplanCopiesPerDie,
    retentionTail,
    refreshWindow: design.operating.refreshWindow,
    floorplanArea: report.totals.totalArea,
    usableBits: report.totals.usableBits,
    stripShare: areaByType.mat > 0 ? areaByType.senseAmpStrip / areaByType.mat : 0,
  });
}

/** What the yield figures need of a floorplan, from a report or from the explorer's closed form. */
export interface YieldInputs {
  readonly domains: readonly DomainSum[];
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
  /** Sense-amplifier strip area over mat area. */
  readonly stripShare: number;
}

/** The yield figures of one floorplan's repair domains on its die. */
export function yieldOfDomains(inputs: YieldInputs): YieldFigures {
  const { settings, stripShare } = inputs;
  const problems: string[] = [];
  const copies = inputs.floorplanCopiesPerDie;
  const domains = inputs.domains;
  const classes = domainClasses(domains);

  let defectTotal = NO_FAULTS;
  let parametricTotal = NO_FAULTS;
  let spareRowArea = 0;
  let spareColumnArea = 0;
  let fuseAndCompareArea = 0;
  let senseAmpFailure = 0;
  let weakCells = 0;
  for (const { count, domain } of classes) {
    defectTotal = add(defectTotal, scale(domain.defects, count * copies));
    parametricTotal = add(parametricTotal, scale(domain.parametric, count * copies));
    const cost = redundancyArea(
      domain.area,
      domain.rows,
      domain.columns,
      settings.spareRows,
      settings.spareColumns,
      stripShare,
      settings.fuseArea,
      settings.compareBitArea,
    );
    spareRowArea += cost.spareRows * count;
    spareColumnArea += cost.spareColumns * count;
    fuseAndCompareArea += cost.fuseAndCompare * count;
  }
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

  const arrays = (x: number, spareRows: number, spareColumns: number): number => {
    let logP = 0;
    for (const { count, domain } of classes) {
      const d: RepairDomain = {
        rows: domain.rows,
        columns: domain.columns,
        spareRows,
        spareColumns,
        faults: add(scale(domain.defects, x), domain.parametric),
      };
      const p = sparseRepairProbability(d);
      if (!(p > 0)) return 0;
      logP += count * copies * Math.log(p);
    }
    return Math.exp(logP);
  };
  const alpha = settings.defectClustering;
  const clamp = (p: number) => Math.min(1, Math.max(0, p));
  const repairProbability = clusteredExpectation(
    (x) => arrays(x, settings.spareRows, settings.spareColumns),
    alpha,
  );
  const repairProbabilityWithoutSpares = clusteredExpectation((x) => arrays(x, 0, 0), alpha);
  const dieYield = clusteredExpectation(
    (x) => arrays(x, settings.spareRows, settings.spareColumns) * Math.exp(-fatalDefects * x),
    alpha,
  );
  const dieAreaWithRedundancy = settings.dieArea + copies * redundancy;
  const gross = grossDiesPerWafer(settings.waferDiameter, dieAreaWithRedundancy);
  const usableBits = inputs.usableBits;

  const monteCarloClasses: MonteCarloDomainClass[] = classes.map(({ count, domain }) => ({
    count: count * copies,
    rows: domain.rows,
    columns: domain.columns,
    spareRows: settings.spareRows,
    spareColumns: settings.spareColumns,
    defectFaults: domain.defects,
    parametricFaults: domain.parametric,
  }));

  return {
    settings,
    floorplanCopiesPerDie: copies,
    domainsPerFloorplan: domains.length,
    domainsPerDie: domains.length * copies,
    defectFaults: defectTotal,
    parametricFaults: parametricTotal,
    faults: add(defectTotal, parametricTotal),
    senseAmpFailure,
    weakCellFraction: weakCells,
    peripheryArea,
    fatalDefects,
    repairProbability: clamp(repairProbability),
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
    monteCarlo: { classes: monteCarloClasses, fatalDefects, clustering: alpha, seed: 1 },
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
