import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { CHECK_IDS } from '../../src/integrity/checkResult.js';

const root = path.resolve(import.meta.dirname, '..', '..');

describe('check ids', () => {
  it('the schema lists exactly the ids the code reports', () => {
    const schema = JSON.parse(readFileSync(path.join(root, 'docs', 'report.schema.json'), 'utf8'));
    expect(schema.definitions.checkId.enum).toEqual([...CHECK_IDS]);
  });

  it('the README documents every id', () => {
    const readme = readFileSync(path.join(root, 'README.md'), 'utf8');
    for (const id of CHECK_IDS) expect(readme, id).toContain(`| \`${id}\` |`);
  });
});
