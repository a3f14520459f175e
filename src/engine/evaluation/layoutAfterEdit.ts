/**
 * The layout checks after an edit in place (same blocks in the same order): decoder reach and back-to-back
 * strips checked again only around what the edit touched, starting from the state the report before it
 * left. Part of the engine's edit path (engine/editPath.ts), which the app loads after its first paint;
 * the whole-design checks are layoutFindings.ts. Tested against them on random edit chains
 * (test/engine/layoutIncremental.test.ts).
 */
import type { BlockTable } from '../../geometry/blockTable';
import { kindAt } from '../../geometry/blockTable';
import { ABUTMENT_TOLERANCE } from '../../geometry/rect';
import { backToBackStrips, pairFindings, STRIP_CODES, type BackToBackState } from './backToBackStrips';
import { DecoderEdges } from './decoderEdges';
import { hasServing, reachResult, unreachedFinding, type DecoderReachState } from './decoderReach';
import { findingsOf, type LayoutState } from './layoutFindings';
import type { MatTable } from './matTable';
import {
  isReached,
  MOST_PATCHED,
  reachedMats,
  walk,
  type LayoutEdit,
  ServedMats,
  type ReachComponents,
  type ServingPart,
} from './reachComponents';
import { COLUMN_DECODER, seedAt } from './reachSeeds';
import { ALONG_HORIZONTAL_EDGE, ALONG_VERTICAL_EDGE, ServingForest, UNSERVING } from './servingForest';

/**
 * The layout checks after an edit in place (same blocks in the same order), from the state the report
 * before it left: `before` is that report's mat table, `table` and `mats` the edited design's, `near` the
 * table positions within the abutment tolerance of a block of the edited design. Equals
 * {@link layoutState} of the edited design (tested against it on random edit chains).
 */
export function layoutStateAfterEdit(
  previous: LayoutState,
  before: MatTable,
  table: BlockTable,
  mats: MatTable,
  edit: LayoutEdit,
  near: (i: number) => readonly number[],
): LayoutState {
  const reach = decoderReachAfterEdit(previous.reach, before, table, mats, edit);
  // Strips whose place or served mats changed: the changed blocks and what the redone mats listed or list.
  const dirty = new Set<number>(edit.changed);
  for (const k of edit.redone) {
    for (const m of [before, mats]) {
      const to = m.servingOffsets[3 * k + 2] as number;
      for (let p = m.servingOffsets[3 * k] as number; p < to; p++) dirty.add(m.servingPositions[p] as number);
    }
  }
  const servedIn = (part: number) => reach.results.find((r) => r.reach.part === part)?.reach.served;
  const served0 = servedIn(0);
  const served1 = servedIn(1);
  const backToBack =
    served0 && served1
      ? backToBackAfterEdit(previous.backToBack, table, mats, dirty, [served0, served1], near)
      : backToBackStrips(table, mats);
  const same =
    backToBack.findings === previous.backToBack.findings &&
    reach.results.every((r, n) => r.finding === previous.reach.results[n]?.finding);
  return {
    matIndexAt: edit.matIndexAt,
    reach,
    backToBack,
    findings: same ? previous.findings : findingsOf(mats, reach, backToBack),
  };
}

/**
 * The check after an edit in place: only strips the edit moved, or whose served mats it changed (listed
 * before or now by a mat it evaluated again), can gain or lose a partner. Their orientation is read again
 * from the mats serving them, their pairs are dropped and searched again among the strips `near` them
 * (table positions within the abutment tolerance), and every other pair is kept.
 */
