import { z } from 'zod';
import { blockSchema } from './block';
import { cellDefinitionSchema, cellPitches, crossingOccupancy, type CellDefinition } from './cell';
import { operatingConditionsSchema } from './operating';
import { processProfileSchema } from './process';
import { MAX_COORDINATE } from './schemaParts';

/** The name every Matloom design file carries, so that a stray JSON file is recognised as not ours. */
export const DESIGN_FORMAT = 'matloom-design';
/** Current version of the design format; older versions are migrated by io/restore. */
export const DESIGN_VERSION = 1;
/** Most blocks one design may hold: a whole die of small mats with their strips. */
export const MAX_BLOCKS = 300_000;
/** Most variants one document may hold. */
export const MAX_VARIANTS = 32;

/** The fields of one design: everything but its variant shelf. */
const designFields = {
  format: z.literal(DESIGN_FORMAT),
  version: z.literal(DESIGN_VERSION),
  name: z.string().min(1).max(200),
  /** Geometry is stored in metres; stated so that a reader of the file never guesses. */
  lengthUnit: z.literal('m'),
  process: processProfileSchema,
  operating: operatingConditionsSchema,
  cells: z.array(cellDefinitionSchema).min(1).max(100),
  blocks: z.array(blockSchema).max(MAX_BLOCKS),
};

/** Checks that ids are unique, that every mat names a defined cell, and that no mat is absurdly long. */
function checkDesignIds(
  design: {
    process: { featureSize: number };
    cells: readonly CellDefinition[];
    blocks: readonly z.infer<typeof blockSchema>[];
  },
  ctx: z.RefinementCtx,
): void {
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
  const cellsById = new Map(design.cells.map((c) => [c.id, c]));
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
}

/** One inactive variant's design: a whole design without a shelf of its own. */
export const variantDesignSchema = z.object(designFields).superRefine(checkDesignIds);
export type VariantDesign = z.infer<typeof variantDesignSchema>;

/**
 * Named variants of a design (see model/variants.ts). The document is the active variant; the shelf
 * keeps every variant in order, the active one as a null placeholder. Absent means a single variant,
 * so files written before variants existed load unchanged.
 */
export const variantShelfSchema = z
  .object({
    activeId: z.string().min(1).max(80),
    entries: z
      .array(z.object({ id: z.string().min(1).max(80), design: variantDesignSchema.nullable() }))
      .min(1)
      .max(MAX_VARIANTS),
  })
  .superRefine((shelf, ctx) => {
    const ids = new Set<string>();
    shelf.entries.forEach((entry, index) => {
      if (ids.has(entry.id)) {
        ctx.addIssue({
          code: 'custom',
          path: ['entries', index, 'id'],
          message: `duplicate variant id "${entry.id}"`,
        });
      }
      ids.add(entry.id);
      if ((entry.design === null) !== (entry.id === shelf.activeId)) {
        ctx.addIssue({
          code: 'custom',
          path: ['entries', index, 'design'],
          message: 'exactly the active variant is stored as the document itself (design null)',
        });
      }
    });
    if (!ids.has(shelf.activeId)) {
      ctx.addIssue({ code: 'custom', path: ['activeId'], message: `no variant "${shelf.activeId}"` });
    }
  });
export type VariantShelf = z.infer<typeof variantShelfSchema>;

export const designSchema = z
  .object({ ...designFields, variants: variantShelfSchema.optional() })
  .superRefine(checkDesignIds);

export type Design = z.infer<typeof designSchema>;
