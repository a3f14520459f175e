import { DEMO_STRIPS } from '../designs/demoSizes';
import type { StripSizes } from '../designs/partitionPlan';
import { BUILTIN_PROCESSES } from '../model/builtins';
import type { Design } from '../model/design';
import type { ProcessProfile } from '../model/process';
import { steppedValues, type SweepRequest } from './sweep';

/** A range of cell counts to sweep: from, to and step, all whole numbers. */
export interface CountRange {
  readonly from: number;
  readonly to: number;
  readonly step: number;
}

/** What the explorer sweeps, as people set it; turned into a SweepRequest against the active design. */
export interface SweepSettings {
  readonly targetBits: number;
  readonly strips: StripSizes;
  readonly cellsPerBitline: CountRange;
  readonly cellsPerWordline: CountRange;
  /** Ids of the active design's cells to sweep. */
  readonly cellIds: readonly string[];
  /** Process choices to sweep: {@link DESIGN_PROCESS} for the active design's own, or a built-in id. */
  readonly processIds: readonly string[];
  /** Spare rows and columns per repair domain to sweep (yield figures), or null to leave yield out. */
  readonly spares: { readonly rows: CountRange; readonly columns: CountRange } | null;
}

/** Spares swept when someone turns the spare sweep on. */
export const DEFAULT_SPARE_SWEEP = {
  rows: { from: 0, to: 4, step: 1 },
  columns: { from: 0, to: 4, step: 1 },
};

/** The process choice that means "the active design's process, as edited". */
export const DESIGN_PROCESS = 'design';

/** Capacities offered for a bank (bits). */
export const TARGET_CAPACITIES: readonly number[] = [4, 16, 64, 256, 1024, 4096].map((m) => m * 2 ** 20);

export function defaultSweepSettings(design: Design): SweepSettings {
  return {
    targetBits: 64 * 2 ** 20,
    // Periphery of the invented demo bank.
    strips: DEMO_STRIPS,
    cellsPerBitline: { from: 64, to: 1024, step: 64 },
    cellsPerWordline: { from: 128, to: 2048, step: 128 },
    cellIds: design.cells.map((c) => c.id),
    processIds: processChoices(design).map((c) => c.id),
    spares: null,
  };
}

/** The processes a sweep can use: the design's own first, then the built-ins it is not. */
export function processChoices(design: Design): { id: string; label: string; process: ProcessProfile }[] {
  return [
    { id: DESIGN_PROCESS, label: `${design.process.name} (this design)`, process: design.process },
    ...BUILTIN_PROCESSES.filter((p) => p.id !== design.process.id).map((p) => ({
      id: p.id,
      label: p.name,
      process: p,
    })),
  ];
}

export function rangeValues(range: CountRange): number[] {
  return steppedValues(range.from, range.to, range.step);
}

/** The request for the worker: the settings resolved against the active design (its cells, process, operating conditions). */
export function sweepRequestFor(settings: SweepSettings, design: Design): SweepRequest {
  const processes = processChoices(design)
    .filter((c) => settings.processIds.includes(c.id))
    .map((c) => c.process);
  return {
    targetBits: settings.targetBits,
    strips: settings.strips,
    operating: design.operating,
    cellsPerBitline: rangeValues(settings.cellsPerBitline),
    cellsPerWordline: rangeValues(settings.cellsPerWordline),
    cells: design.cells.filter((c) => settings.cellIds.includes(c.id)),
    processes,
    ...(settings.spares
      ? { spares: { rows: spareValues(settings.spares.rows), columns: spareValues(settings.spares.columns) } }
      : {}),
  };
}

/** Spare counts of a range (0 allowed, unlike cell counts). */
export function spareValues(range: CountRange): number[] {
  return steppedValues(range.from, range.to, range.step);
}
