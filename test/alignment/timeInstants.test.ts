import { describe, expect, it } from 'vitest';
import { alignPanel } from '../../src/alignment/alignPanel.js';
import { parseForecastText } from '../../src/reading/forecastTableReader.js';

const read = (text: string, role: 'baseline' | 'candidate') =>
  parseForecastText(text, `${role}.csv`, { role });

describe('the aligned panel keeps the parsed times', () => {
  it('as epoch milliseconds (UTC) for date-times, indexed like timestamps', () => {
    const text =
      'timestamp,actual,prediction\n2026-01-02,1,1\n2026-01-01T12:00+02:00,1,1\n2026-01-03,1,1\n';
    const panel = alignPanel({
      baseline: read(text, 'baseline'),
      candidate: read(text, 'candidate'),
    });
    expect(panel.timestamps).toEqual(['2026-01-01T12:00+02:00', '2026-01-02', '2026-01-03']);
    // Date.UTC is the reference.
    expect(Array.from(panel.timeInstants!)).toEqual([
      Date.UTC(2026, 0, 1, 10),
      Date.UTC(2026, 0, 2),
      Date.UTC(2026, 0, 3),
    ]);
    expect(panel.timeFormat).toBe('auto');
  });

  it('as the numbers themselves for numeric timestamps, only for times in the panel', () => {
    const b = 'timestamp,actual,prediction\n10,1,1\n2.5,1,1\n7,1,1\n';
    const c = 'timestamp,actual,prediction\n10,1,1\n2.5,1,1\n';
    const panel = alignPanel(
      { baseline: read(b, 'baseline'), candidate: read(c, 'candidate') },
      {},
    );
    expect(panel.timestamps).toEqual(['2.5', '10']);
    expect(Array.from(panel.timeInstants!)).toEqual([2.5, 10]);
  });

  it('reads day-first dates when told, and keeps none in text order', () => {
    const text = 'timestamp,actual,prediction\n2/1/2026 6:00,1,1\n1/2/2026,1,1\n';
    const dmy = alignPanel(
      { baseline: read(text, 'baseline'), candidate: read(text, 'candidate') },
      { timeFormat: 'day-month-year' },
    );
    expect(Array.from(dmy.timeInstants!)).toEqual([Date.UTC(2026, 0, 2, 6), Date.UTC(2026, 1, 1)]);
    const text2 = 'timestamp,actual,prediction\nweek-10,1,1\nweek-9,1,1\n';
    const ordered = alignPanel(
      { baseline: read(text2, 'baseline'), candidate: read(text2, 'candidate') },
      { timeFormat: 'text-order' },
    );
    expect(ordered.timestamps).toEqual(['week-10', 'week-9']);
    expect(ordered.timeInstants).toBeNull();
    expect(ordered.timestampKind).toBe('text');
  });
});
