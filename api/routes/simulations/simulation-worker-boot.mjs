// Entry point of every simulation worker thread. On Node 20 a worker does not get tsx's loader
// from `execArgv: ['--import', 'tsx']` (the .ts entry fails with ERR_UNKNOWN_FILE_EXTENSION), so
// this plain module registers tsx in the thread and then loads the TypeScript worker it was given.
import { workerData } from 'node:worker_threads';
import { register } from 'tsx/esm/api';

register();
await import(workerData.entry);
