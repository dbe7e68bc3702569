import { InputError } from '../core/inputError.js';
import type { FoldLayout, FoldSegment } from '../integrity/foldLayout.js';
import { delimiterFor } from './inputFormat.js';
import { Tokenizer } from './tokenizer.js';

/** Header names of the fold layout file; the fold column may also be called "path". */
const FOLD_NAMES = ['fold', 'path'];
const REQUIRED = ['role', 'start', 'end'] as const;
/** More segments than this are refused: a fold layout is small, a huge one is hostile. */
export const MAX_SEGMENTS = 10_000;

/**
 * Pure reader of a fold layout file (CSV, or TSV with format 'tsv'): a header naming `fold`
 * (or `path`), `role`, `start`, `end` in any order, then one row per segment; role is `train` or
 * `test`; start and end are timestamps written like the predictions files' (both ends
 * included). Several rows per fold are allowed (k-fold schemes train on both sides of the test
 * window). Other columns are ignored. Every problem is an InputError naming file, line and value.
 */
export class FoldLayoutReader {
  private readonly tokenizer: Tokenizer;
  private readonly file: string;
  private index: Map<string, number> | null = null;
  private readonly segments: FoldSegment[] = [];

  constructor(file: string, format: 'csv' | 'tsv') {
    this.file = file;
    this.tokenizer = new Tokenizer(
      delimiterFor('auto', format === 'tsv'),
      (fields, count, line) => this.record(fields.slice(0, count), line),
      file,
    );
  }

  push(chunk: string | Uint8Array): void {
    this.tokenizer.push(chunk);
  }

  finish(): FoldLayout {
    this.tokenizer.end();
    if (this.index === null) {
      throw new InputError('the fold layout is empty (expected a header: fold,role,start,end)', {
        file: this.file,
      });
    }
    if (this.segments.length === 0) {
      throw new InputError('the fold layout has a header but no segments', {
        file: this.file,
        line: 2,
      });
    }
    return { file: this.file, segments: this.segments };
  }

  private record(fields: string[], line: number): void {
    if (this.index === null) {
      const index = new Map<string, number>();
      fields.forEach((name, i) => {
        const key = name.trim().toLowerCase();
        if (!index.has(key)) index.set(key, i);
      });
      const fold = FOLD_NAMES.find((n) => index.has(n));
      for (const name of [...REQUIRED, fold ?? 'fold']) {
        if (!index.has(name)) {
          throw new InputError(
            `the fold layout needs the columns fold (or path), role, start and end; "${name}" is missing`,
            { file: this.file, line, value: fields.join(',') },
          );
        }
      }
      index.set('fold', index.get(fold!)!);
      this.index = index;
      return;
    }
    if (this.segments.length >= MAX_SEGMENTS) {
      throw new InputError(`the fold layout has more than ${MAX_SEGMENTS} segments`, {
        file: this.file,
        line,
      });
    }
    const at = (name: string): string => (fields[this.index!.get(name)!] ?? '').trim();
    const role = at('role');
    if (role !== 'train' && role !== 'test') {
      throw new InputError('role must be train or test', {
        file: this.file,
        line,
        column: 'role',
        value: role,
      });
    }
    for (const name of ['fold', 'start', 'end']) {
      if (at(name) === '') {
        throw new InputError(`empty ${name}`, { file: this.file, line, column: name, value: '' });
      }
    }
    this.segments.push({ fold: at('fold'), role, start: at('start'), end: at('end'), line });
  }
}
