import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/inputError.js';
import { parseColumnMapping, resolveColumns } from '../../src/reading/columnMapping.js';

function errorOf(fn: () => unknown): InputError {
  try {
    fn();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('parseColumnMapping', () => {
  it('reads role=column pairs, trimming spaces around them', () => {
    expect(parseColumnMapping('actual=observed, prediction = point ,quantile=p')).toEqual({
      actual: 'observed',
      prediction: 'point',
      quantile: 'p',
    });
    expect(parseColumnMapping('timestamp=ds=utc')).toEqual({ timestamp: 'ds=utc' });
    expect(parseColumnMapping('  ')).toEqual({});
    expect(parseColumnMapping('path=fold')).toEqual({ path: 'fold' });
  });

  it('applies the mapping over the defaults', () => {
    expect(resolveColumns(parseColumnMapping('series=store'))).toMatchObject({
      series: 'store',
      timestamp: 'timestamp',
      path: 'path',
      quantile: 'q',
    });
    expect(resolveColumns({ path: 'fold' }).path).toBe('fold');
  });

  it('rejects malformed pairs, unknown roles, empty names and repeats, naming the pair', () => {
    expect(errorOf(() => parseColumnMapping('actual')).describe()).toBe(
      '--columns: expected role=column pairs separated by commas, e.g. "actual=observed,prediction=point" (value "actual")',
    );
    expect(errorOf(() => parseColumnMapping('actual=y,forecast=yhat')).describe()).toMatch(
      /^--columns: unknown column role "forecast"; roles are series, timestamp, .* \(value "forecast=yhat"\)$/,
    );
    expect(errorOf(() => parseColumnMapping('actual=')).describe()).toContain(
      'the column name for role "actual" is empty',
    );
    expect(errorOf(() => parseColumnMapping('actual=a,actual=b')).describe()).toContain(
      'role "actual" is mapped twice (value "actual=b")',
    );
    expect(errorOf(() => parseColumnMapping('actual=x,prediction=x')).describe()).toContain(
      'roles "actual" and "prediction" both use the column "x"',
    );
    expect(errorOf(() => parseColumnMapping('prediction=actual')).describe()).toContain(
      'roles "actual" and "prediction" both use the column "actual"',
    );
    expect(errorOf(() => parseColumnMapping('path=origin')).describe()).toContain(
      'roles "origin" and "path" both use the column "origin"',
    );
    expect(errorOf(() => parseColumnMapping('bogus=y', '--x')).location.file).toBe('--x');
  });
});
