// Bootstraps a TypeScript module in a Node worker thread: registers tsx's loader in this thread, then
// imports the module named in workerData.entry.
import { register } from 'tsx/esm/api';
import { workerData } from 'node:worker_threads';

register();
await import(workerData.entry);
