import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/inputError.js';
import { ENGINE_OPTIONS } from '../../src/settings/options.js';
import { resolveSettings } from '../../src/settings/resolveSettings.js';

const label = (name: string) => `--${name}`;
const base = { baseline: 'b.csv', candidate: 'c.csv' };
const fails = (raw: Record<string, string>, pattern: RegExp) => {
  try {
    resolveSettings({ ...base, ...raw }, label);
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).describe()).toMatch(pattern);
    return;
  }
  expect.fail(`expected an InputError for ${JSON.stringify(raw)}`);
};

describe('resolveSettings', () => {
  it('fills every default from the option table', () => {
    const s = resolveSettings(base, label);
    expect(s).toMatchObject({
      loss: 'squared',
      alpha: 0.05,
      margin: 0,
      marginKind: 'relative',
      policy: 'no-regression',
      agreement: 'both',
      variance: 'ewc-ar1',
      lag: { kind: 'auto' },
      blockLength: { kind: 'auto' },
      resamples: 9999,
      seed: 1729,
      confidence: 0.9,
      minPoints: 30,
      shortData: 'warn',
      allowMissing: false,
      pooling: 'raw',
      adjust: 'holm',
      top: 10,
      interval: null,
      losses: null,
    });
    for (const o of ENGINE_OPTIONS) expect(o.help.length).toBeGreaterThan(10);
  });

  it('derives the default level 1 − 2α from alpha, and keeps a level the user gives', () => {
    expect(resolveSettings({ ...base, alpha: '0.1' }, label).confidence).toBe(0.8);
    expect(resolveSettings({ ...base, alpha: '0.025' }, label).confidence).toBe(0.95);
    expect(resolveSettings({ ...base, alpha: '0.1', confidence: '0.95' }, label).confidence).toBe(
      0.95,
    );
  });

  it('parses lags, block lengths, intervals and column mappings', () => {
    const s = resolveSettings(
      {
        ...base,
        lag: '4',
        'block-length': '7.5',
        loss: 'interval',
        interval: '0.1, 0.9',
        columns: 'actual=y',
      },
      label,
    );
    expect(s.lag).toEqual({ kind: 'fixed', lag: 4 });
    expect(s.blockLength).toEqual({ kind: 'fixed', length: 7.5 });
    expect(s.interval).toEqual([0.1, 0.9]);
    expect(s.columns).toEqual({ actual: 'y' });
    expect(resolveSettings({ ...base, lag: 'h-1' }, label).lag).toEqual({ kind: 'horizon' });
  });

  it('names the option and the value in every error', () => {
    fails({ alpha: '0.7' }, /--alpha must be .*"0\.7"/);
    fails({ alpha: 'abc' }, /--alpha/);
    fails({ margin: '-1' }, /--margin must be/);
    fails({ loss: 'huber' }, /--loss must be one of .*"huber"/);
    fails({ lag: '-2' }, /--lag must be auto, h-1 or an integer/);
    fails({ 'block-length': '0.5' }, /--block-length/);
    fails({ resamples: '10' }, /--resamples must be an integer from 99/);
    fails({ seed: '1.5' }, /--seed/);
    fails({ confidence: '1.2' }, /--confidence/);
    fails({ 'allow-missing': 'maybe' }, /--allow-missing must be true or false/);
    fails({ loss: 'interval' }, /--interval is required/);
    fails({ interval: '0.2,0.9' }, /central interval/);
    fails({ columns: 'bogus=x' }, /--columns/);
  });

  it('requires the files unless a loss file replaces them, and not both', () => {
    expect(() => resolveSettings({ baseline: 'b.csv' }, label)).toThrow(/--candidate is required/);
    expect(resolveSettings({ losses: 'l.csv' }, label)).toMatchObject({
      losses: 'l.csv',
      baseline: '',
    });
    expect(() => resolveSettings({ losses: 'l.csv', baseline: 'b.csv' }, label)).toThrow(
      /--losses replaces/,
    );
  });
});

describe('resolveSettings: backtest checks', () => {
  it('defaults and accepted values', () => {
    expect(resolveSettings(base, label)).toMatchObject({
      frequency: 'auto',
      folds: null,
      embargo: 0,
      backtestChecks: 'enforce',
    });
    expect(
      resolveSettings(
        { ...base, frequency: '15min', folds: 'f.csv', embargo: '3', 'backtest-checks': 'report' },
        label,
      ),
    ).toMatchObject({ frequency: '15min', folds: 'f.csv', embargo: 3, backtestChecks: 'report' });
  });

  it('refuses a bad frequency, embargo or mode, naming the option and value', () => {
    fails({ frequency: 'hourly' }, /--frequency must be auto, a count and unit .*value "hourly"/);
    fails({ frequency: '0h' }, /--frequency/);
    fails({ embargo: '-1' }, /--embargo must be an integer from 0/);
    fails({ 'backtest-checks': 'off' }, /--backtest-checks must be one of enforce, warn, report/);
  });
});
