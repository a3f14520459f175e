import type { BlockType } from '../model/block';
import { BLOCK_TYPES } from '../model/blockBasics';

/** Block types in the order of their codes in a block table's `type` (blockTable.ts). */
export const BLOCK_TYPE_CODES: readonly BlockType[] = BLOCK_TYPES;
/** Each block type's code (the index in BLOCK_TYPE_CODES). */
export const CODE_OF = new Map(BLOCK_TYPE_CODES.map((type, code) => [type, code]));
export const MAT_CODE = BLOCK_TYPE_CODES.indexOf('mat');
export const SENSE_AMP_STRIP_CODE = BLOCK_TYPE_CODES.indexOf('senseAmpStrip');
export const WORDLINE_DRIVER_STRIP_CODE = BLOCK_TYPE_CODES.indexOf('wordlineDriverStrip');
export const ROW_DECODER_CODE = BLOCK_TYPE_CODES.indexOf('rowDecoder');