function backToBackAfterEdit(
  previous: BackToBackState,
  table: BlockTable,
  mats: MatTable,
  dirty: ReadonlySet<number>,
  served: readonly [ServedMats, ServedMats],
  near: (i: number) => readonly number[],
): BackToBackState {
  const facing = previous.facing.slice();
  for (const s of dirty) facing[s] = orientationOf(table, mats, served, s);
  const pairs = STRIP_CODES.map((code, c) => {
    const kept: number[] = [];
    const old = previous.pairs[c] as Int32Array;
    for (let n = 0; n < old.length; n += 2) {
      const a = old[n] as number;
      const b = old[n + 1] as number;
      if (!dirty.has(a) && !dirty.has(b)) kept.push(a, b);
    }
    for (const s of dirty) {
      if (table.type[s] !== code || facing[s] === UNSERVING) continue;
      for (const j of near(s)) {
        if (j === s || table.type[j] !== code || facing[j] !== facing[s]) continue;
        if (meets(table, facing[s] as number, s, j)) kept.push(s, j);
        // A pair of two dirty strips is found from its first strip.
        if (!dirty.has(j) && meets(table, facing[s] as number, j, s)) kept.push(j, s);
      }
    }
    return inFindingOrder(table, facing, kept);
  });
  const same = pairs.every((p, c) => samePairs(p, previous.pairs[c] as Int32Array));
  // A changed strip the finding names may have a new name.
  const named = pairs.some((p) => p.some((i) => dirty.has(i)));
  return { facing, pairs, findings: same && !named ? previous.findings : pairFindings(table, pairs) };
}

function samePairs(a: Int32Array, b: Int32Array): boolean {
  if (a.length !== b.length) return false;
  for (let n = 0; n < a.length; n++) if (a[n] !== b[n]) return false;
  return true;
}

/**
 * The checks after an edit in place (see {@link LayoutEdit}): components are labelled again only where
 * the edit touched them, and a finding is listed again only when a mat's standing changed or it names a
 * changed block; otherwise the previous finding is kept as it was. A moved decoder changes the seeds of
 * whatever it leaves or meets, so the check of its type is done again whole.
 */
function decoderReachAfterEdit(
  previous: DecoderReachState,
  before: MatTable,
  table: BlockTable,
  mats: MatTable,
  edit: LayoutEdit,
): DecoderReachState {
  let forest: ServingForest | null = null;
  const results = previous.results.map((r) => {
    const { check, edges } = r;
    const full = () => {
      const edges = DecoderEdges.of(table, check.decoderCode);
      const seed = reachSeeds(table, edit.matIndexAt, edges, check.decoderCode, check.stripCode);
      forest ??= ServingForest.of(mats, table);
      return reachResult(mats, edit.matIndexAt, check, edges, seed, forest);
    };
    if (edit.changed.some((i) => table.type[i] === check.decoderCode)) return full();
    const next = reachComponentsAfterEdit(r.reach, before, mats, edit, (i) =>
      seedAt(table, edit.matIndexAt, edges, i, check.decoderCode, check.stripCode),
    );
    if (!next) return full();
    const { reach, relabelled } = next;
    const unreachedBefore = (i: number, k: number) =>
      !isReached(r.reach, i) && hasServing(before, k, check.part);
    const unreachedNow = (i: number, k: number) => !isReached(reach, i) && hasServing(mats, k, check.part);
    let same = true;
    for (const i of relabelled) {
      const k = edit.matIndexAt[i] as number;
      if (k >= 0 && unreachedBefore(i, k) !== unreachedNow(i, k)) {
        same = false;
        break;
      }
    }
    // A changed mat the finding names may have a new name.
    for (const i of edit.changed) {
      const k = edit.matIndexAt[i] as number;
      if (k >= 0 && unreachedNow(i, k)) same = false;
    }
    const finding = same ? r.finding : unreachedFinding(mats, reachedMats(reach, mats), check);
    return { check, edges, reach, finding };
  });
  return { results };
}

/**
 * The components after an edit: only those holding a block the edit changed, a mat it evaluated again or
 * a block such a mat listed before or lists now are labelled again (any edge the edit added or removed
 * has both ends among those blocks, so every other component keeps its blocks and seeds). `seedAt` gives
 * the seed of a changed block. Returns the blocks labelled again beside the new components, or null when
 * the caller should label everything again.
 */
