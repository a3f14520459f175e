import { z } from 'zod';
import { blockSchema } from './block';
import { cellDefinitionSchema, cellPitches, crossingOccupancy, type CellDefinition } from './cell';
import { MAX_COORDINATE } from './schemaParts';
import { operatingConditionsSchema } from './operating';
import { processProfileSchema } from './process';

/** The name every Matloom design file carries, so that a stray JSON file is recognised as not ours. */
export const DESIGN_FORMAT = 'matloom-design';
/** Current version of the design format; older versions are migrated by io/restore. */
export const DESIGN_VERSION = 1;
/** Most blocks one design may hold: a whole die of small mats with their strips. */
export const MAX_BLOCKS = 300_000;

export const designSchema = z
  .object({
    format: z.literal(DESIGN_FORMAT),
    version: z.literal(DESIGN_VERSION),
    name: z.string().min(1).max(200),
    /** Geometry is stored in metres; stated so that a reader of the file never guesses. */
    lengthUnit: z.literal('m'),
    process: processProfileSchema,
    operating: operatingConditionsSchema,
    cells: z.array(cellDefinitionSchema).min(1).max(100),
    blocks: z.array(blockSchema).max(MAX_BLOCKS),
  })
  .superRefine((design, ctx) => {
    const cellIds = new Set<string>();
    design.cells.forEach((cell, index) => {
      if (cellIds.has(cell.id)) {
        ctx.addIssue({
          code: 'custom',
          path: ['cells', index, 'id'],
          message: `duplicate cell id "${cell.id}"`,
        });
      }
      cellIds.add(cell.id);
    });
    const cellsById = new Map<string, CellDefinition>(design.cells.map((c) => [c.id, c]));
    const blockIds = new Set<string>();
    design.blocks.forEach((block, index) => {
      if (blockIds.has(block.id)) {
        ctx.addIssue({
          code: 'custom',
          path: ['blocks', index, 'id'],
          message: `duplicate block id "${block.id}"`,
        });
      }
      blockIds.add(block.id);
      if (block.type !== 'mat') return;
      const cell = cellsById.get(block.cellId);
      if (!cell) {
        ctx.addIssue({
          code: 'custom',
          path: ['blocks', index, 'cellId'],
          message: `mat "${block.id}" uses cell "${block.cellId}", which the design does not define`,
        });
        return;
      }
      // A mat's size follows from its cells; keep it within the same bound as positions.
      const { bitlinePitch, wordlinePitch } = cellPitches(cell, design.process.featureSize);
      const occupancy = crossingOccupancy(cell.bitlineArchitecture);
      const longest = Math.max(
        (block.cellsPerBitline / occupancy) * wordlinePitch,
        (block.cellsPerWordline / occupancy) * bitlinePitch,
      );
      if (longest > MAX_COORDINATE) {
        ctx.addIssue({
          code: 'custom',
          path: ['blocks', index],
          message: `mat "${block.id}" would be ${(longest * 1e3).toFixed(1)} mm long; the limit is ${MAX_COORDINATE * 1e3} mm`,
        });
      }
    });
  });

export type Design = z.infer<typeof designSchema>;
