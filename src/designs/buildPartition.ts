import { gridFloorplan } from './gridFloorplan';
import { formatBits } from '../model/units';
import { BUILTIN_CELLS } from '../model/builtins';
import type { CellDefinition } from '../model/cell';
import { CELL_KIND_LABEL } from '../model/cellBasics';
import { DESIGN_FORMAT, DESIGN_VERSION, type VariantDesign } from '../model/design';
import type { OperatingConditions } from '../model/operating';
import type { ProcessProfile } from '../model/process';
import { planPartition, type PartitionPlan, type StripSizes } from './partitionPlan';

/** Everything needed to turn a partition into a design. */
export interface BuildSpec {
  readonly targetBits: number;
  readonly cell: CellDefinition;
  readonly process: ProcessProfile;
  readonly operating: OperatingConditions;
  readonly cellsPerBitline: number;
  readonly cellsPerWordline: number;
  readonly strips: StripSizes;
  /** Cell library of the new design (the chosen cell is added when missing); the built-ins by default. */
  readonly cells?: readonly CellDefinition[];
  /** Design name; a descriptive one is made up when absent. */
  readonly name?: string;
}

export type BuildResult =
  | { readonly ok: true; readonly design: VariantDesign; readonly plan: PartitionPlan }
  | { readonly ok: false; readonly error: string };

/** The part of a process name before any bracketed remark: "Halden D18". */
export function shortProcessName(process: ProcessProfile): string {
  return process.name.replace(/\s*\(.*$/, '') || process.id;
}

/** "64 Mib bank · 1T1C folded 8F² · 512 × 1024 · Halden D18". */
export function partitionName(spec: BuildSpec): string {
  const name = [
    `${formatBits(spec.targetBits)} bank`,
    spec.cell.name || CELL_KIND_LABEL[spec.cell.kind],
    `${spec.cellsPerBitline} × ${spec.cellsPerWordline}`,
    shortProcessName(spec.process),
  ].join(' · ');
  return name.slice(0, 200);
}

/**
 * Builds a bank as an ordinary, editable design: mats in a grid (bit lines vertical), a sense-amplifier
 * strip between every two mat rows and at the top and bottom (shared by the mats on both sides: open
 * arrays pair a bit line above with one below, folded arrays alternate their amplifiers between the two
 * ends of each mat), a sub-word-line driver strip between every two mat columns and at both sides, the
 * row decoder along the left edge and the column decoder along the bottom. The grid is the one
 * {@link planPartition} chooses to reach the target capacity in usable bits.
 */
export function buildPartition(spec: BuildSpec): BuildResult {
  const planned = planPartition({
    targetBits: spec.targetBits,
    cell: spec.cell,
    featureSize: spec.process.featureSize,
    cellsPerBitline: spec.cellsPerBitline,
    cellsPerWordline: spec.cellsPerWordline,
    strips: spec.strips,
  });
  if (!planned.ok) return planned;
  const plan = planned.plan;
  const library = spec.cells ?? BUILTIN_CELLS;
  const known = library.find((c) => c.id === spec.cell.id);
  // A library cell with the same id but other values would silently change the physics: take the spec's.
  const cells = known ? library.map((c) => (c.id === spec.cell.id ? spec.cell : c)) : [...library, spec.cell];
  const blocks = gridFloorplan({
    cell: spec.cell,
    featureSize: spec.process.featureSize,
    matRows: plan.matRows,
    matColumns: plan.matColumns,
    cellsPerBitline: spec.cellsPerBitline,
    cellsPerWordline: spec.cellsPerWordline,
    senseAmpStripHeight: spec.strips.senseAmpStripHeight,
    wordlineDriverStripWidth: spec.strips.wordlineDriverStripWidth,
    rowDecoderWidth: spec.strips.rowDecoderWidth,
    columnDecoderHeight: spec.strips.columnDecoderHeight,
  });
  return {
    ok: true,
    plan,
    design: {
      format: DESIGN_FORMAT,
      version: DESIGN_VERSION,
      name: spec.name?.trim().slice(0, 200) || partitionName(spec),
      lengthUnit: 'm',
      process: { ...spec.process },
      operating: { ...spec.operating },
      cells: cells.map((c) => ({ ...c })),
      blocks,
    },
  };
}
