import { describe, expect, it } from 'vitest';
import { fileStem, parseCandidateList } from '../../src/candidates/candidateList.js';
import { parseArguments } from '../../src/cli/parseArguments.js';
import { resolveSettings } from '../../src/settings/resolveSettings.js';

describe('candidate list', () => {
  it('reads name=path lines and names bare paths by their stem', () => {
    expect(
      parseCandidateList('gbm=out/a.csv\n\n out/ets.csv.gz \nens-2=b.tsv', '--candidate'),
    ).toEqual([
      { name: 'gbm', path: 'out/a.csv' },
      { name: 'ets', path: 'out/ets.csv.gz' },
      { name: 'ens-2', path: 'b.tsv' },
    ]);
  });

  it('a path with "=" in its file name needs an explicit name', () => {
    expect(() => parseCandidateList('./runs/x=1.csv', 'c')).toThrow('model name');
    expect(parseCandidateList('x1=./runs/x=1.csv', 'c')).toEqual([
      { name: 'x1', path: './runs/x=1.csv' },
    ]);
    expect(fileStem('a/b/c.TSV.gz')).toBe('c');
  });

  it('refuses duplicated names, bad names, a name without file and too many candidates', () => {
    expect(() => parseCandidateList('a.csv\nx/a.csv', 'c')).toThrow('two candidates are named "a"');
    expect(() => parseCandidateList('a=', 'c')).toThrow('no file');
    expect(() => parseCandidateList('out/<b>.csv', 'c')).toThrow('model name');
    const many = Array.from({ length: 51 }, (_, i) => `m${i}=f${i}.csv`).join('\n');
    expect(() => parseCandidateList(many, 'c')).toThrow('at most 50');
  });

  it('the CLI takes --candidate repeated, and the settings keep each candidate', () => {
    const request = parseArguments([
      'compare',
      '--baseline',
      'b.csv',
      '--candidate',
      'one=c1.csv',
      '--candidate',
      'c2.csv',
    ]);
    if (request.kind !== 'compare') throw new Error('expected compare');
    const settings = resolveSettings(request.options, (n) => `--${n}`);
    expect(settings.candidates).toEqual([
      { name: 'one', path: 'c1.csv' },
      { name: 'c2', path: 'c2.csv' },
    ]);
    expect(settings.candidate).toBe('c1.csv');
    expect(settings.setAlpha).toBe(0.1);
    expect(settings.selectionRule).toBe('preferred-in-set');
  });

  it('a single plain --candidate stays the two-model case', () => {
    const settings = resolveSettings({ baseline: 'b.csv', candidate: 'c.csv' }, (n) => n);
    expect(settings.candidates).toEqual([]);
    expect(settings.candidate).toBe('c.csv');
  });

  it('baseline-model needs model-column and no baseline file', () => {
    expect(() =>
      resolveSettings({ candidate: 'long.csv', 'baseline-model': 'naive' }, (n) => n),
    ).toThrow('model-column');
    const s = resolveSettings(
      { candidate: 'long.csv', 'baseline-model': 'naive', 'model-column': 'model' },
      (n) => n,
    );
    expect(s.baseline).toBe('');
    expect(s.modelColumn).toBe('model');
  });
});
