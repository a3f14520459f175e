import type { Design } from '../../model/design';
import type { Report } from '../evaluation/report';
import { yieldFiguresOf, type YieldFigures } from '../evaluation/yieldFigures';
import { input, SOURCES } from './explanation';
import { totalFigure } from './totalFigure';

const Y = (r: Report, d: Design): YieldFigures => yieldFiguresOf(r, d);

const STAPPER =
  'C. H. Stapper, negative-binomial (gamma-mixed Poisson) yield model, IBM J. Res. Dev., 1980s (from memory); J. L. Hennessy, D. A. Patterson, Computer Architecture: A Quantitative Approach, 5th ed., 2012, ch. 1';
const HENNESSY_DIES =
  'J. L. Hennessy, D. A. Patterson, Computer Architecture: A Quantitative Approach, 5th ed., 2012, ch. 1 (dies per wafer)';
const CAUTION = ' First-order estimate: real yield needs measured defect and retention data.';

/** Inputs every fault count shows: density, kill ratios and the die's copies. */
function defectInputs(y: YieldFigures) {
  const s = y.settings;
  return [
    input('D0', 'killing-defect density', s.defectDensity, 'defectDensity'),
    input('k_cell', 'single-cell kill ratio', s.killRatioCell, 'ratio'),
    input('k_WL', 'word-line kill ratio', s.killRatioWordline, 'ratio'),
    input('k_BL', 'bit-line kill ratio', s.killRatioBitline, 'ratio'),
    input('N', 'floorplan copies per die', y.floorplanCopiesPerDie, 'count'),
  ];
}

