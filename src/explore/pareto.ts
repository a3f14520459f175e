/** Which way an axis is better. */
export type Direction = 'min' | 'max';

/** A point on two axes; non-finite coordinates never join the front. */
export interface Point2 {
  readonly x: number;
  readonly y: number;
}

/**
 * True when `a` dominates `b`: at least as good on both axes and better on one.
 * The textbook definition of Pareto dominance (common practice, no source).
 */
export function dominates(a: Point2, b: Point2, dx: Direction, dy: Direction): boolean {
  const sx = dx === 'min' ? 1 : -1;
  const sy = dy === 'min' ? 1 : -1;
  const ax = sx * a.x;
  const bx = sx * b.x;
  const ay = sy * a.y;
  const by = sy * b.y;
  return ax <= bx && ay <= by && (ax < bx || ay < by);
}

/**
 * Indices of the points no other point dominates, ordered along the x axis from best to worst: the
 * Pareto front, in O(n log n). Points are sorted by x (best first, then y best first); sweeping in that
 * order, a point is on the front when its y beats every y seen at a strictly better x. Equal points are
 * all kept, since neither dominates the other. Kung, Luccio and Preparata, "On finding the maxima of a
 * set of vectors", J. ACM 22(4), 1975 (the two-dimensional case, from memory).
 */
export function paretoFront(points: readonly Point2[], dx: Direction, dy: Direction): number[] {
  const sx = dx === 'min' ? 1 : -1;
  const sy = dy === 'min' ? 1 : -1;
  const order: number[] = [];
  for (let i = 0; i < points.length; i++) {
    const p = points[i];
    if (p && Number.isFinite(p.x) && Number.isFinite(p.y)) order.push(i);
  }
  const key = (i: number) => points[i] ?? { x: Number.NaN, y: Number.NaN };
  order.sort((a, b) => sx * (key(a).x - key(b).x) || sy * (key(a).y - key(b).y));
  const front: number[] = [];
  let bestY = Infinity;
  let g = 0;
  while (g < order.length) {
    // One group of equal x; its first member has the best y of the group.
    const first = order[g] ?? 0;
    const gx = key(first).x;
    const groupBestY = sy * key(first).y;
    let end = g;
    while (end < order.length && key(order[end] ?? 0).x === gx) end++;
    if (groupBestY < bestY) {
      for (let k = g; k < end; k++) {
        const i = order[k] ?? 0;
        if (sy * key(i).y === groupBestY) front.push(i);
      }
      bestY = groupBestY;
    }
    g = end;
  }
  return front;
}
