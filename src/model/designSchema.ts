import { z } from 'zod';
import { blockSchema } from './blockSchema';
import { cellDefinitionSchema, type CellDefinition } from './cellSchema';
import { DESIGN_FORMAT, DESIGN_VERSION, MAX_BLOCKS, MAX_VARIANTS, matLengthProblem } from './design';
import { operatingConditionsSchema } from './operating';
import { processProfileSchema } from './process';
import { clipForMessage } from './messageText';

// The schema of a design document: what restore and the edit check hold every design to.

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
        message: `duplicate cell id "${clipForMessage(cell.id)}"`,
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
        message: `duplicate block id "${clipForMessage(block.id)}"`,
      });
    }
    blockIds.add(block.id);
    if (block.type !== 'mat') return;
    const cell = cellsById.get(block.cellId);
    if (!cell) {
      ctx.addIssue({
        code: 'custom',
        path: ['blocks', index, 'cellId'],
        message: `mat "${clipForMessage(block.id)}" uses cell "${clipForMessage(block.cellId)}", which the design does not define`,
      });
      return;
    }
    const problem = matLengthProblem(block, cell, design.process.featureSize);
    if (problem) ctx.addIssue({ code: 'custom', path: ['blocks', index], message: problem });
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
export const variantShelfSchema = shelfSchemaWith(variantDesignSchema);
export type VariantShelf = z.infer<typeof variantShelfSchema>;

/**
 * The shelf's own rules (ids, order, which entry is the active placeholder) with each stored design
 * checked by `entryDesign`. The edit check passes a schema that accepts any object and checks the
 * designs that changed itself, so that a small edit does not re-validate every variant.
 */
export function shelfSchemaWith(entryDesign: z.ZodType<VariantDesign>) {
  return z
    .object({
      activeId: z.string().min(1).max(80),
      entries: z
        .array(z.object({ id: z.string().min(1).max(80), design: entryDesign.nullable() }))
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
            message: `duplicate variant id "${clipForMessage(entry.id)}"`,
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
        ctx.addIssue({
          code: 'custom',
          path: ['activeId'],
          message: `no variant "${clipForMessage(shelf.activeId)}"`,
        });
      }
    });
}

export const designSchema = z
  .object({ ...designFields, variants: variantShelfSchema.optional() })
  .superRefine(checkDesignIds);

export type Design = z.infer<typeof designSchema>;
