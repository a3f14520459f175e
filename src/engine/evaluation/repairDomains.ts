import type { RepairSettings } from '../../model/repair';
import type { FaultCounts } from '../physics/faultRates';
import {
  domainFaults,
  RepairTilesBuilder,
  type DomainFaults,
  type RepairLayout,
  type RepairTiles,
} from '../physics/repairLayout';
import type { MatTable } from './matTable';

/**
 * The repair domains of one floorplan copy with what a spare costs in each. Rows are repaired per mat, per
 * mat row or per floorplan (the setting); columns per sense-amplifier strip segment: a spare column is a
 * spare sense amplifier in the strip with its bit-line pair (or open bit line) in every mat the strip
 * senses, so it replaces any column of the strip, on either side.
 */
export interface RepairPlan {
  /** Row domains, identical ones counted together; a spare row costs domain mat area / word lines (m²). */
  readonly rowClasses: readonly RepairDomainClass[];
  /**
   * Column domains (strip segments), identical ones counted together; a spare column costs one column of
   * cells in the mats of each side of the strip (their area / columns) and one sense amplifier's share of
   * the strip (strip area / columns) (m²).
   */
  readonly columnClasses: readonly RepairDomainClass[];
  /** Every domain and tile of one floorplan copy, for the Monte Carlo; null where only the closed form is wanted. */
  readonly layout: RepairLayout | null;
}

/** Identical repair domains of one kind: how many per floorplan copy, their faults and a spare's area. */
export interface RepairDomainClass {
  readonly count: number;
  readonly domain: DomainFaults;
  /** Area of one spare line of the domain (m²). */
  readonly spareArea: number;
  /**
   * Row domains only: the domain's tiles, identical ones counted together, each with the spare columns
   * the split plan sets aside for it from its strip (the closed form's third repair plan).
   */
  readonly tiles?: readonly TileShare[];
}

/** Identical tiles of a row domain: their expected cell and column faults and their share of spare columns. */
export interface TileShare {
  readonly count: number;
  readonly defectCells: number;
  readonly parametricCells: number;
  readonly defectColumns: number;
  readonly parametricColumns: number;
  readonly columnSpares: number;
}

/** Domains with their spare areas (and tile shares), identical ones counted together. */
function classesOf(
  domains: readonly DomainFaults[],
  spareArea: readonly number[],
  tiles?: readonly (readonly TileShare[])[],
): RepairDomainClass[] {
  const classes = new Map<string, RepairDomainClass & { count: number }>();
  domains.forEach((d, i) => {
    const area = spareArea[i] ?? 0;
    const mix = tiles?.[i];
    const key =
      `${d.lines},${d.defectLines},${d.parametricLines},${d.defectCells},${d.parametricCells},${area}` +
      (mix ? `|${mix.map(tileKey).join(';')}` : '');
    const found = classes.get(key);
    if (found) found.count++;
    else classes.set(key, { count: 1, domain: d, spareArea: area, ...(mix ? { tiles: mix } : {}) });
  });
  return [...classes.values()];
}

const tileKey = (t: Omit<TileShare, 'count'> & { count?: number }) =>
  `${t.defectCells},${t.parametricCells},${t.defectColumns},${t.parametricColumns},${t.columnSpares}`;

/** Spare columns of a strip divided among its k tiles in order: ⌊C/k⌋ each, one more for the first C mod k. */
export function splitShare(spareColumns: number, tiles: number, index: number): number {
  if (tiles <= 0) return 0;
  return Math.floor(spareColumns / tiles) + (index < spareColumns % tiles ? 1 : 0);
}

/** One mat's lines, outline area and expected faults (from its figures and the repair settings). */
export interface MatShare {
  readonly rows: number;
  readonly columns: number;
  readonly area: number;
  readonly defects: FaultCounts;
  readonly parametric: FaultCounts;
}

/** Positions closer than this share a mat-row band (m). */
const BAND_GRID = 1e-9;

/** A column domain while it is gathered: columns and area on each side of its strip, and the strip. */
interface StripSides {
  index: number;
  columns: [number, number];
  cellArea: [number, number];
  stripArea: number;
}

/**
 * The repair plan of an evaluated floorplan. Row domains: each mat, the mats of one band along the word
 * lines (same start across them, as the refresh rows count them), or every mat. Column domains: each
 * sense-amplifier strip that senses a mat (from the report's serving table); a mat's columns are shared
 * evenly between the strips at its bit-line ends (interleaved sense amplifiers), and the mats on the two
 * sides of a strip share its sense amplifiers, so the strip has as many columns as its fuller side. A mat
 * no strip senses keeps its own column domain.
 */
