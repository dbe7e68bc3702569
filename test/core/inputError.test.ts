import { describe, expect, it } from 'vitest';
import { InputError, printable } from '../../src/core/inputError.js';

describe('printable', () => {
  it('shows line breaks, control and bidirectional characters instead of obeying them', () => {
    expect(printable('a\nb\r\tc')).toBe('a\\nb\\r\\tc');
    expect(printable('x\u0007\u001b[31m\u2028\u202E\u2066')).toBe(
      'x\\u{0007}\\u{001B}[31m\\u{2028}\\u{202E}\\u{2066}',
    );
    expect(printable('plain – ünïcode ✓')).toBe('plain – ünïcode ✓');
  });
});

describe('InputError.describe', () => {
  it('is one line whatever the file name, column, value or quoted series name holds', () => {
    const error = new InputError('duplicated key series=x\n::error::forged', {
      file: 'data\n::warning::f.csv',
      line: 3,
      column: 'c\r\nd',
      value: 'v\n::notice::w',
    });
    const text = error.describe();
    expect(text).not.toMatch(/[\r\n]/);
    expect(text).toBe(
      'data\\n::warning::f.csv:3: duplicated key series=x\\n::error::forged (column "c\\r\\nd", value "v\\n::notice::w")',
    );
  });
});
