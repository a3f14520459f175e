import { newBlockIdentity } from '../../commands/blockIds';
import type { BitlineAxis, Block, BlockType } from '../../model/block';
import type { Design } from '../../model/design';
import { parseQuantity, type Quantity } from '../../model/units';

/** What the add-block form asks for; every text as typed. Lengths default to micrometres. */
export interface NewBlockForm {
  readonly type: BlockType;
  readonly x: string;
  readonly y: string;
  /** Strips, decoders and spacers. */
  readonly width: string;
  readonly height: string;
  /** Mats: their size follows from the cell and the cell counts. */
  readonly cellsPerBitline: string;
  readonly cellsPerWordline: string;
  readonly cellId: string;
  readonly bitlineAxis: BitlineAxis;
}

export type NewBlockResult =
  | { readonly ok: true; readonly block: Block }
  | { readonly ok: false; readonly errors: Readonly<Partial<Record<keyof NewBlockForm, string>>> };

const BARE_NUMBER = /^\s*[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?\s*$/i;

/** A length as typed in the form: a bare number is in micrometres, anything else goes through units.ts. */
function length(text: string): { value: number } | { error: string } {
  const parsed = parseQuantity(BARE_NUMBER.test(text) ? `${text.trim()} µm` : text, 'length');
  return parsed.ok ? { value: parsed.value } : { error: parsed.error };
}

function count(text: string): { value: number } | { error: string } {
  const parsed = parseQuantity(text, 'count' satisfies Quantity);
  if (!parsed.ok) return { error: parsed.error };
  if (!Number.isInteger(parsed.value) || parsed.value < 1)
    return { error: 'a whole number of cells, 1 or more' };
  return { value: parsed.value };
}

/**
 * The block the form describes, named and numbered like one drawn on the canvas, or what is wrong with
 * each field. Range checks beyond the form's own (largest coordinate, largest cell count, a known cell)
 * are left to the add-block command, which refuses bad blocks with its own message.
 */
export function newBlockFromForm(design: Design, form: NewBlockForm): NewBlockResult {
  const errors: Partial<Record<keyof NewBlockForm, string>> = {};
  const read = <K extends keyof NewBlockForm>(key: K, r: { value: number } | { error: string }) => {
    if ('error' in r) {
      errors[key] = r.error;
      return Number.NaN;
    }
    return r.value;
  };
  const x = read('x', length(form.x));
  const y = read('y', length(form.y));
  if (form.type === 'mat') {
    const cellsPerBitline = read('cellsPerBitline', count(form.cellsPerBitline));
    const cellsPerWordline = read('cellsPerWordline', count(form.cellsPerWordline));
    if (Object.keys(errors).length > 0) return { ok: false, errors };
    return {
      ok: true,
      block: {
        ...newBlockIdentity(design, 'mat'),
        type: 'mat',
        x,
        y,
        cellId: form.cellId,
        cellsPerBitline,
        cellsPerWordline,
        bitlineAxis: form.bitlineAxis,
      },
    };
  }
  const width = read('width', length(form.width));
  const height = read('height', length(form.height));
  if (!(width > 0)) errors.width ??= 'width must be above zero';
  if (!(height > 0)) errors.height ??= 'height must be above zero';
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  return {
    ok: true,
    block: { ...newBlockIdentity(design, form.type), type: form.type, x, y, width, height },
  };
}