export function reportRepairPlan(
  mats: MatTable,
  settings: RepairSettings,
  shareOf: (k: number) => MatShare,
): RepairPlan {
  const rowIndex = new Map<number, number>();
  const rowDomainRows: number[] = [];
  const rowArea: number[] = [];
  const strips = new Map<number, StripSides>();
  const lonely: { index: number; columns: number; area: number }[] = [];
  let columnDomains = 0;
  let tileCount = 0;
  for (let k = 0; k < mats.count; k++) {
    tileCount += Math.max(1, (mats.servingOffsets[3 * k + 1] ?? 0) - (mats.servingOffsets[3 * k] ?? 0));
  }
  const tiles = new RepairTilesBuilder(tileCount);
  /** Per tile: its side of the strip, and its kind (mat share, strips of its mat) for the split plan. */
  const tileSide = new Uint8Array(tileCount);
  const tileShare = new Int32Array(tileCount);
  const tileStrips = new Int32Array(tileCount);
  const shareIds = new Map<MatShare, number>();
  const shareList: MatShare[] = [];
  for (let k = 0; k < mats.count; k++) {
    const share = shareOf(k);
    let shareId = shareIds.get(share);
    if (shareId === undefined) {
      shareId = shareList.length;
      shareIds.set(share, shareId);
      shareList.push(share);
    }
    const block = mats.blocks[mats.position[k] ?? -1];
    const vertical = block?.type === 'mat' && block.bitlineAxis === 'vertical';
    // Numeric keys: the bank, mat k, or a band (its start in BAND_GRID steps, with the bit-line axis).
    let key: number;
    if (settings.repairDomain === 'bank') key = 0;
    else if (settings.repairDomain === 'mat' || !block) key = k;
    else key = 2 * Math.round((vertical ? block.y : block.x) / BAND_GRID) + (vertical ? 1 : 0);
    let rowDomain = rowIndex.get(key);
    if (rowDomain === undefined) {
      rowDomain = rowDomainRows.length;
      rowIndex.set(key, rowDomain);
      rowDomainRows.push(0);
      rowArea.push(0);
    }
    const rowOffset = rowDomainRows[rowDomain] as number;
    rowDomainRows[rowDomain] = rowOffset + share.rows;
    rowArea[rowDomain] = (rowArea[rowDomain] as number) + share.area;

    const from = mats.servingOffsets[3 * k] ?? 0;
    const to = mats.servingOffsets[3 * k + 1] ?? 0;
    const stripCount = to - from;
    const push = (columnDomain: number, columnOffset: number, columns: number, side: number) => {
      const part = stripCount === 0 ? 1 : 1 / stripCount;
      const i = tiles.push(
        { rowDomain, rowOffset, rows: share.rows, columnDomain, columnOffset, columns },
        share.defects,
        share.parametric,
        part,
      );
      tileSide[i] = side;
      tileShare[i] = shareId;
      tileStrips[i] = stripCount;
    };
    if (stripCount === 0) {
      lonely.push({ index: columnDomains, columns: share.columns, area: share.area });
      push(columnDomains++, 0, share.columns, 0);
      continue;
    }
    const columns = share.columns / stripCount;
    for (let p = from; p < to; p++) {
      const position = mats.servingPositions[p] as number;
      const strip = mats.blocks[position];
      let sides = strips.get(position);
      if (!sides) {
        const stripArea = strip && strip.type !== 'mat' ? strip.width * strip.height : 0;
        sides = { index: columnDomains++, columns: [0, 0], cellArea: [0, 0], stripArea };
        strips.set(position, sides);
      }
      // The mat lies after the strip (side 1) when its start is beyond the strip's middle on the bit-line axis.
      let side: 0 | 1 = 0;
      if (strip && block && strip.type !== 'mat') {
        const middle = vertical ? strip.y + strip.height / 2 : strip.x + strip.width / 2;
        if ((vertical ? block.y : block.x) > middle) side = 1;
      }
      push(sides.index, sides.columns[side], columns, side);
      sides.columns[side] += columns;
      sides.cellArea[side] += share.area / stripCount;
    }
  }
  const columnDomainColumns = new Array<number>(columnDomains).fill(0);
  const spareColumnArea = new Array<number>(columnDomains).fill(0);
  for (const s of strips.values()) {
    const n = Math.max(s.columns[0], s.columns[1]);
    columnDomainColumns[s.index] = n;
    let area = n > 0 ? s.stripArea / n : 0;
    for (const side of [0, 1] as const) {
      if (s.columns[side] > 0) area += s.cellArea[side] / s.columns[side];
    }
    spareColumnArea[s.index] = area;
  }
  for (const m of lonely) {
    columnDomainColumns[m.index] = m.columns;
    spareColumnArea[m.index] = m.columns > 0 ? m.area / m.columns : 0;
  }
  const layout: RepairLayout = { rowDomainRows, columnDomainColumns, tiles: tiles.finish() };
  const faults = domainFaults(layout);
  const columnShare = splitPlanShares(layout.tiles, tileSide, settings.spareColumns);
  // Each row domain's tiles as kinds: (mat share, strips of its mat, spare columns set aside) → count.
  // A kind as one number: (share id · 1024 + strips of the mat) · 1024 + spare columns set aside (≤ 256).
  const kindsOfRowDomain: Map<number, number>[] = rowDomainRows.map(() => new Map());
  for (let i = 0; i < tileCount; i++) {
    const kinds = kindsOfRowDomain[layout.tiles.rowDomain[i] as number];
    const kind =
      ((tileShare[i] as number) * 1024 + Math.min(1023, tileStrips[i] as number)) * 1024 +
      (columnShare[i] as number);
    kinds?.set(kind, (kinds.get(kind) ?? 0) + 1);
  }
  const mixes = kindsOfRowDomain.map((kinds) =>
    [...kinds.entries()]
      .sort(([a], [b]) => a - b)
      .map(([kind, count]): TileShare => {
        const columnSpares = kind % 1024;
        const stripCount = Math.floor(kind / 1024) % 1024;
        const shareId = Math.floor(kind / (1024 * 1024));
        const share = shareList[shareId] as MatShare;
        const part = stripCount === 0 ? 1 : 1 / stripCount;
        return {
          count,
          defectCells: share.defects.cells * part,
          parametricCells: share.parametric.cells * part,
          defectColumns: share.defects.columns * part,
          parametricColumns: share.parametric.columns * part,
          columnSpares,
        };
      }),
  );
  const spareRowArea = rowArea.map((a, d) => {
    const rows = rowDomainRows[d] as number;
    return rows > 0 ? a / rows : 0;
  });
  return {
    rowClasses: classesOf(faults.rows, spareRowArea, mixes),
    columnClasses: classesOf(faults.columns, spareColumnArea),
    layout,
  };
}

