/**
 * The sweep's Web Worker: a thin shell around runSweepRange(), which is pure and tested in Node. It
 * assesses the points chunk by chunk and posts each chunk with the progress as typed-array columns whose
 * buffers it hands over (sweepColumns.ts); the app cancels a sweep by terminating the worker.
 */
import { ProcessCache } from './partitionFigures';
import { runSweepRange, sweepSize } from './sweep';
import { chunkBuffers, encodeSweepChunk, SweepTextTables } from './sweepColumns';
import { SWEEP_CHUNK, type SweepCommand, type SweepReport } from './sweepProtocol';

interface WorkerScope {
  postMessage(message: SweepReport, transfer?: Transferable[]): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<SweepCommand>) => void): void;
}

const scope = self as unknown as WorkerScope;

scope.addEventListener('message', (event) => {
  const command = event.data;
  if (command.type !== 'start') return;
  const { runId, request } = command;
  try {
    const started = performance.now();
    const total = sweepSize(request);
    const cache = new ProcessCache();
    const tables = new SweepTextTables();
    for (let start = 0; start < total; start += SWEEP_CHUNK) {
      const chunk = encodeSweepChunk(runSweepRange(request, start, start + SWEEP_CHUNK, cache), tables);
      scope.postMessage(
        { type: 'progress', runId, done: Math.min(total, start + SWEEP_CHUNK), total, chunk },
        chunkBuffers(chunk),
      );
    }
    scope.postMessage({ type: 'done', runId, total, elapsed: (performance.now() - started) / 1000 });
  } catch (error) {
    scope.postMessage({
      type: 'failed',
      runId,
      error: error instanceof Error ? error.message : String(error),
    });
  }
});
