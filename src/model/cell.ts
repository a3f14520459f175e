// Cell definitions: their types and plain facts, without the validation library. The schema that checks
// a stored or edited cell is in cellSchema.ts, loaded with restore and the edit check.

export {
  BITLINE_ARCHITECTURES,
  CELL_KINDS,
  CELL_KIND_LABEL,
  cellFootprint,
  cellPitches,
  crossingOccupancy,
  footprintInF2,
  isDifferentialCell,
  isGainCell,
  needsRefresh,
  readsByCurrent,
  seriesReadDevices,
  type BitlineArchitecture,
  type CellKind,
} from './cellBasics';
export type { CellDefinition, GainRead } from './cellSchema';