function reachComponentsAfterEdit(
  previous: ReachComponents,
  before: MatTable,
  after: MatTable,
  edit: LayoutEdit,
  seedAt: (i: number) => boolean,
): { readonly reach: ReachComponents; readonly relabelled: ReadonlySet<number> } | null {
  const { part } = previous;
  const touched = new Set<number>(edit.changed);
  for (const k of edit.redone) touched.add(after.position[k] as number);
  const served = servedAfterEdit(previous.served, before, after, part, edit.redone, touched);
  if (!served) return null;
  let seed = previous.seed;
  for (const i of edit.changed) {
    const s = seedAt(i) ? 1 : 0;
    if (seed[i] === s) continue;
    if (seed === previous.seed) seed = seed.slice();
    seed[i] = s;
  }
  // Every block of a touched component is labelled again.
  const relabel = new Set<number>(touched);
  const components = previous.components.slice();
  for (const i of touched) {
    const l = previous.label[i] as number;
    const component = l >= 0 ? components[l] : undefined;
    if (!component) continue;
    for (const m of component.members) relabel.add(m);
    components[l] = undefined;
  }
  const label = previous.label.slice();
  for (const i of relabel) label[i] = -1;
  const { matIndexAt } = edit;
  for (const i of relabel) {
    if ((matIndexAt[i] as number) < 0 || (label[i] as number) >= 0) continue;
    components.push(walk(i, components.length, label, seed, after, matIndexAt, served, part));
  }
  if (components.length > previous.built + MOST_PATCHED) return null;
  return { reach: { part, served, seed, label, components, built: previous.built }, relabelled: relabel };
}

/**
 * The order the whole-table search gives: strips lying across before strips standing, then by the first
 * strip's position, the second's start across, the second's position.
 */
function inFindingOrder(table: BlockTable, facing: Uint8Array, flat: readonly number[]): Int32Array {
  const order: number[] = [];
  for (let n = 0; n < flat.length; n += 2) order.push(n);
  const across = (j: number) =>
    facing[j] === ALONG_HORIZONTAL_EDGE ? (table.y[j] as number) : (table.x[j] as number);
  order.sort((p, q) => {
    const a = flat[p] as number;
    const b = flat[q] as number;
    const c = flat[p + 1] as number;
    const d = flat[q + 1] as number;
    return (facing[a] as number) - (facing[b] as number) || a - b || across(c) - across(d) || c - d;
  });
  const out = new Int32Array(flat.length);
  order.forEach((p, n) => {
    out[2 * n] = flat[p] as number;
    out[2 * n + 1] = flat[p + 1] as number;
  });
  return out;
}

/** True when strip `i`'s far long edge meets strip `j`'s near one and they overlap along the strip. */
function meets(table: BlockTable, orientation: number, i: number, j: number): boolean {
  const lying = orientation === ALONG_HORIZONTAL_EDGE;
  const across = lying ? table.y : table.x;
  const thickness = lying ? table.height : table.width;
  const along = lying ? table.x : table.y;
  const length = lying ? table.width : table.height;
  const edge = (across[i] as number) + (thickness[i] as number);
  const start = across[j] as number;
  if (!(start >= edge - ABUTMENT_TOLERANCE && start <= edge + ABUTMENT_TOLERANCE)) return false;
  const alongStart = along[i] as number;
  const overlap =
    Math.min(alongStart + (length[i] as number), (along[j] as number) + (length[j] as number)) -
    Math.max(alongStart, along[j] as number);
  return overlap > ABUTMENT_TOLERANCE;
}

/**
 * The orientation {@link servedEdgeOrientation} gives strip `s`: that of the last mat in report order
 * serving it, its driver part after its sense-amplifier part.
 */
function orientationOf(
  table: BlockTable,
  mats: MatTable,
  served: readonly [ServedMats, ServedMats],
  s: number,
): number {
  const last = (list: Int32Array) => (list.length === 0 ? -1 : (list[list.length - 1] as number));
  const k0 = last(served[0].mats(s));
  const k1 = last(served[1].mats(s));
  if (k0 < 0 && k1 < 0) return UNSERVING;
  const k = k1 >= k0 ? k1 : k0;
  const vertical = kindAt(table, mats.position[k] as number).block.bitlineAxis === 'vertical';
  if (k1 >= k0) return vertical ? ALONG_VERTICAL_EDGE : ALONG_HORIZONTAL_EDGE;
  return vertical ? ALONG_HORIZONTAL_EDGE : ALONG_VERTICAL_EDGE;
}

