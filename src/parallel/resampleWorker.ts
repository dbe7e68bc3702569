/**
 * The worker-thread entry (bundled on its own as dist/resampleWorker.js): receives shared
 * resampling tasks from `createResamplePool` and works on them until no stream is left. Errors
 * go back on the failure port given in workerData, which the pool reads synchronously.
 */
import { type MessagePort, parentPort, workerData } from 'node:worker_threads';
import { type SharedResampleTask, workOnSharedTask } from './sharedResampleTask.js';

const failures = (workerData as { failures: MessagePort }).failures;

parentPort?.on('message', (task: SharedResampleTask) => {
  try {
    workOnSharedTask(task, (message) => failures.postMessage(message));
  } catch {
    // Already reported on the failure port.
  }
});
