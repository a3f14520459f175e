import { kindAt, MAT_CODE, type BlockTable, type MatKind } from '../../../src/geometry/blockTable';
import type { NeighbourTable } from '../../../src/geometry/neighbourRows';
import type { Design } from '../../../src/model/design';
import { matIndexByPosition } from '../../../src/engine/evaluation/decoderReach';
import { designContext, type DesignContext } from '../../../src/engine/evaluation/designContext';
import { evaluationNeighbours } from '../../../src/engine/evaluation/evaluate';
import { layoutState } from '../../../src/engine/evaluation/layoutFindings';
import { matPhysics, senseAmpsOfMat } from '../../../src/engine/evaluation/matPhysics';
import { pairsAcrossStrips } from '../../../src/engine/evaluation/openBitline';
import { findPositionedOverlaps } from '../../../src/engine/evaluation/overlaps';
import type { MatFigures, Report } from '../../../src/engine/evaluation/report';
import { blockTable } from './blockTable';
import { collectFindings } from './checks';
import { emptyConnections, matConnections } from './connectivity';
import { OracleMatTableBuilder } from './matTableBuilder';
import { computeTotals } from './totals';

/**
 * evaluate() as it was before its block table, counts, mat loop, totals and findings were made cheaper
 * for a first call (session of issue 11, "cold"): the fast forms are compared with this on random
 * floorplans and must give the same report, bit for bit. The neighbour pass, overlaps and layout checks
 * are shared with src (they have oracles of their own).
 */
export function oracleEvaluate(design: Design): Report {
  const table = blockTable(design);
  const neighbours = evaluationNeighbours(table);
  const senseAmpCount = countSenseAmps(table);
  const ctx = designContext(design.process, design.operating, senseAmpCount, countCells(table));
  const builder = new OracleMatTableBuilder(design.blocks, countMats(table));
  evaluateAllMats(table, neighbours, ctx, builder);
  const mats = builder.finish();
  const overlaps = findPositionedOverlaps(table, neighbours);
  const totals = computeTotals(table, mats, design, ctx, senseAmpCount, overlaps);
  const matIndexAt = matIndexByPosition(mats, table.count);
  const layout = layoutState(table, mats, matIndexAt);
  return {
    mats,
    totals,
    storedHigh: ctx.storedHigh,
    findings: [...collectFindings(mats, overlaps, ctx.storedHigh, design), ...layout.findings],
  };
}

function countSenseAmps(table: BlockTable): number {
  const perKind = new Float64Array(table.kinds.length);
  for (let k = 0; k < perKind.length; k++) perKind[k] = senseAmpsOfMat(table.kinds[k] as MatKind);
  let count = 0;
  for (let i = 0; i < table.count; i++) {
    const kind = table.kindOf[i] as number;
    if (kind >= 0) count += perKind[kind] as number;
  }
  return count;
}

function countCells(table: BlockTable): number {
  let count = 0;
  for (let i = 0; i < table.count; i++) {
    const kind = table.kindOf[i] as number;
    if (kind >= 0) count += (table.kinds[kind] as MatKind).geometry.bits;
  }
  return count;
}

function countMats(table: BlockTable): number {
  let count = 0;
  for (let i = 0; i < table.count; i++) if (table.type[i] === MAT_CODE) count++;
  return count;
}

const connections = emptyConnections();

function evaluateMatAt(
  table: BlockTable,
  at: number,
  neighbours: NeighbourTable,
  ctx: DesignContext,
  mats: OracleMatTableBuilder,
  k: number,
  figuresByKind: Map<number | string, MatFigures>,
  openCell: boolean,
): void {
  const c = matConnections(table, at, neighbours, mats, k, connections, openCell);
  const kindIndex = table.kindOf[at] as number;
  const lost = c.unpartneredBitlines;
  const unsensed = c.unsensedBitlines;
  const undriven = c.undrivenWordlines;
  const key =
    lost === 0 && unsensed === 0 && undriven === 0
      ? kindIndex * 3 + c.senseAmpEnds
      : `${kindIndex}|${c.senseAmpEnds}|${lost}|${unsensed}|${undriven}`;
  let figures = figuresByKind.get(key);
  if (!figures) {
    figures = matPhysics(kindAt(table, at), c, ctx);
    figuresByKind.set(key, figures);
  }
  mats.set(k, at, figures, c.unsensedBitlines, c.undrivenWordlines);
}

function evaluateAllMats(
  table: BlockTable,
  neighbours: NeighbourTable,
  ctx: DesignContext,
  builder: OracleMatTableBuilder,
): void {
  const figuresByKind = new Map<number | string, MatFigures>();
  const openKind = new Uint8Array(table.kinds.length);
  for (let n = 0; n < openKind.length; n++)
    openKind[n] = pairsAcrossStrips((table.kinds[n] as MatKind).cell) ? 1 : 0;
  for (let i = 0, k = 0; i < table.count; i++) {
    if (table.type[i] !== MAT_CODE) continue;
    evaluateMatAt(
      table,
      i,
      neighbours,
      ctx,
      builder,
      k,
      figuresByKind,
      openKind[table.kindOf[i] as number] === 1,
    );
    k++;
  }
}
