import type { RepairMonteCarloRequest, RepairMonteCarloResult } from '../engine';

/** Messages between the app and the repair Monte-Carlo worker. */
export type RepairCommand = {
  readonly type: 'start';
  readonly runId: number;
  readonly request: RepairMonteCarloRequest;
  readonly trials: number;
};

export type RepairReport =
  | { readonly type: 'progress'; readonly runId: number; readonly result: RepairMonteCarloResult }
  | {
      readonly type: 'done';
      readonly runId: number;
      readonly result: RepairMonteCarloResult;
      readonly elapsed: number;
    }
  | { readonly type: 'failed'; readonly runId: number; readonly error: string };

/** Trials per progress message. */
export const REPAIR_CHUNK = 1000;

/**
 * Runs the trials chunk by chunk, handing each running result to `report`; pure, so the worker shell
 * and the tests share it.
 */
export function runRepairChunks(
  command: RepairCommand,
  report: (message: RepairReport) => void,
  simulation: { run(count: number): RepairMonteCarloResult },
): void {
  const started = performance.now();
  let result: RepairMonteCarloResult | undefined;
  for (let done = 0; done < command.trials; done += REPAIR_CHUNK) {
    result = simulation.run(Math.min(REPAIR_CHUNK, command.trials - done));
    if (done + REPAIR_CHUNK < command.trials) report({ type: 'progress', runId: command.runId, result });
  }
  if (!result) result = simulation.run(0);
  report({ type: 'done', runId: command.runId, result, elapsed: (performance.now() - started) / 1000 });
}
