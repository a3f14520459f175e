/**
 * The repair structure of one floorplan copy: which word lines share a pool of spare rows (row-repair
 * domains: a mat, a mat row or the whole floorplan) and which bit-line columns share a pool of spare
 * columns (column-repair domains: the sense amplifiers of one sense-amplifier strip segment and the
 * bit-line pairs they serve, on one or both sides of the strip). A tile is where one mat meets one of its
 * strips: the mat's rows, and the share of its columns that strip senses. Faults land on tiles; a word
 * line spans every tile of its mat. Plain numbers, SI units.
 */
import type { FaultCounts } from './faultRates';

/** One mat's share of one column-repair domain. */
export interface RepairTile {
  /** Row-repair domain of the mat, and the mat's first word line in that domain's numbering. */
  readonly rowDomain: number;
  readonly rowOffset: number;
  /** Word lines of the mat. */
  readonly rows: number;
  /** Column-repair domain (strip segment), and the tile's first column in the strip's numbering. */
  readonly columnDomain: number;
  readonly columnOffset: number;
  /** Columns of the mat that this strip senses. */
  readonly columns: number;
  /** Expected defect faults in the tile (they share the die's clustered defect density). */
  readonly defects: FaultCounts;
  /** Expected parametric faults in the tile (failing sense amplifiers, weak cells; independent). */
  readonly parametric: FaultCounts;
}

/**
 * The tiles of a layout, column-wise (typed arrays: a 65,536-mat floorplan has 131,072 tiles, which a
 * worker message then copies in milliseconds instead of cloning as many objects). Tile i's expected faults
 * are faults[6i … 6i + 5]: defect cells, rows, columns, then parametric cells, rows, columns.
 */
export interface RepairTiles {
  readonly count: number;
  readonly rowDomain: Int32Array;
  readonly rowOffset: Float64Array;
  readonly rows: Float64Array;
  readonly columnDomain: Int32Array;
  readonly columnOffset: Float64Array;
  readonly columns: Float64Array;
  readonly faults: Float64Array;
}

export interface RepairLayout {
  /** Word lines of each row-repair domain (a spare row replaces any one of them). */
  readonly rowDomainRows: readonly number[];
  /** Columns of each column-repair domain (a spare column replaces any one of them). */
  readonly columnDomainColumns: readonly number[];
  readonly tiles: RepairTiles;
}

/** Offsets of the fault kinds within a tile's six entries of RepairTiles.faults. */
export const TILE_DEFECT = 0;
export const TILE_PARAMETRIC = 3;

/** Fills RepairTiles tile by tile. */
export class RepairTilesBuilder {
  private readonly tiles: RepairTiles;
  private used = 0;
  constructor(capacity: number) {
    this.tiles = {
      count: capacity,
      rowDomain: new Int32Array(capacity),
      rowOffset: new Float64Array(capacity),
      rows: new Float64Array(capacity),
      columnDomain: new Int32Array(capacity),
      columnOffset: new Float64Array(capacity),
      columns: new Float64Array(capacity),
      faults: new Float64Array(6 * capacity),
    };
  }
  /** Appends a tile whose faults are `part` of the given counts; returns its index. */
  push(
    tile: Omit<RepairTile, 'defects' | 'parametric'>,
    defects: FaultCounts,
    parametric: FaultCounts,
    part = 1,
  ): number {
    const i = this.used++;
    const t = this.tiles;
    t.rowDomain[i] = tile.rowDomain;
    t.rowOffset[i] = tile.rowOffset;
    t.rows[i] = tile.rows;
    t.columnDomain[i] = tile.columnDomain;
    t.columnOffset[i] = tile.columnOffset;
    t.columns[i] = tile.columns;
    const f = t.faults;
    f[6 * i] = defects.cells * part;
    f[6 * i + 1] = defects.rows * part;
    f[6 * i + 2] = defects.columns * part;
    f[6 * i + 3] = parametric.cells * part;
    f[6 * i + 4] = parametric.rows * part;
    f[6 * i + 5] = parametric.columns * part;
    return i;
  }
  finish(): RepairTiles {
    if (this.used !== this.tiles.count)
      throw new Error(`${this.used} of ${this.tiles.count} repair tiles filled`);
    return this.tiles;
  }
}

