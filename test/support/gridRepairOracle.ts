/**
 * gridRepairPlan() as it was before it grouped the mat rows by kind (first, inner, last): every mat row on
 * its own. Kept verbatim as the oracle for test/engine/physics/crossedRepairFast.test.ts.
 */
import type { RepairSettings } from '../../src/model/repair';
import type { DomainFaults } from '../../src/engine/physics/repairLayout';
import {
  splitShare,
  type GridRepairShape,
  type MatShare,
  type RepairDomainClass,
  type RepairPlan,
  type TileShare,
} from '../../src/engine/evaluation/repairDomains';

const tileKey = (t: Omit<TileShare, 'count'> & { count?: number }) =>
  `${t.defectCells},${t.parametricCells},${t.defectColumns},${t.parametricColumns},${t.columnSpares}`;

/**
 * The repair plan of a grid of identical mats with a sense-amplifier strip above and below every mat (the
 * inner strips shared by the mats on both sides), as reportRepairPlan finds it in such a floorplan, in
 * classes only (the explorer's closed form needs no tiles).
 */
export function plainGridRepairPlan(
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
  const mixOf = (rs: readonly number[], matsPerRow: number): TileShare[] => {
    const kinds = new Map<string, { count: number } & Omit<TileShare, 'count'>>();
    for (const r of rs) {
      for (const t of matTiles(r)) {
        const key = tileKey(t);
        const found = kinds.get(key);
        if (found) found.count += matsPerRow;
        else kinds.set(key, { count: matsPerRow, ...t });
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
      tiles: mixOf(
        Array.from({ length: matRows }, (_, r) => r),
        matColumns,
      ),
    });
  } else if (rowDomains > 0) {
    // Mat rows of one kind (first, inner, last) have the same tiles.
    const perMat = settings.repairDomain === 'mat' ? matColumns : 1;
    const matsPerRow = settings.repairDomain === 'mat' ? 1 : matColumns;
    const byMix = new Map<string, RepairDomainClass & { count: number }>();
    for (let r = 0; r < matRows; r++) {
      const tiles = mixOf([r], matsPerRow);
      const key = tiles.map(tileKey).join(';');
      const found = byMix.get(key);
      if (found) found.count += perMat;
      else byMix.set(key, { count: perMat, domain: rowDomain, spareArea: rowSpareArea, tiles });
    }
    rowClasses.push(...byMix.values());
  }
  return { rowClasses, columnClasses, layout: null };
}
