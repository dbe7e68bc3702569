import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const FIXTURES = join(
  dirname(fileURLToPath(import.meta.url)),
  '..',
  'reference',
  'fixtures',
);

export interface AdjustmentCase {
  name: string;
  description?: string;
  p: (number | null)[];
  holm: (number | null)[];
  bh: (number | null)[];
}

export interface AdjustmentFixture {
  generator: string;
  source: string;
  cases: AdjustmentCase[];
}

export function loadAdjustmentFixture(file: string): AdjustmentFixture {
  return JSON.parse(readFileSync(join(FIXTURES, file), 'utf8')) as AdjustmentFixture;
}
