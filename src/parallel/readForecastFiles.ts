/**
 * Reads several forecast files at once (baseline, candidate, actuals): the first in the calling
 * thread, the others on worker threads, each with `readForecastFile` unchanged
 * (readingWorker.ts); the tables come back with their typed columns moved, not copied
 * (tableTransfer.ts). Small inputs stay in the calling thread,
 * where the result is the same and no thread has to start. Either way the tables are those of
 * reading the files one after the other, and so is the error: when several files fail, the one
 * earliest in the given order is reported, as if they had been read in that order.
 */
import { existsSync } from 'node:fs';
import { stat } from 'node:fs/promises';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { ForecastTable } from '../reading/forecastTable.js';
import { type ReadOptions, readForecastFile } from '../reading/readForecastFile.js';
import { type ReadReply, type ReadRequest, rebuildError } from './readingMessages.js';

/**
 * Files are read on worker threads only when at least two of them have this many bytes (as
 * stored). Below it the calling thread reads them one after the other. Measured with
 * `npm run bench` on 2 cores (docs/performance.md, "Reading both files at once"): a reading
 * worker costs 0.05–0.15 s of CPU (thread start, loading its bundle, warming the reader up again),
 * and reading two equal files at once, against one after the other, lost below 8 MiB per file
 * (0.50× at 2 MiB, 0.79× at 8 MiB) and won from 15 MiB (1.18–1.30× at 15–38 MiB). 16 MiB keeps
 * small inputs on one thread, where nothing is lost when the second core is busy with other work.
 */
export const MINIMUM_PARALLEL_FILE_BYTES = 16 * 2 ** 20;

export interface FileToRead {
  readonly path: string;
  readonly options: ReadOptions;
}

export interface ParallelReadingOptions {
  /**
   * Threads to read on at most, the calling thread included; default: available cores. 1 = the
   * calling thread only.
   */
  readonly threads?: number;
  /** See MINIMUM_PARALLEL_FILE_BYTES. */
  readonly minimumFileBytes?: number;
  /**
   * The bundled worker script; default: readingWorker.js next to this module's bundle. When the
   * script is not there (running from the TypeScript sources), the calling thread reads.
   */
  readonly workerUrl?: URL;
}

/** The tables of `files`, in the same order. */
export async function readForecastFiles(
  files: readonly FileToRead[],
  options: ParallelReadingOptions = {},
): Promise<ForecastTable[]> {
  const threads = options.threads ?? availableParallelism();
  const minimum = options.minimumFileBytes ?? MINIMUM_PARALLEL_FILE_BYTES;
  const workerUrl = options.workerUrl ?? new URL('./readingWorker.js', import.meta.url);
  const sizes = await Promise.all(files.map((f) => storedBytes(f.path)));
  const large = sizes.filter((size) => size >= minimum).length;
  if (threads < 2 || large < 2 || !existsSync(fileURLToPath(workerUrl))) {
    const tables: ForecastTable[] = [];
    for (const file of files) tables.push(await readForecastFile(file.path, file.options));
    return tables;
  }
  // The first file in this thread (its error comes first, and ends the others at once); the
  // others on the workers, largest first, so the last file to start is a small one.
  const order = files
    .map((_, i) => i)
    .slice(1)
    .sort((a, b) => sizes[b]! - sizes[a]! || a - b);
  return readOnWorkers(files, order, Math.min(threads - 1, files.length - 1), workerUrl);
}

/** The file's size as stored, or 0 when it cannot be read (reading it will say why). */
async function storedBytes(path: string): Promise<number> {
  try {
    const info = await stat(path);
    return info.isFile() ? info.size : 0;
  } catch {
    return 0;
  }
}

type Outcome = { readonly table: ForecastTable } | { readonly error: Error };

function readOnWorkers(
  files: readonly FileToRead[],
  order: readonly number[],
  workerCount: number,
  workerUrl: URL,
): Promise<ForecastTable[]> {
  return new Promise((resolve, reject) => {
    const outcomes: (Outcome | undefined)[] = files.map(() => undefined);
    const workers: Worker[] = [];
    let next = 0;
    let finished = false;

    const finish = (result: () => void): void => {
      finished = true;
      Promise.all(workers.map((w) => w.terminate())).then(result, result);
    };
    // Done when every file is read, or when the earliest failing file is known.
    const settle = (index: number, outcome: Outcome): void => {
      if (finished || outcomes[index] !== undefined) return;
      outcomes[index] = outcome;
      const tables: ForecastTable[] = [];
      for (const o of outcomes) {
        if (o === undefined) return;
        if ('error' in o) {
          const { error } = o;
          finish(() => reject(error));
          return;
        }
        tables.push(o.table);
      }
      finish(() => resolve(tables));
    };

    const start = (): void => {
      const worker = new Worker(workerUrl);
      workers.push(worker);
      let current = -1;
      const give = (): void => {
        if (next >= order.length) {
          current = -1;
          worker.terminate().catch(() => {});
          return;
        }
        current = order[next++]!;
        const file = files[current]!;
        const { onProgress, ...readOptions } = file.options;
        const request: ReadRequest = {
          index: current,
          path: file.path,
          options: readOptions,
          progress: onProgress !== undefined,
        };
        worker.postMessage(request);
      };
      worker.on('message', (reply: ReadReply) => {
        if (reply.kind === 'progress') {
          files[reply.index]?.options.onProgress?.(reply.bytesRead, reply.totalBytes);
          return;
        }
        settle(
          reply.index,
          reply.kind === 'table' ? { table: reply.table } : { error: rebuildError(reply.error) },
        );
        if (!finished) give();
      });
      // A worker that dies is a bug, not an input error: stop everything and say so.
      worker.on('error', (error) => {
        if (!finished) finish(() => reject(error));
      });
      worker.on('exit', (code) => {
        if (current >= 0 && !finished) {
          const error = new Error(`a reading worker stopped (exit code ${code})`);
          finish(() => reject(error));
        }
      });
      give();
    };
    for (let w = 0; w < workerCount; w++) start();
    const first = files[0]!;
    readForecastFile(first.path, first.options).then(
      (table) => settle(0, { table }),
      (error: unknown) =>
        settle(0, { error: error instanceof Error ? error : new Error(String(error)) }),
    );
  });
}
