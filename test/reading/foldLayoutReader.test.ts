import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/inputError.js';
import { FoldLayoutReader } from '../../src/reading/foldLayoutReader.js';

const read = (text: string, format: 'csv' | 'tsv' = 'csv') => {
  const reader = new FoldLayoutReader('folds.csv', format);
  reader.push(text);
  return reader.finish();
};
const error = (text: string): string => {
  try {
    read(text);
  } catch (e) {
    if (e instanceof InputError) return e.describe();
    throw e;
  }
  throw new Error('expected an InputError');
};

describe('FoldLayoutReader', () => {
  it('reads segments in any column order, with "path" for the fold column and extra columns', () => {
    const layout = read(
      'role,end,note,path,start\ntrain,2024-01-31,x,1,2024-01-01\r\ntest,2024-02-29,,1,2024-02-01\n',
    );
    expect(layout).toEqual({
      file: 'folds.csv',
      segments: [
        { fold: '1', role: 'train', start: '2024-01-01', end: '2024-01-31', line: 2 },
        { fold: '1', role: 'test', start: '2024-02-01', end: '2024-02-29', line: 3 },
      ],
    });
    expect(read('fold\trole\tstart\tend\na\ttest\t1\t5\n', 'tsv').segments).toHaveLength(1);
  });

  it('names the file, line and value of every problem', () => {
    expect(error('')).toMatch(/^folds\.csv: the fold layout is empty/);
    expect(error('fold,role,start\n')).toMatch(/^folds\.csv:1: .*"end" is missing/);
    expect(error('fold,role,start,end\n')).toMatch(/has a header but no segments/);
    expect(error('fold,role,start,end\n1,validation,1,2\n')).toBe(
      'folds.csv:2: role must be train or test (column "role", value "validation")',
    );
    expect(error('fold,role,start,end\n1,test,,2\n')).toBe(
      'folds.csv:2: empty start (column "start", value "")',
    );
  });
});
