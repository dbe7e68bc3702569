import { describe, expect, it } from 'vitest';
import { alignPanel } from '../../src/alignment/alignPanel.js';
import { evaluatePanel } from '../../src/comparison/evaluatePanel.js';
import { parseForecastText } from '../../src/reading/forecastTableReader.js';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import { resolveSettings } from '../../src/settings/resolveSettings.js';

// A candidate that skips the hard rows: two series over 40 days, horizons 1 and 2; the baseline
// errs by 1 everywhere except on series "hard", horizon 2, days 10–19, where it errs by 5. The
// candidate errs by 0.9 everywhere it answers, and lacks exactly those ten hard rows.

function files(actualsFile: boolean): { baseline: string; candidate: string; actuals?: string } {
  const header = actualsFile
    ? 'series,timestamp,horizon,prediction'
    : 'series,timestamp,horizon,actual,prediction';
  const b = [header];
  const c = [header];
  const a = ['series,timestamp,actual'];
  for (const s of ['easy', 'hard']) {
    for (let t = 0; t < 40; t++) {
      a.push(`${s},${t},10`);
      for (const h of [1, 2]) {
        const hardRow = s === 'hard' && h === 2 && t >= 10 && t < 20;
        const actual = actualsFile ? '' : '10,';
        b.push(`${s},${t},${h},${actual}${hardRow ? 15 : 11}`);
        if (!hardRow) c.push(`${s},${t},${h},${actual}10.9`);
      }
    }
  }
  return {
    baseline: `${b.join('\n')}\n`,
    candidate: `${c.join('\n')}\n`,
    ...(actualsFile ? { actuals: `${a.join('\n')}\n` } : {}),
  };
}

function report(actualsFile: boolean) {
  const f = files(actualsFile);
  const panel = alignPanel({
    baseline: parseForecastText(f.baseline, 'b.csv', { role: 'baseline' }),
    candidate: parseForecastText(f.candidate, 'c.csv', { role: 'candidate' }),
    ...(f.actuals === undefined
      ? {}
      : { actuals: parseForecastText(f.actuals, 'a.csv', { role: 'actuals' }) }),
  });
  const settings = resolveSettings(
    {
      baseline: 'b.csv',
      candidate: 'c.csv',
      ...(actualsFile ? { actuals: 'a.csv' } : {}),
      resamples: '199',
      loss: 'absolute',
    },
    (n) => `--${n}`,
  );
  return evaluatePanel(panel, settings);
}

describe('rows the candidate lacks', () => {
  for (const actualsFile of [false, true]) {
    it(`are broken down by series, horizon and time span, with the baseline's loss on them (${actualsFile ? 'actuals file' : 'actual column'})`, () => {
      const r = report(actualsFile);
      expect(r.verdict).toBe('fail');
      expect(r.comparisons[0]?.verdict).toBe('pass');
      // Exact by construction: absolute errors of 5 on the lacking rows, 1 on the 150 common ones.
      expect(r.inputs.missingRows).toEqual({
        rows: 10,
        first: '10',
        last: '19',
        meanBaselineLoss: 5,
        meanBaselineLossCommon: 1,
        rowsWithoutLoss: 0,
        bySeries: [{ key: 'hard', rows: 10, first: '10', last: '19', meanBaselineLoss: 5 }],
        byHorizon: [{ key: '2', rows: 10, first: '10', last: '19', meanBaselineLoss: 5 }],
      });
      const md = renderMarkdown(r);
      expect(md.split('\n')[2]).toMatch(
        /^\*\*The gate fails: the candidate lacks 10 rows that the baseline scored; the baseline's mean loss on them is 5\.000, against 1\.000 on the rows both scored\.\*\*/,
      );
      expect(md).toContain('| hard | 10 | 10 to 19 | 5.000 |');
      expect(md).toContain('| 2 | 10 | 10 to 19 | 5.000 |');
    });
  }
});
