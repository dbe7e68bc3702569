import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from './cliHelpers.js';

describe('CLI error messages in a run: step', () => {
  it('a series name cannot emit a workflow command through an error message', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'skillgate-cli-escape-'));
    const name = 'zone\n::error title=forged::PASS\r\n::add-mask::x';
    const header = 'series,timestamp,actual,prediction';
    // The same key twice: the message quotes the series name.
    const rows = [header, `"${name}",1,1,1`, `"${name}",1,1,2`, `"${name}",2,1,1`];
    const file = path.join(dir, 'dup.csv');
    writeFileSync(file, `${rows.join('\n')}\n`);
    const result = runCli(['compare', '--baseline', file, '--candidate', file]);
    expect(result.status).toBe(2);
    const lines = result.stderr.split('\n').filter((l) => l !== '');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^skillgate: /);
    expect(result.stderr + result.stdout).not.toMatch(/^::/m);
    expect(lines[0]).toContain('zone\\n::error title=forged::PASS\\r\\n::add-mask::x');
  });
});
