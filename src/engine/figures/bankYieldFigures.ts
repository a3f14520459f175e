import { input, SOURCES } from './explanation';
import { bankFigure, EVERY_VIEW } from './bankFigure';

const SPARES = (f: { spareRows: number; spareColumns: number }) => [
  input('R', 'spare rows per row domain', f.spareRows, 'count'),
  input('C', 'spare columns per sense-amp strip segment', f.spareColumns, 'count'),
];
const STAPPER =
  'C. H. Stapper, negative-binomial yield model, IBM J. Res. Dev., 1980s (from memory); Hennessy & Patterson, Computer Architecture: A Quantitative Approach, 5th ed., 2012, ch. 1';

/** A spare count the yield figures assume: an input, shown beside them. */
const spareCount = <const Key extends 'spareRows' | 'spareColumns'>(key: Key, label: string) =>
  bankFigure({
    key,
    label,
    quantity: 'count',
    better: 'neither',
    offeredIn: ['pointCard'],
    needsYield: true,
    exportKey: null,
    explain: (f) => ({
      symbol: key === 'spareRows' ? 'R' : 'C',
      formula: `${label} (the Yield tab, or the explorer's spare sweep)`,
      inputs: SPARES(f),
      method: 'An input of the yield figures.',
      source: SOURCES.common,
    }),
  });

/** Comparison figures of a bank's yield and redundancy (explorer axes, point card, variants table). */
export const BANK_YIELD_FIGURES = [
  spareCount('spareRows', 'Spare rows per row domain'),
  spareCount('spareColumns', 'Spare columns per strip segment'),
  bankFigure({
    key: 'dieYield',
    label: 'Die yield',
    quantity: 'percent',
    better: 'higher',
    offeredIn: EVERY_VIEW,
    needsYield: true,
    exportKey: null,
    explain: (f) => ({
      symbol: 'Y',
      formula: 'Y = E_x[ P_repair(x) · e^(−λ_periphery·x) ],  x ~ Gamma(α, mean 1)',
      inputs: [...SPARES(f), input('P_repair', 'repair probability', f.repairProbability, 'percent')],
      method:
        'Every repair domain repaired (exact for line faults; a lower bound with single-cell faults) and no killing periphery defect, over a clustered defect density. First-order estimate.',
      source: STAPPER,
    }),
  }),
  bankFigure({
    key: 'repairProbability',
    label: 'Repair probability',
    quantity: 'percent',
    better: 'higher',
    offeredIn: ['pointCard', 'variantsTable'],
    needsYield: true,
    exportKey: null,
    explain: (f) => ({
      symbol: 'P_repair',
      formula:
        'P = E_x[ max over three fixed plans of Π_rowdom · Π_strips ]: cells by rows; cells by columns; strip spares split among its mats',
      inputs: SPARES(f),
      method:
        "Spare rows per row domain, spare columns per sense-amp strip segment (inner strips shared by the mats above and below). Faulty lines Binomial(lines, 1 − e^(−λ/lines)), exact for line faults; with single-cell faults a lower bound (the best of: every cell by a spare row; every cell by a spare column; each strip's spares split among its mats, cells by their share, then by rows).",
      source: `${STAPPER}; ${SOURCES.common} for the repair rule`,
    }),
  }),
  bankFigure({
    key: 'redundancyArea',
    label: 'Redundancy area',
    quantity: 'area',
    better: 'lower',
    offeredIn: ['variantsTable'],
    needsYield: true,
    exportKey: null,
    explain: (f) => ({
      symbol: 'A_red',
      formula:
        'A_red = Σ_rowdom R·(A/rows + fuse set) + Σ_strips C·(cells of one column on each side + A_strip/cols + fuse set)',
      inputs: SPARES(f),
      method:
        'Spare rows of cells per row domain, spare columns (a sense amplifier and its bit lines on both sides) per strip, and a fuse set per spare.',
      source: `${SOURCES.common}; K. Itoh, VLSI Memory Chip Design, Springer, 2001 (from memory)`,
    }),
  }),
  bankFigure({
    key: 'areaPerBitWithRedundancy',
    label: 'Area per bit with redundancy',
    quantity: 'area',
    better: 'lower',
    offeredIn: EVERY_VIEW,
    needsYield: true,
    exportKey: null,
    explain: (f) => ({
      symbol: 'A/bit',
      formula: 'A/bit = (A_total + A_red) / usable bits',
      inputs: [
        input('A_total', 'bank area', f.totalArea, 'area'),
        input('A_red', 'redundancy area', f.redundancyArea, 'area'),
        input('bits', 'usable bits', f.usableBits, 'count'),
      ],
      method: 'Area per bit once spares and fuses are paid for.',
      source: SOURCES.takahashi,
    }),
  }),
  bankFigure({
    key: 'goodDiesPerWafer',
    label: 'Good dies per wafer',
    quantity: 'count',
    better: 'higher',
    offeredIn: EVERY_VIEW,
    needsYield: true,
    exportKey: null,
    explain: (f) => ({
      symbol: 'N_good',
      formula: 'N_good = ⌊π(d/2)²/S − π·d/√(2S)⌋ · Y, S = die area + redundancy of every copy',
      inputs: [input('Y', 'die yield', f.dieYield, 'percent'), ...SPARES(f)],
      method: 'Gross dies per wafer (die grown by its redundancy) times the die yield.',
      source:
        'J. L. Hennessy, D. A. Patterson, Computer Architecture: A Quantitative Approach, 5th ed., 2012, ch. 1',
    }),
  }),
] as const;
