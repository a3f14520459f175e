import type { MatKind } from '../../geometry/blockTable';
import type { MatConnections } from './connectivity';
import type { DesignContext } from './designContext';
import { matPhysics } from './matPhysics';
import type { MatFigures } from './report';

/** What a mat's figures were computed from besides the design-wide values: its kind and connections. */
export interface FiguresRecipe {
  readonly kind: MatKind;
  readonly connections: MatConnections;
}

/** The recipe of every figures object {@link figuresOfKind} made (refigured, matEvaluation.ts, reads them). */
export const recipes = new WeakMap<MatFigures, FiguresRecipe>();

/** A mat's figures from its kind and connections (`c` is copied into the recipe kept with them). */
export function figuresOfKind(kind: MatKind, c: MatConnections, ctx: DesignContext): MatFigures {
  const figures = matPhysics(kind, c, ctx);
  recipes.set(figures, { kind, connections: { ...c } });
  return figures;
}

/** Sense-amplifier ends a mat can have served (0, 1 or 2): the stride of {@link servedFiguresKey}. */
const SENSE_AMP_END_COUNTS = 3;

/**
 * The key under which evaluate() shares one figures object among the mats of a kind whose lines are all
 * served: a number per kind and sense-amplifier ends (a string key, {@link unservedFiguresKey}, for any
 * other mat), so that either way it is one map lookup.
 */
export function servedFiguresKey(kind: number, senseAmpEnds: number): number {
  return SENSE_AMP_END_COUNTS * kind + senseAmpEnds;
}

/** The figures key of a mat that leaves some line unserved: its kind and every count its figures read. */
export function unservedFiguresKey(kind: number, c: MatConnections): string {
  return `${kind}|${c.senseAmpEnds}|${c.unpartneredBitlines}|${c.unsensedBitlines}|${c.undrivenWordlines}`;
}
