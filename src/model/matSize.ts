import { formatBits, formatQuantity } from './units';

/**
 * A mat's size, said one way everywhere (canvas, properties, tool hint, PNG, CSV, CLI, summary JSON):
 * cells per bit line × cells per word line, the two counts a mat is made of and the ones people type.
 */
export const MAT_SIZE_UNIT = 'cells/BL × cells/WL';

/** "512 × 1,024 cells/BL × cells/WL". */
export function formatMatSize(cellsPerBitline: number, cellsPerWordline: number): string {
  return `${formatQuantity(cellsPerBitline, 'count')} × ${formatQuantity(cellsPerWordline, 'count')} ${MAT_SIZE_UNIT}`;
}

/** "512 × 1,024 cells/BL × cells/WL · 512 Kib": the size and the bits it holds. */
export function formatMatSizeAndBits(
  cellsPerBitline: number,
  cellsPerWordline: number,
  bits: number,
): string {
  return `${formatMatSize(cellsPerBitline, cellsPerWordline)} · ${formatBits(bits)}`;
}