/** Tiles from a list (tests, small layouts). */
export function repairTiles(list: readonly RepairTile[]): RepairTiles {
  const builder = new RepairTilesBuilder(list.length);
  for (const t of list) builder.push(t, t.defects, t.parametric);
  return builder.finish();
}

/** Tile i as one object (tests, explanations). */
export function tileAt(tiles: RepairTiles, i: number): RepairTile {
  const f = tiles.faults;
  return {
    rowDomain: tiles.rowDomain[i] as number,
    rowOffset: tiles.rowOffset[i] as number,
    rows: tiles.rows[i] as number,
    columnDomain: tiles.columnDomain[i] as number,
    columnOffset: tiles.columnOffset[i] as number,
    columns: tiles.columns[i] as number,
    defects: { cells: f[6 * i] as number, rows: f[6 * i + 1] as number, columns: f[6 * i + 2] as number },
    parametric: {
      cells: f[6 * i + 3] as number,
      rows: f[6 * i + 4] as number,
      columns: f[6 * i + 5] as number,
    },
  };
}

/**
 * Expected faults of one repair domain: its lines, the line faults of its own kind and the single-cell
 * faults inside it (each repairable by a spare row of its row domain or a spare column of its strip).
 */
export interface DomainFaults {
  readonly lines: number;
  readonly defectLines: number;
  readonly parametricLines: number;
  readonly defectCells: number;
  readonly parametricCells: number;
}

/** The row domains and the column domains of a layout with the faults each gathers from its tiles. */
export function domainFaults(layout: RepairLayout): { rows: DomainFaults[]; columns: DomainFaults[] } {
  const rows = layout.rowDomainRows.map((lines) => emptyDomain(lines));
  const columns = layout.columnDomainColumns.map((lines) => emptyDomain(lines));
  const t = layout.tiles;
  const f = t.faults;
  for (let i = 0; i < t.count; i++) {
    const r = rows[t.rowDomain[i] as number];
    const c = columns[t.columnDomain[i] as number];
    if (!r || !c) throw new Error('a repair tile names a domain the layout does not have');
    const cells = f[6 * i] as number;
    const parametricCells = f[6 * i + 3] as number;
    r.defectLines += f[6 * i + 1] as number;
    r.parametricLines += f[6 * i + 4] as number;
    r.defectCells += cells;
    r.parametricCells += parametricCells;
    c.defectLines += f[6 * i + 2] as number;
    c.parametricLines += f[6 * i + 5] as number;
    c.defectCells += cells;
    c.parametricCells += parametricCells;
  }
  return { rows, columns };
}

function emptyDomain(lines: number) {
  return { lines, defectLines: 0, parametricLines: 0, defectCells: 0, parametricCells: 0 };
}

/**
 * A layout whose every domain repairs its own rows and its own columns (row domain i and column domain i
 * cover the same cells, one tile each): the organisation of a mat with its spares inside.
 */
export function sharedDomainLayout(
  count: number,
  rows: number,
  columns: number,
  defects: FaultCounts,
  parametric: FaultCounts,
): RepairLayout {
  const tiles = new RepairTilesBuilder(count);
  for (let i = 0; i < count; i++) {
    tiles.push(
      { rowDomain: i, rowOffset: 0, rows, columnDomain: i, columnOffset: 0, columns },
      defects,
      parametric,
    );
  }
  return {
    rowDomainRows: new Array<number>(count).fill(rows),
    columnDomainColumns: new Array<number>(count).fill(columns),
    tiles: tiles.finish(),
  };
}