/** Catalogue entries of the yield and redundancy figures, in the order of the JSON summary. */
export const TOTAL_YIELD_FIGURES = [
  totalFigure({
    key: 'expectedFaultyCells',
    label: 'Faulty cells per die (expected)',
    quantity: 'ratio',
    group: 'Yield',
    exportKey: 'expectedFaultyCellsPerDie_ratio',
    cli: { label: 'faulty cells per die' },
    value: (r, d) => Y(r, d).faults.cells,
    explain: (r, d) => {
      const y = Y(r, d);
      return {
        symbol: 'λ_cell',
        formula: 'λ_cell = N · Σ_mats (D0·A_mat·k_cell + cells·f_weak)',
        inputs: [
          ...defectInputs(y),
          input('λ_defect', 'from defects', y.defectFaults.cells, 'ratio'),
          input('f_weak', 'largest weak-cell share (retention < tREFW)', y.weakCellFraction, 'ratio'),
          input('λ_weak', 'from weak cells', y.parametricFaults.cells, 'ratio'),
        ],
        method:
          'Poisson defects with kill ratios (critical-area share of each fault kind), plus cells whose retention is shorter than the refresh window.' +
          CAUTION,
        source: SOURCES.criticalArea,
      };
    },
  }),
  totalFigure({
    key: 'expectedFaultyRows',
    label: 'Faulty word lines per die (expected)',
    quantity: 'ratio',
    group: 'Yield',
    exportKey: 'expectedFaultyRowsPerDie_ratio',
    cli: { label: 'faulty word lines per die' },
    value: (r, d) => Y(r, d).faults.rows,
    explain: (r, d) => ({
      symbol: 'λ_row',
      formula: 'λ_row = N · Σ_mats D0·A_mat·k_WL',
      inputs: defectInputs(Y(r, d)),
      method: 'Poisson defects that open or short a whole word line.' + CAUTION,
      source: SOURCES.criticalArea,
    }),
  }),
  totalFigure({
    key: 'expectedFaultyColumns',
    label: 'Faulty bit-line pairs per die (expected)',
    quantity: 'ratio',
    group: 'Yield',
    exportKey: 'expectedFaultyColumnsPerDie_ratio',
    cli: { label: 'faulty bit-line pairs per die' },
    value: (r, d) => Y(r, d).faults.columns,
    explain: (r, d) => {
      const y = Y(r, d);
      return {
        symbol: 'λ_col',
        formula: 'λ_col = N · Σ_mats (D0·A_mat·k_BL + n_SA·2·Q(ΔV/σ))',
        inputs: [
          ...defectInputs(y),
          input('λ_defect', 'from defects', y.defectFaults.columns, 'ratio'),
          input('p_SA', 'largest sense-amp failure probability 2·Q(ΔV/σ)', y.senseAmpFailure, 'ratio'),
          input('λ_SA', 'from sense amplifiers', y.parametricFaults.columns, 'ratio'),
        ],
        method:
          'Poisson defects that kill a bit-line pair, plus sense amplifiers whose offset (Gaussian, σ from Pelgrom) exceeds the signal in the direction that opposes either datum.' +
          CAUTION,
        source: `${SOURCES.pelgrom}; two-tailed offset failure: ${SOURCES.common}`,
      };
    },
  }),
  totalFigure({
    key: 'repairProbability',
    label: 'Repair probability (die arrays)',
    quantity: 'percent',
    group: 'Yield',
    exportKey: 'repairProbability_ratio',
    cli: { label: 'repair probability' },
    value: (r, d) => Y(r, d).repairProbability,
    explain: (r, d) => {
      const y = Y(r, d);
      const s = y.settings;
      return {
        symbol: 'P_repair',
        formula:
          "P = E_x[ max over three fixed plans of Π_rowdom · Π_strips ],  x ~ Gamma(α, mean 1);  plans: cells by rows; cells by columns; each strip's C split among its mats, a cell takes its share's columns, then the row domain's rows",
        inputs: [
          input('R', 'spare rows per row domain', s.spareRows, 'count'),
          input('C', 'spare columns per sense-amp strip segment', s.spareColumns, 'count'),
          input('row domains', 'row-repair domains per die', y.rowDomainsPerDie, 'count'),
          input('strips', 'column-repair domains (strip segments) per die', y.columnDomainsPerDie, 'count'),
          input('α', 'defect clustering', s.defectClustering, 'ratio'),
          input('P0', 'without spares', y.repairProbabilityWithoutSpares, 'percent'),
        ],
        method:
          "Spare rows serve a row domain (mat, mat row or floorplan), spare columns a sense-amplifier strip segment (its sense amplifiers and the bit-line pairs they serve on both sides). Faulty rows and columns are Binomial(lines, 1 − e^(−λ/lines)): exact when there are only line faults, since rows and columns are then independent. Single-cell faults couple a row domain and a strip, so the closed form takes the best of three repair plans fixed in advance (every cell by a spare row; every cell by a spare column; each strip's spare columns split among the mats it senses, cells taking their share's columns and then the row domain's rows): a LOWER BOUND. The Monte-Carlo estimate in the yield panel solves the same domains exactly. Defect rates are scaled by a gamma-distributed density (clustering)." +
          CAUTION,
        source: `${STAPPER}; ${SOURCES.common} for the repair rule`,
      };
    },
  }),
  totalFigure({
    key: 'dieYield',
    label: 'Die yield',
    quantity: 'percent',
    group: 'Yield',
    exportKey: 'dieYield_ratio',
    cli: { label: 'die yield' },
    value: (r, d) => Y(r, d).dieYield,
    explain: (r, d) => {
      const y = Y(r, d);
      return {
        symbol: 'Y',
        formula: 'Y = E_x[ P_repair(x) · e^(−λ_periphery·x) ],  λ_periphery = D0·A_periphery·k_periphery',
        inputs: [
          input('P_repair', 'repair probability', y.repairProbability, 'percent'),
          input('A_periphery', 'die area outside the floorplans', y.peripheryArea, 'area'),
          input('k_periphery', 'periphery kill ratio', y.settings.killRatioPeriphery, 'ratio'),
          input('λ_periphery', 'killing periphery defects', y.fatalDefects, 'ratio'),
          input('α', 'defect clustering', y.settings.defectClustering, 'ratio'),
        ],
        method:
          'A die is good when every repair domain is repaired and no defect kills its periphery; with no spares this is the negative-binomial yield (1 + λ/α)^(−α).' +
          CAUTION,
        source: STAPPER,
      };
    },
  }),
  totalFigure({
    key: 'redundancyArea',
    label: 'Redundancy area (floorplan)',
    quantity: 'area',
    group: 'Yield',
    exportKey: 'redundancyArea_m2',
    cli: { label: 'redundancy area' },
    value: (r, d) => Y(r, d).redundancyArea,
    explain: (r, d) => {
      const y = Y(r, d);
      return {
        symbol: 'A_red',
        formula:
          'A_red = Σ_rowdom R·(A/rows + (b+1)·A_fuse + b·A_cmp) + Σ_strips C·(Σ_sides A_side/cols_side + A_strip/cols + (b+1)·A_fuse + b·A_cmp)',
        inputs: [
          input('A_rows', 'spare word lines', y.spareRowArea, 'area'),
          input('A_cols', 'spare bit-line pairs with sense amps', y.spareColumnArea, 'area'),
          input('A_fuse+cmp', 'fuses and address comparators', y.fuseAndCompareArea, 'area'),
          input('A_fuse', 'one fuse', y.settings.fuseArea, 'area'),
          input('A_cmp', 'one compare bit', y.settings.compareBitArea, 'area'),
        ],
        method:
          "A spare row adds one word line of its row domain's cells; a spare column adds one sense amplifier to its strip and one column of cells in the mat on each side it senses. Each spare has a fuse set of b = ⌈log2(lines of its domain)⌉ address fuses plus an enable fuse, compared on every access.",
        source: `${SOURCES.common}; fuse-set redundancy as in K. Itoh, VLSI Memory Chip Design, Springer, 2001 (from memory)`,
      };
    },
  }),
  totalFigure({
    key: 'areaPerBitWithRedundancy',
    label: 'Area per bit with redundancy',
    quantity: 'area',
    group: 'Yield',
    exportKey: 'areaPerBitWithRedundancy_m2',
    value: (r, d) => Y(r, d).areaPerBitWithRedundancy,
    explain: (r, d) => ({
      symbol: 'A/bit',
      formula: 'A/bit = (A_total + A_red) / usable bits',
      inputs: [
        input('A_total', 'floorplan area', r.totals.totalArea, 'area'),
        input('A_red', 'redundancy area', Y(r, d).redundancyArea, 'area'),
        input('bits', 'usable bits', r.totals.usableBits, 'count'),
      ],
      method: 'Area per bit once the spares and their fuses are paid for.',
      source: SOURCES.takahashi,
    }),
  }),
  totalFigure({
    key: 'grossDiesPerWafer',
    label: 'Gross dies per wafer',
    quantity: 'count',
    group: 'Yield',
    exportKey: 'grossDiesPerWafer',
    value: (r, d) => Math.floor(Y(r, d).grossDiesPerWafer),
    explain: (r, d) => {
      const y = Y(r, d);
      return {
        symbol: 'N_gross',
        formula: 'N = ⌊π(d/2)²/S − π·d/√(2S)⌋',
        inputs: [
          input('d', 'wafer diameter', y.settings.waferDiameter, 'length'),
          input('S', 'die area with redundancy', y.dieAreaWithRedundancy, 'area'),
          input('S0', 'die area as given', y.settings.dieArea, 'area'),
        ],
        method: 'Wafer area over die area, less the partial dies along the rim.',
        source: HENNESSY_DIES,
      };
    },
  }),
  totalFigure({
    key: 'goodDiesPerWafer',
    label: 'Good dies per wafer',
    quantity: 'count',
    group: 'Yield',
    exportKey: 'goodDiesPerWafer',
    cli: { label: 'good dies per wafer' },
    value: (r, d) => Y(r, d).goodDiesPerWafer,
    explain: (r, d) => {
      const y = Y(r, d);
      return {
        symbol: 'N_good',
        formula: 'N_good = N_gross · Y',
        inputs: [
          input('N_gross', 'gross dies per wafer', Math.floor(y.grossDiesPerWafer), 'count'),
          input('Y', 'die yield', y.dieYield, 'percent'),
        ],
        method: 'Gross dies times the die yield.' + CAUTION,
        source: HENNESSY_DIES,
      };
    },
  }),
] as const;