/**
 * The split plan's shares: each strip's C spare columns divided among its tiles, the side before the strip
 * first, then in tile order (splitShare). Sorted once by (strip, side, tile) as numeric keys.
 */
function splitPlanShares(tiles: RepairTiles, side: Uint8Array, spareColumns: number): Int32Array {
  const n = tiles.count;
  const keys = new Float64Array(n);
  for (let i = 0; i < n; i++) keys[i] = ((tiles.columnDomain[i] as number) * 2 + (side[i] as number)) * n + i;
  keys.sort();
  const shares = new Int32Array(n);
  let start = 0;
  while (start < n) {
    const strip = Math.floor(Math.floor((keys[start] as number) / n) / 2);
    let end = start + 1;
    while (end < n && Math.floor(Math.floor((keys[end] as number) / n) / 2) === strip) end++;
    for (let k = start; k < end; k++) {
      shares[(keys[k] as number) % n] = splitShare(spareColumns, end - start, k - start);
    }
    start = end;
  }
  return shares;
}

/** A grid of identical mats as gridFloorplan lays it out: its shape and strips. */
export interface GridRepairShape {
  readonly matRows: number;
  readonly matColumns: number;
  /** Area of one sense-amplifier strip (one mat wide) (m²). */
  readonly stripArea: number;
}

/**
 * The repair plan of a grid of identical mats with a sense-amplifier strip above and below every mat (the
 * inner strips shared by the mats on both sides), as reportRepairPlan finds it in such a floorplan, in
 * classes only (the explorer's closed form needs no tiles).
 */
