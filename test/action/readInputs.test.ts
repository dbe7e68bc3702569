import { describe, expect, it } from 'vitest';
import { readActionSettings } from '../../src/action/readInputs.js';
import { InputError } from '../../src/core/inputError.js';
import { resolveSettings } from '../../src/settings/resolveSettings.js';

const inputs = (values: Record<string, string>) => (name: string) => values[name] ?? '';
const base = { baseline: 'b.csv', candidate: 'c.csv', 'github-token': 't' };

function errorOf(values: Record<string, string>): string {
  try {
    readActionSettings(inputs(values));
  } catch (error) {
    if (error instanceof InputError) return error.describe();
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('readActionSettings', () => {
  it('builds the same Settings the CLI builds from the same values', () => {
    const values = {
      ...base,
      alpha: '0.1',
      margin: '0.02',
      'block-length': '5',
      lag: 'h-1',
      'allow-missing': 'true',
    };
    const action = readActionSettings(inputs(values));
    const cli = resolveSettings(values, (n) => `--${n}`);
    expect(action.source).toEqual({ kind: 'compare', settings: cli });
    expect(action).toMatchObject({ comment: true, token: 't', pullRequest: null });
  });

  it('reads comment-author as a GitHub login, optionally ending in [bot]', () => {
    expect(readActionSettings(inputs(base)).commentAuthor).toBeNull();
    for (const login of ['my-app[bot]', 'release-robot', 'A1', `${'a'.repeat(39)}[bot]`]) {
      expect(
        readActionSettings(inputs({ ...base, 'comment-author': ` ${login} ` })).commentAuthor,
      ).toBe(login);
    }
    for (const bad of [
      '-app',
      'app-',
      'my--app',
      'my app',
      'app[bot]x',
      '[bot]',
      'a'.repeat(40),
      'app\n::error::x',
      '@app',
    ]) {
      expect(errorOf({ ...base, 'comment-author': bad })).toMatch(
        /^input 'comment-author' must be a GitHub login such as my-app\[bot\]/,
      );
    }
  });

  it('names the input in every message', () => {
    expect(errorOf({ ...base, alpha: 'abc' })).toBe(
      `input 'alpha' must be a number between 0 and 0.5, such as 0.05 (value "abc")`,
    );
    expect(errorOf({ candidate: 'c.csv' })).toMatch(/^input 'baseline' is required/);
    expect(errorOf({ ...base, loss: 'cubic' })).toMatch(/^input 'loss' must be one of squared/);
    expect(errorOf({ ...base, comment: 'yes' })).toBe(
      `input 'comment' must be true or false (value "yes")`,
    );
    expect(errorOf({ ...base, 'pull-request': '4x' })).toMatch(
      /^input 'pull-request' must be a pull-request number/,
    );
    expect(errorOf({ ...base, columns: 'nonsense' })).toMatch(
      /^input 'columns': expected role=column pairs/,
    );
  });

  it('reads the action-only inputs', () => {
    const action = readActionSettings(inputs({ ...base, comment: 'False', 'pull-request': '#12' }));
    expect(action.comment).toBe(false);
    expect(action.pullRequest).toBe(12);
  });

  it('in report-file mode needs no data files and refuses them', () => {
    const action = readActionSettings(
      inputs({ 'report-file': 'r.json', name: 'n', json: 'out.json' }),
    );
    expect(action.source).toEqual({
      kind: 'report-file',
      path: 'r.json',
      name: 'n',
      json: 'out.json',
      markdown: null,
      html: null,
    });
    expect(errorOf({ 'report-file': 'r.json', baseline: 'b.csv' })).toMatch(
      /^input 'report-file' posts an existing report and cannot be combined with input 'baseline'/,
    );
  });
});
