/**
 * What the reading worker (readingWorker.ts) and its caller (readForecastFiles.ts) say to each
 * other. A request names one file and the options of `readForecastFile` without the progress
 * callback; the worker answers with progress, then the table or the error. Errors cross the
 * thread boundary as plain data and are rebuilt on the caller's side, so an input error read on a
 * worker is the same `InputError` (message, file, line, column, value) as on one thread.
 */
import { InputError, type InputErrorLocation } from '../core/inputError.js';
import type { ForecastTable } from '../reading/forecastTable.js';
import type { ReadOptions } from '../reading/readForecastFile.js';

export interface ReadRequest {
  readonly index: number;
  readonly path: string;
  readonly options: Omit<ReadOptions, 'onProgress'>;
  /** Whether the caller wants progress messages. */
  readonly progress: boolean;
}

export type ReadReply =
  | {
      readonly kind: 'progress';
      readonly index: number;
      readonly bytesRead: number;
      readonly totalBytes: number;
    }
  | { readonly kind: 'table'; readonly index: number; readonly table: ForecastTable }
  | { readonly kind: 'error'; readonly index: number; readonly error: ShippedError };

export type ShippedError =
  | { readonly input: true; readonly message: string; readonly location: InputErrorLocation }
  | { readonly input: false; readonly message: string; readonly stack: string | undefined };

export function shipError(error: unknown): ShippedError {
  if (error instanceof InputError) {
    return { input: true, message: error.message, location: { ...error.location } };
  }
  if (error instanceof Error) return { input: false, message: error.message, stack: error.stack };
  return { input: false, message: String(error), stack: undefined };
}

export function rebuildError(shipped: ShippedError): Error {
  if (shipped.input) return new InputError(shipped.message, shipped.location);
  const error = new Error(shipped.message);
  if (shipped.stack !== undefined) error.stack = shipped.stack;
  return error;
}
