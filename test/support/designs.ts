import { BUILTIN_CELLS, DEFAULT_OPERATING, DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import type { Block, Mat, Strip } from '../../src/model/block';
import { DESIGN_FORMAT, DESIGN_VERSION, type Design } from '../../src/model/design';
import type { ProcessProfile } from '../../src/model/process';
import type { CellDefinition } from '../../src/model/cell';
import type { OperatingConditions } from '../../src/model/operating';
import { designContext, FULLY_SERVED, matPhysics, senseAmpsOfMat, type MatFigures } from '../../src/engine';
import { matGeometry } from '../../src/geometry/matGeometry';

/** The demo process with some values replaced. */
export function processWith(overrides: Partial<ProcessProfile>): ProcessProfile {
  return { ...DEMO_PROCESS, ...overrides };
}

/** A design around the given blocks, on the demo process unless told otherwise. */
export function designWith(blocks: Block[], process: ProcessProfile = DEMO_PROCESS): Design {
  return {
    format: DESIGN_FORMAT,
    version: DESIGN_VERSION,
    name: 'test design',
    lengthUnit: 'm',
    process,
    operating: { ...DEFAULT_OPERATING },
    cells: BUILTIN_CELLS.map((c) => ({ ...c })),
    blocks,
  };
}

export function mat(overrides: Partial<Mat> = {}): Mat {
  return {
    id: 'm1',
    name: 'M1',
    type: 'mat',
    x: 0,
    y: 0,
    cellId: FOLDED_8F2_CELL.id,
    cellsPerBitline: 512,
    cellsPerWordline: 512,
    bitlineAxis: 'vertical',
    ...overrides,
  };
}

/** A strip of the given type and place (m), named by its id. */
export function strip(
  id: string,
  type: Strip['type'],
  x: number,
  y: number,
  width: number,
  height: number,
): Strip {
  return { id, name: id, type, x, y, width, height };
}

/**
 * The figures of a mat served at both bit-line ends and both word-line ends (as in a tiled array), on its
 * own: the same matPhysics() evaluate() runs, with the die counts of this one mat.
 */
export function servedMatFigures(
  cell: CellDefinition,
  process: ProcessProfile,
  cellsPerBitline: number,
  cellsPerWordline = 512,
  operating: OperatingConditions = DEFAULT_OPERATING,
): MatFigures {
  const block = { cellsPerBitline, cellsPerWordline, bitlineAxis: 'vertical' as const };
  const geometry = matGeometry({ ...mat(), ...block, cellId: cell.id }, cell, process.featureSize);
  const kind = { block, cell, geometry };
  const ctx = designContext(process, operating, senseAmpsOfMat(kind), geometry.bits);
  return matPhysics(kind, FULLY_SERVED, ctx);
}