/**
 * Where the lines of decoders of type `decoderCode` enter the stack of mats and strips, per table position:
 * the decoders themselves, the strips of type `stripCode` abutting one, and (for column decoders) mats
 * with a bit-line end against one. Found by binary search on the decoders' sorted edges, one pass in all.
 */
function reachSeeds(
  table: BlockTable,
  matIndexAt: Int32Array,
  edges: DecoderEdges | null,
  decoderCode: number,
  stripCode: number,
): Uint8Array {
  const seed = new Uint8Array(table.count);
  if (edges === null) return seed;
  for (const d of edges.decoders) seed[d] = 1;
  const box = edges.reach;
  if (box === null) {
    for (let i = 0; i < table.count; i++)
      if (table.type[i] !== decoderCode && seedAt(table, matIndexAt, edges, i, decoderCode, stripCode))
        seed[i] = 1;
    return seed;
  }
  return seedsInBox(table, matIndexAt, edges, box, decoderCode, stripCode, seed);
}

/**
 * The seeds among blocks that lie at least partly inside the decoders' grown bounding box `box` (the
 * test against {@link DecoderEdges.reach}): one check's seeds, for an edit that checks it again
 * whole ({@link seedsOfChecks} does both checks of a whole evaluation in one pass).
 */
function seedsInBox(
  table: BlockTable,
  matIndexAt: Int32Array,
  edges: DecoderEdges,
  box: Float64Array,
  decoderCode: number,
  stripCode: number,
  seed: Uint8Array,
): Uint8Array {
  const { type, x, y, width, height } = table;
  const left = box[0] as number;
  const top = box[1] as number;
  const right = box[2] as number;
  const bottom = box[3] as number;
  const matsToo = decoderCode === COLUMN_DECODER;
  for (let i = 0; i < table.count; i++) {
    if (type[i] !== stripCode && !(matsToo && (matIndexAt[i] as number) >= 0)) continue;
    const bx = x[i] as number;
    const by = y[i] as number;
    if (bx > right || by > bottom || bx + (width[i] as number) < left || by + (height[i] as number) < top)
      continue;
    if (seedAt(table, matIndexAt, edges, i, decoderCode, stripCode)) seed[i] = 1;
  }
  return seed;
}

/**
 * `served` after the mats `redone` (report indices) were evaluated again: each block one of them listed
 * before or lists now serves the mats it served that were not redone, plus the redone ones that list it
 * now. Returns the blocks whose list was written (`touched`), or null when so many strips are listed
 * again that the caller should build the whole list instead.
 */
function servedAfterEdit(
  served: ServedMats,
  before: MatTable,
  after: MatTable,
  part: ServingPart,
  redone: ReadonlySet<number>,
  touched: Set<number>,
): ServedMats | null {
  const added = new Map<number, number[]>();
  for (const k of redone) {
    const from = before.servingOffsets[3 * k + part] as number;
    const to = before.servingOffsets[3 * k + part + 1] as number;
    for (let p = from; p < to; p++) touched.add(before.servingPositions[p] as number);
    const a = after.servingOffsets[3 * k + part] as number;
    const b = after.servingOffsets[3 * k + part + 1] as number;
    for (let p = a; p < b; p++) {
      const s = after.servingPositions[p] as number;
      touched.add(s);
      const list = added.get(s);
      if (list) list.push(k);
      else added.set(s, [k]);
    }
  }
  if (served.patched.size + touched.size > MOST_PATCHED) return null;
  const patched = new Map(served.patched);
  for (const s of touched) {
    const kept = Array.from(served.mats(s)).filter((k) => !redone.has(k));
    const list = kept.concat(added.get(s) ?? []).sort((a, b) => a - b);
    patched.set(s, Int32Array.from(list));
  }
  return new ServedMats(served.start, served.list, patched);
}
