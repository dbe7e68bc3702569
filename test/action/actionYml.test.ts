import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { ACTION_INPUTS, ALL_INPUTS, OUTPUT } from '../../src/action/names.js';
import { ENGINE_OPTIONS } from '../../src/settings/options.js';
import { readActionYml } from './actionYml.js';
import { ROOT } from './runBundle.js';

const yml = readActionYml(path.join(ROOT, 'action.yml'));

describe('action.yml mirrors the names module', () => {
  it('runs the bundle on node24', () => {
    expect(yml.runs).toEqual({ using: 'node24', main: 'dist/index.js' });
  });

  it('has exactly the engine options plus the action-only inputs, in that order', () => {
    expect([...yml.inputs.keys()]).toEqual(
      [...ENGINE_OPTIONS, ...ACTION_INPUTS].map((o) => o.name),
    );
    for (const name of [
      'baseline',
      'candidate',
      'actuals',
      'loss',
      'alpha',
      'margin',
      'github-token',
      'comment',
      'name',
    ]) {
      expect(yml.inputs.has(name)).toBe(true);
    }
  });

  it('gives every input the same default as the table (none where the table has none)', () => {
    for (const option of ALL_INPUTS) {
      const entry = yml.inputs.get(option.name);
      expect({ name: option.name, default: entry?.default }).toEqual({
        name: option.name,
        default: option.defaultValue ?? undefined,
      });
      expect(entry?.description ?? '').not.toBe('');
      // The runner never enforces `required`; baseline/candidate may be left out with report-file.
      expect(entry?.required).toBe('false');
    }
    // biome-ignore lint/suspicious/noTemplateCurlyInString: the runner expands this expression
    expect(yml.inputs.get('github-token')?.default).toBe('${{ github.token }}');
    expect(yml.inputs.get('comment')?.default).toBe('true');
  });

  it('declares exactly the outputs of the names module', () => {
    expect([...yml.outputs.keys()].sort()).toEqual(Object.values(OUTPUT).sort());
  });
});
