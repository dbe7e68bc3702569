import { mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
// @ts-expect-error: a plain JavaScript module of the repository (no types)
import { SCENARIOS, writeGoldens } from '../report/golden/goldenScenarios.mjs';
import { root } from './cliHelpers.js';

// The golden comments: the bundled CLI on invented scenarios (fixed seeds) must write exactly
// the committed Markdown. Rewrite them on purpose with
// `node test/report/golden/goldenScenarios.mjs` after `npm run build`.

const GOLDEN = path.join(root, 'test', 'report', 'golden');

describe('golden comments', () => {
  const work = mkdtempSync(path.join(tmpdir(), 'skillgate-golden-'));
  const out = path.join(work, 'out');
  writeGoldens(path.join(work, 'inputs'), out);
  for (const s of SCENARIOS as { name: string }[]) {
    it(`${s.name}.md is unchanged`, () => {
      expect(readFileSync(path.join(out, `${s.name}.md`), 'utf8')).toBe(
        readFileSync(path.join(GOLDEN, `${s.name}.md`), 'utf8'),
      );
    });
  }
  it('every committed golden file has a scenario', () => {
    const committed = readdirSync(GOLDEN)
      .filter((f) => f.endsWith('.md'))
      .sort();
    expect(committed).toEqual((SCENARIOS as { name: string }[]).map((s) => `${s.name}.md`).sort());
  });

  it('the 24-horizon comment keeps the reasons on the first screen', () => {
    const md = readFileSync(path.join(GOLDEN, 'wide.md'), 'utf8');
    const beforeDetails = md.slice(0, md.indexOf('<details>'));
    // The 24 horizon rows are folded away; none of them is in the main part.
    expect(beforeDetails).not.toMatch(/^\| (1|24) \|/m);
    expect(md).toMatch(
      /<details><summary>By horizon \(24\): for locating a change only, not verdicts<\/summary>/,
    );
    expect(beforeDetails.split('\n')[2]).toMatch(/^\*\*The gate fails: /);
  });
});
