import { kindAt, type BlockTable } from '../../geometry/blockTable';
import type { NeighbourTable } from '../../geometry/neighbourRows';
import { emptyConnections, matConnections } from './connectivity';
import type { DesignContext } from './designContext';
import { figuresOfKind, recipes, servedFiguresKey, unservedFiguresKey } from './figureRecipes';
import { matPhysics } from './matPhysics';
import type { MatTable, MatTableBuilder } from './matTable';
import type { MatFigures } from './report';

/**
 * One mat at a time, for the edit path (a live preview evaluates the mats an edit touches); evaluate()
 * connects a whole die at once (servedLines.ts) and shares figures the same way.
 */

/** Filled for one mat at a time and read at once, so one record serves every mat. */
const connections = emptyConnections();

/**
 * The figures `figures` would have under other design-wide values (a floorplan with other sense-amplifier
 * or cell counts moves k and the weakest cell): the same kind and connections, computed with `ctx`.
 * Undefined for figures the engine did not compute.
 */
export function refigured(figures: MatFigures, ctx: DesignContext): MatFigures | undefined {
  const recipe = recipes.get(figures);
  if (!recipe) return undefined;
  const again = matPhysics(recipe.kind, recipe.connections, ctx);
  // The next count-changing edit starts from these.
  recipes.set(again, recipe);
  return again;
}

/**
 * Evaluates mat `at` of the table and records it as mat `k` of the report being built: its connections
 * from its neighbours, then its physics. Mats with the same kind and sense-amplifier arrangement have the
 * same physics, so with a `figuresByKind` map a regular array computes it once per kind of mat and every
 * mat of that kind shares the object.
 */
export function evaluateMatAt(
  table: BlockTable,
  /** The mat's position in the table and in the neighbour table. */
  at: number,
  neighbours: NeighbourTable,
  ctx: DesignContext,
  mats: MatTableBuilder,
  k: number,
  figuresByKind?: Map<number | string, MatFigures>,
  /** Whether the mat's cell pairs bit lines across strips (see matConnections), when known per kind. */
  openCell?: boolean,
): void {
  const c = matConnections(table, at, neighbours, mats, k, connections, openCell);
  const kindIndex = table.kindOf[at] as number;
  const key =
    c.unpartneredBitlines === 0 && c.unsensedBitlines === 0 && c.undrivenWordlines === 0
      ? servedFiguresKey(kindIndex, c.senseAmpEnds)
      : unservedFiguresKey(kindIndex, c);
  let figures = figuresByKind?.get(key);
  if (!figures) {
    figures = figuresOfKind(kindAt(table, at), c, ctx);
    figuresByKind?.set(key, figures);
  }
  setMat(mats, k, at, figures, c.unsensedBitlines, c.undrivenWordlines);
}

/** Records mat k: design position, figures, unserved lines. */
function setMat(
  mats: MatTableBuilder,
  k: number,
  position: number,
  figures: MatFigures,
  unsensed: number,
  undriven: number,
): void {
  mats.position[k] = position;
  mats.figureIndex[k] = mats.indexOfFigures(figures);
  mats.unsensed[k] = unsensed;
  mats.undriven[k] = undriven;
}

/**
 * Records mat k as mat k of `earlier`, a table over the same blocks whose figures `mats` was built with,
 * or with other figures (computed for other design-wide values) and the same position, lines and strips.
 */
export function copyMat(mats: MatTableBuilder, k: number, earlier: MatTable, figures?: MatFigures): void {
  if (figures) {
    setMat(
      mats,
      k,
      earlier.position[k] ?? 0,
      figures,
      earlier.unsensedBitlines[k] ?? 0,
      earlier.undrivenWordlines[k] ?? 0,
    );
  } else {
    mats.position[k] = earlier.position[k] ?? 0;
    mats.figureIndex[k] = earlier.figureIndex[k] ?? 0;
    mats.unsensed[k] = earlier.unsensedBitlines[k] ?? 0;
    mats.undriven[k] = earlier.undrivenWordlines[k] ?? 0;
  }
  const from = earlier.servingOffsets[3 * k] ?? 0;
  const to = earlier.servingOffsets[3 * k + 2] ?? 0;
  const serving = mats.serving;
  const positions = serving.room(to - from);
  const shift = serving.used - from;
  for (let q = 3 * k; q < 3 * k + 3; q++) serving.offsets[q] = (earlier.servingOffsets[q] ?? 0) + shift;
  positions.set(earlier.servingPositions.subarray(from, to), serving.used);
  serving.used += to - from;
}
