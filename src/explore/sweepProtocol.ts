import type { SweepRequest } from './sweep';
import type { SweepChunk } from './sweepColumns';

/** Messages between the app and the sweep worker. */
export type SweepCommand = { readonly type: 'start'; readonly runId: number; readonly request: SweepRequest };

export type SweepReport =
  | {
      readonly type: 'progress';
      readonly runId: number;
      readonly done: number;
      readonly total: number;
      /** The chunk's points as columns (sweepColumns.ts); its buffers are transferred, not copied. */
      readonly chunk: SweepChunk;
    }
  | { readonly type: 'done'; readonly runId: number; readonly total: number; readonly elapsed: number }
  | { readonly type: 'failed'; readonly runId: number; readonly error: string };

/** Points per progress message: small enough for a smooth bar, large enough to keep messages few. */
export const SWEEP_CHUNK = 500;