export function gridRepairPlan(
  shape: GridRepairShape,
  settings: RepairSettings,
  share: MatShare,
): RepairPlan {
  const { matRows, matColumns } = shape;
  const mats = matRows * matColumns;
  const rowDomains =
    settings.repairDomain === 'mat' ? mats : settings.repairDomain === 'matRow' ? matRows : Math.min(1, mats);
  const perRowDomain = rowDomains > 0 ? mats / rowDomains : 0;
  const rowDomain: DomainFaults = {
    lines: perRowDomain * share.rows,
    defectLines: perRowDomain * share.defects.rows,
    parametricLines: perRowDomain * share.parametric.rows,
    defectCells: perRowDomain * share.defects.cells,
    parametricCells: perRowDomain * share.parametric.cells,
  };
  const half = share.columns / 2;
  // A strip senses half the columns of each mat beside it: one mat at the edges, two inside.
  const strip = (sides: number): DomainFaults => ({
    lines: half,
    defectLines: sides * 0.5 * share.defects.columns,
    parametricLines: sides * 0.5 * share.parametric.columns,
    defectCells: sides * 0.5 * share.defects.cells,
    parametricCells: sides * 0.5 * share.parametric.cells,
  });
  const spareColumnArea = (sides: number) =>
    half > 0 ? shape.stripArea / half + sides * (share.area / 2 / half) : 0;
  const columnClasses: RepairDomainClass[] = [];
  if (mats > 0) {
    columnClasses.push({ count: 2 * matColumns, domain: strip(1), spareArea: spareColumnArea(1) });
    if (matRows > 1) {
      columnClasses.push({
        count: (matRows - 1) * matColumns,
        domain: strip(2),
        spareArea: spareColumnArea(2),
      });
    }
  }
  const C = settings.spareColumns;
  // Split plan shares: an edge strip gives all C to its one mat; an inner strip ⌈C/2⌉ to the mat above
  // it (before it) and ⌊C/2⌋ to the mat below. Mat r meets strip r above it and strip r + 1 below it.
  const tileOf = (columnSpares: number): Omit<TileShare, 'count'> => ({
    defectCells: share.defects.cells * 0.5,
    parametricCells: share.parametric.cells * 0.5,
    defectColumns: share.defects.columns * 0.5,
    parametricColumns: share.parametric.columns * 0.5,
    columnSpares,
  });
  const matTiles = (r: number) => [
    tileOf(r === 0 ? C : splitShare(C, 2, 1)),
    tileOf(r === matRows - 1 ? C : splitShare(C, 2, 0)),
  ];
  // Mat rows differ only as first, inner or last: each kind once, weighted by its rows (whole numbers, so
  // the counts are the same sums as row by row, and classes appear in the same order).
  const rowKinds: [row: number, rows: number][] = [[0, 1]];
  if (matRows > 2) rowKinds.push([1, matRows - 2]);
  if (matRows > 1) rowKinds.push([matRows - 1, 1]);
  const mixOf = (kindsOfRow: readonly [number, number][], matsPerRow: number): TileShare[] => {
    const kinds = new Map<string, { count: number } & Omit<TileShare, 'count'>>();
    for (const [r, weight] of kindsOfRow) {
      for (const t of matTiles(r)) {
        const key = tileKey(t);
        const found = kinds.get(key);
        if (found) found.count += matsPerRow * weight;
        else kinds.set(key, { count: matsPerRow * weight, ...t });
      }
    }
    return [...kinds.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([, k]) => k);
  };
  const rowSpareArea = rowDomain.lines > 0 ? (perRowDomain * share.area) / rowDomain.lines : 0;
  const rowClasses: RepairDomainClass[] = [];
  if (rowDomains > 0 && settings.repairDomain === 'bank') {
    rowClasses.push({
      count: 1,
      domain: rowDomain,
      spareArea: rowSpareArea,
      tiles: mixOf(rowKinds, matColumns),
    });
  } else if (rowDomains > 0) {
    // Mat rows of one kind (first, inner, last) have the same tiles.
    const perMat = settings.repairDomain === 'mat' ? matColumns : 1;
    const matsPerRow = settings.repairDomain === 'mat' ? 1 : matColumns;
    const byMix = new Map<string, RepairDomainClass & { count: number }>();
    for (const [r, weight] of rowKinds) {
      const tiles = mixOf([[r, 1]], matsPerRow);
      const key = tiles.map(tileKey).join(';');
      const found = byMix.get(key);
      if (found) found.count += perMat * weight;
      else byMix.set(key, { count: perMat * weight, domain: rowDomain, spareArea: rowSpareArea, tiles });
    }
    rowClasses.push(...byMix.values());
  }
  return { rowClasses, columnClasses, layout: null };
}
