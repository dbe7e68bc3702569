import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/inputError.js';
import { resolveSettings } from '../../src/settings/resolveSettings.js';

const label = (name: string) => `--${name}`;
const base = { baseline: 'b.csv', candidate: 'c.csv' };
const resolve = (raw: Record<string, string>) => resolveSettings({ ...base, ...raw }, label);
const message = (raw: Record<string, string>): string => {
  try {
    resolve(raw);
  } catch (error) {
    if (error instanceof InputError) return error.describe();
    throw error;
  }
  throw new Error('expected an InputError');
};

describe('options people type', () => {
  it('maps the trade names mse, mae, mape to the losses', () => {
    expect(resolve({ loss: 'mse' }).loss).toBe('squared');
    expect(resolve({ loss: 'mae' }).loss).toBe('absolute');
    expect(resolve({ loss: 'mape' }).loss).toBe('ape');
  });

  it('reads a percentage margin and refuses a relative margin above 1 written without %', () => {
    expect(resolve({ margin: '5%' }).margin).toBeCloseTo(0.05, 15);
    expect(resolve({ margin: '150%' }).margin).toBeCloseTo(1.5, 15);
    expect(resolve({ margin: '0.02' }).margin).toBe(0.02);
    expect(resolve({ margin: '1' }).margin).toBe(1);
    expect(message({ margin: '5' })).toContain('write 5% for 5 percent, 0.05 for the same');
    expect(resolve({ margin: '5', 'margin-kind': 'absolute' }).margin).toBe(5);
    expect(message({ margin: '5%', 'margin-kind': 'absolute' })).toContain(
      'as a percentage needs --margin-kind relative',
    );
    expect(message({ margin: '%' })).toContain('--margin must be a number ≥ 0');
  });

  it('parses per-file column mappings and the reading options', () => {
    const s = resolve({
      'baseline-columns': 'prediction=point',
      'candidate-columns': 'prediction=yhat',
      delimiter: ';',
      decimal: ',',
      'time-format': 'day-month-year',
      'line-limit': '4096',
      format: 'parquet',
    });
    expect(s.baselineColumns).toEqual({ prediction: 'point' });
    expect(s.candidateColumns).toEqual({ prediction: 'yhat' });
    expect(s).toMatchObject({
      delimiter: ';',
      decimal: ',',
      timeFormat: 'day-month-year',
      lineLimit: 4096,
      format: 'parquet',
    });
  });

  it('defaults the reading options', () => {
    expect(resolve({})).toMatchObject({
      baselineColumns: {},
      candidateColumns: {},
      delimiter: 'auto',
      decimal: '.',
      timeFormat: 'auto',
      lineLimit: 1 << 20,
      format: 'auto',
    });
  });

  it('refuses a decimal comma with the comma as field separator', () => {
    expect(message({ decimal: ',', delimiter: ',' })).toContain('needs a field separator other');
  });
});
