/**
 * The repair Monte-Carlo's Web Worker: a thin shell around RepairSimulation (engine/physics), which is
 * pure and tested in Node. It posts the running estimate after each chunk; the app cancels a run by
 * terminating the worker.
 */
import { RepairSimulation } from '../engine';
import { runRepairChunks, type RepairCommand, type RepairReport } from './repairProtocol';

interface WorkerScope {
  postMessage(message: RepairReport): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<RepairCommand>) => void): void;
}

const scope = self as unknown as WorkerScope;

scope.addEventListener('message', (event) => {
  const command = event.data;
  if (command.type !== 'start') return;
  try {
    runRepairChunks(command, (message) => scope.postMessage(message), new RepairSimulation(command.request));
  } catch (error) {
    scope.postMessage({
      type: 'failed',
      runId: command.runId,
      error: error instanceof Error ? error.message : String(error),
    });
  }
});
