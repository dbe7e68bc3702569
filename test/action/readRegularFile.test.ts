import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { readRegularFile } from '../../src/action/readRegularFile.js';
import { InputError } from '../../src/core/inputError.js';

const dir = mkdtempSync(path.join(tmpdir(), 'skillgate-regular-'));
const label = "input 'report-file'";

describe('readRegularFile', () => {
  it('reads a regular file', async () => {
    const file = path.join(dir, 'ok.json');
    writeFileSync(file, '{"a":1}');
    await expect(readRegularFile(file, 100, label)).resolves.toBe('{"a":1}');
  });

  it('refuses a symbolic link, a directory, a FIFO, a missing and an oversized file', async () => {
    const target = path.join(dir, 'target.json');
    writeFileSync(target, '{}');
    const link = path.join(dir, 'link.json');
    symlinkSync(target, link);
    const folder = path.join(dir, 'folder');
    mkdirSync(folder);
    const fifo = path.join(dir, 'fifo');
    execFileSync('mkfifo', [fifo]);
    const big = path.join(dir, 'big.json');
    writeFileSync(big, 'x'.repeat(101));
    const refusal = async (file: string) => {
      const error = await readRegularFile(file, 100, label).catch((e: unknown) => e);
      expect(error).toBeInstanceOf(InputError);
      return (error as InputError).describe();
    };
    expect(await refusal(link)).toContain('is a symbolic link');
    expect(await refusal(folder)).toContain('is not a regular file');
    expect(await refusal(fifo)).toContain('is not a regular file');
    expect(await refusal(path.join(dir, 'missing.json'))).toContain('cannot read the file');
    expect(await refusal(big)).toContain('larger than 100 bytes');
  });
});
