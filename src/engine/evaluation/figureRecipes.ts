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
