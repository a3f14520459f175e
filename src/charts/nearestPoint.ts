/**
 * Nearest point within a radius, found through a grid of square buckets one radius wide: building it is
 * O(n) and a query looks at the 3 × 3 buckets around the pointer, so hovering stays instant with
 * 100,000 points and the grid can be rebuilt on every update of a running sweep.
 */
export interface NearestIndex {
  /** Index of the closest point within the radius of (x, y), or null. Ties go to the lower index. */
  find(x: number, y: number): number | null;
}

export function nearestIndex(points: readonly (readonly [number, number])[], radius: number): NearestIndex {
  const buckets = new Map<string, number[]>();
  const key = (cx: number, cy: number) => `${cx},${cy}`;
  points.forEach(([x, y], i) => {
    if (!Number.isFinite(x) || !Number.isFinite(y)) return;
    const k = key(Math.floor(x / radius), Math.floor(y / radius));
    const bucket = buckets.get(k);
    if (bucket) bucket.push(i);
    else buckets.set(k, [i]);
  });
  return {
    find(x, y) {
      const cx = Math.floor(x / radius);
      const cy = Math.floor(y / radius);
      let best: number | null = null;
      let bestDistance = radius;
      for (let dx = -1; dx <= 1; dx++) {
        for (let dy = -1; dy <= 1; dy++) {
          for (const i of buckets.get(key(cx + dx, cy + dy)) ?? []) {
            const p = points[i];
            if (!p) continue;
            const d = Math.hypot(p[0] - x, p[1] - y);
            if (d < bestDistance || (d === bestDistance && best !== null && i < best)) {
              best = i;
              bestDistance = d;
            }
          }
        }
      }
      return best;
    },
  };
}
