import { formatQuantity } from '../../model/units';
import { input, SOURCES } from './explanation';
import { FORMULAS } from './formulas';
import { totalFigure } from './totalFigure';

/** Catalogue entries of the design's size and area, in the order of the JSON summary. */
export const TOTAL_AREA_FIGURES = [
  totalFigure({
    key: 'matCount',
    label: 'Mats',
    quantity: 'count',
    group: null,
    exportKey: 'mats',
    cli: { label: 'mats' },
    value: (r) => r.totals.matCount,
  }),
  totalFigure({
    key: 'bits',
    label: 'Total bits',
    quantity: 'count',
    group: 'Area',
    exportKey: 'bits',
    cli: { label: 'bits' },
    value: (r) => r.totals.bits,
    explain: (r) => ({
      symbol: 'bits',
      formula: 'bits = Σ bits of each mat',
      inputs: [input('mats', 'mats', r.totals.matCount, 'count')],
      method: 'Sum over mats.',
      source: SOURCES.common,
    }),
  }),
  totalFigure({
    key: 'usableBits',
    label: 'Usable bits',
    quantity: 'count',
    group: 'Area',
    exportKey: 'usableBits',
    cli: { label: 'usable bits' },
    value: (r) => r.totals.usableBits,
    explain: (r) => ({
      symbol: 'bits_u',
      formula: 'bits_u = bits − bits on unpartnered open bit lines',
      inputs: [
        input('bits', 'all bits', r.totals.bits, 'count'),
        input('lost', 'lost at open-array edges', r.totals.lostBits, 'count'),
      ],
      method: 'Outermost open-bit-line mats have no partner for the bit lines that end at the array edge.',
      source: 'Takahashi et al., IEEE JSSC 36(11), 2001; Sekiguchi, Itoh et al., IEEE JSSC, 2002',
    }),
  }),
  totalFigure({
    key: 'lostBits',
    label: 'Lost bits',
    quantity: 'count',
    group: null,
    exportKey: 'lostBits',
    value: (r) => r.totals.lostBits,
  }),
  totalFigure({
    key: 'totalArea',
    label: 'Total area',
    quantity: 'area',
    group: 'Area',
    exportKey: 'area_m2',
    cli: { label: 'total area (bounding box)' },
    value: (r) => r.totals.totalArea,
    explain: (r) => ({
      symbol: 'A_total',
      formula: 'A_total = width × height of the bounding box of all blocks',
      inputs: [input('A_placed', 'blocks summed (without gaps)', r.totals.placedArea, 'area')],
      method: 'Gaps between blocks count as used die area.',
      source: SOURCES.common,
    }),
  }),
  totalFigure({
    key: 'blockAreas',
    label: 'Area of the blocks',
    quantity: 'area',
    group: 'Area',
    exportKey: 'placedArea_m2',
    cli: { label: 'placed area (blocks summed)' },
    value: (r) => r.totals.placedArea,
    explain: (r) => {
      const a = r.totals.areaByType;
      return {
        symbol: 'A_placed',
        formula: 'A_placed = Σ block areas, by type',
        inputs: [
          input('A_mats', 'mats', a.mat, 'area'),
          input('A_sa', 'sense-amplifier strips', a.senseAmpStrip, 'area'),
          input('A_swd', 'sub-word-line driver strips', a.wordlineDriverStrip, 'area'),
          input('A_rdec', 'row decoders', a.rowDecoder, 'area'),
          input('A_cdec', 'column decoders', a.columnDecoder, 'area'),
          input('A_sp', 'spacers', a.spacer, 'area'),
        ],
        method: 'Each block’s own rectangle; gaps between blocks are not included.',
        source: SOURCES.common,
      };
    },
  }),
  totalFigure({
    key: 'cellArea',
    label: 'Cell area',
    quantity: 'area',
    group: 'Area',
    exportKey: 'cellArea_m2',
    cli: { label: 'cell area' },
    value: (r) => r.totals.cellArea,
    explain: (r) => ({
      symbol: 'A_cells',
      formula: 'A_cells = Σ usable bits × cell footprint',
      inputs: [input('bits', 'usable bits', r.totals.usableBits, 'count')],
      method: 'Cell footprint = bit-line pitch × word-line pitch / occupancy.',
      source: SOURCES.common,
    }),
  }),
  totalFigure({
    key: 'arrayEfficiency',
    label: 'Array efficiency',
    quantity: 'percent',
    group: 'Area',
    exportKey: 'arrayEfficiency_ratio',
    cli: { label: 'array efficiency' },
    value: (r) => r.totals.arrayEfficiency,
    explain: (r) => ({
      symbol: 'η',
      formula: FORMULAS.arrayEfficiency,
      inputs: [
        input('A_cells', 'usable cell footprints', r.totals.cellArea, 'area'),
        input('A_total', 'bounding box of all blocks', r.totals.totalArea, 'area'),
      ],
      method: 'Share of the floorplan taken by usable storage cells.',
      source: SOURCES.takahashi,
    }),
  }),
  totalFigure({
    key: 'areaPerBit',
    label: 'Area per bit',
    quantity: 'area',
    group: 'Area',
    exportKey: 'areaPerBit_m2',
    cli: { label: 'area per bit' },
    value: (r) => r.totals.areaPerBit,
    explain: (r) => ({
      symbol: 'A_bit',
      formula: FORMULAS.areaPerBit,
      inputs: [
        input('A_total', 'bounding box of all blocks', r.totals.totalArea, 'area'),
        input('bits', 'usable bits', r.totals.usableBits, 'count'),
      ],
      method: 'Total area spread over every usable bit, periphery included.',
      source: SOURCES.takahashi,
    }),
  }),
  totalFigure({
    key: 'areaPerBitInF2',
    label: 'Area per bit in F²',
    quantity: 'ratio',
    group: 'Area',
    exportKey: 'areaPerBitInF2_ratio',
    cli: {
      label: 'area per bit in F²',
      text: (r) => `${formatQuantity(r.totals.areaPerBitInF2, 'ratio')} F²`,
    },
    value: (r) => r.totals.areaPerBitInF2,
    explain: (r, design) => ({
      symbol: 'A_bit/F²',
      formula: FORMULAS.areaPerBitInF2,
      inputs: [
        input('A_bit', 'area per bit', r.totals.areaPerBit, 'area'),
        input('F', 'feature size', design.process.featureSize, 'length'),
      ],
      method: 'Area per bit normalised to the feature size, comparable across nodes.',
      source: SOURCES.common,
    }),
  }),
] as const;
