import { describe, expect, it } from 'vitest';
import { alignPanel } from '../../src/alignment/alignPanel.js';
import { parseForecastText } from '../../src/reading/forecastTableReader.js';

// Each row of the panel remembers where its actual was read, so a later refusal (a zero actual
// under the absolute percentage error) can name the file and line.
describe('actualSource', () => {
  it('points into the baseline file when the predictions carry the actuals', () => {
    const b = parseForecastText('timestamp,actual,prediction\n2,20,21\n1,10,11\n', 'b.csv', {
      role: 'baseline',
    });
    const c = parseForecastText('timestamp,actual,prediction\n1,10,12\n2,20,19\n', 'c.csv', {
      role: 'candidate',
    });
    const panel = alignPanel({ baseline: b, candidate: c });
    expect(panel.actualSource.file).toBe('b.csv');
    // Panel rows are in time order: timestamp 1 is on line 3 of b.csv, timestamp 2 on line 2.
    expect([...panel.actualSource.lines]).toEqual([3, 2]);
  });

  it('points into the actuals file when there is one', () => {
    const b = parseForecastText('timestamp,prediction\n1,11\n2,21\n', 'b.csv', {
      role: 'baseline',
      requireActual: false,
    });
    const c = parseForecastText('timestamp,prediction\n2,19\n1,12\n', 'c.csv', {
      role: 'candidate',
      requireActual: false,
    });
    const a = parseForecastText('timestamp,actual\n0,0\n2,20\n1,10\n', 'a.csv', {
      role: 'actuals',
    });
    const panel = alignPanel({ baseline: b, candidate: c, actuals: a });
    expect(panel.actualSource.file).toBe('a.csv');
    expect([...panel.actualSource.lines]).toEqual([4, 3]);
  });
});
