/**
 * The worker-thread entry of parallel reading (bundled on its own as dist/readingWorker.js):
 * reads each requested file with `readForecastFile`, exactly as the calling thread would, and
 * posts the table back with its typed columns in the transfer list (moved, not copied).
 */
import { parentPort } from 'node:worker_threads';
import { readForecastFile } from '../reading/readForecastFile.js';
import { type ReadReply, type ReadRequest, shipError } from './readingMessages.js';
import { tableBuffers } from './tableTransfer.js';

const port = parentPort;
if (port === null) throw new Error('readingWorker.js runs as a worker thread only');

const reply = (message: ReadReply, transfer: ArrayBuffer[] = []): void =>
  port.postMessage(message, transfer);

port.on('message', (request: ReadRequest) => {
  const { index } = request;
  readForecastFile(request.path, {
    ...request.options,
    ...(request.progress
      ? {
          onProgress: (bytesRead: number, totalBytes: number) =>
            reply({ kind: 'progress', index, bytesRead, totalBytes }),
        }
      : {}),
  }).then(
    (table) => reply({ kind: 'table', index, table }, tableBuffers(table)),
    (error: unknown) => reply({ kind: 'error', index, error: shipError(error) }),
  );
});
