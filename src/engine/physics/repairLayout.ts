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

export interface RepairLayout {
  /** Word lines of each row-repair domain (a spare row replaces any one of them). */
  readonly rowDomainRows: readonly number[];
  /** Columns of each column-repair domain (a spare column replaces any one of them). */
  readonly columnDomainColumns: readonly number[];
  readonly tiles: readonly RepairTile[];
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
  for (const t of layout.tiles) {
    const r = rows[t.rowDomain];
    const c = columns[t.columnDomain];
    if (!r || !c) throw new Error('a repair tile names a domain the layout does not have');
    r.defectLines += t.defects.rows;
    r.parametricLines += t.parametric.rows;
    r.defectCells += t.defects.cells;
    r.parametricCells += t.parametric.cells;
    c.defectLines += t.defects.columns;
    c.parametricLines += t.parametric.columns;
    c.defectCells += t.defects.cells;
    c.parametricCells += t.parametric.cells;
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
  const tiles: RepairTile[] = [];
  for (let i = 0; i < count; i++) {
    tiles.push({
      rowDomain: i,
      rowOffset: 0,
      rows,
      columnDomain: i,
      columnOffset: 0,
      columns,
      defects,
      parametric,
    });
  }
  return {
    rowDomainRows: new Array<number>(count).fill(rows),
    columnDomainColumns: new Array<number>(count).fill(columns),
    tiles,
  };
}
