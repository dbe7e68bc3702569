import { InputError } from '../core/inputError.js';
import type { FoldLayout } from '../integrity/foldLayout.js';
import { FoldLayoutReader } from './foldLayoutReader.js';
import { formatFromPath } from './formatDetection.js';
import { streamTextFile } from './streamTextFile.js';

/** Reads the fold layout file given to `--folds` (CSV or TSV, optionally .gz). */
export async function readFoldLayout(path: string, format?: 'csv' | 'tsv'): Promise<FoldLayout> {
  const implied = formatFromPath(path);
  const chosen = format ?? implied.format;
  if (chosen === 'parquet') {
    throw new InputError('a fold layout file is read as CSV or TSV', { file: path });
  }
  const reader = new FoldLayoutReader(path, chosen);
  await streamTextFile(path, implied.gzip, reader);
  return reader.finish();
}
