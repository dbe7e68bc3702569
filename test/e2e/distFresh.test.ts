import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

const root = path.resolve(import.meta.dirname, '..', '..');
const fresh = mkdtempSync(path.join(tmpdir(), 'skillgate-dist-'));
afterAll(() => rmSync(fresh, { recursive: true, force: true }));

describe('committed dist/', () => {
  it('matches a fresh build byte for byte', () => {
    execFileSync(process.execPath, [path.join(root, 'scripts', 'build.mjs'), fresh], { cwd: root });
    const built = readdirSync(fresh).sort();
    expect(built.length).toBeGreaterThan(0);
    expect(readdirSync(path.join(root, 'dist')).sort()).toEqual(built);
    for (const file of built) {
      const committed = readFileSync(path.join(root, 'dist', file), 'utf8');
      const rebuilt = readFileSync(path.join(fresh, file), 'utf8');
      expect(
        committed === rebuilt,
        `dist/${file} differs from a fresh build: run npm run build`,
      ).toBe(true);
    }
  });
});
