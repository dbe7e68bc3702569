import { describe, expect, it } from 'vitest';
import {
  backtestChecksLines,
  backtestChecksSection,
} from '../../src/report/renderBacktestChecks.js';
import { renderHtml } from '../../src/report/renderHtml.js';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import { sampleReport } from '../action/sampleReport.js';

const hostile = sampleReport({
  verdict: 'fail',
  integrity: {
    mode: 'enforce',
    outcome: 'fail',
    affectsVerdict: true,
    frequency: { text: '1h', source: 'given' },
    checks: [
      {
        id: 'look-ahead',
        status: 'fail',
        count: 3,
        examples: [
          'candidate line 2: series=a|b @team timestamp=<img src=x>',
          `candidate line 3: series=${'x'.repeat(500)}`,
          'candidate line 4: series=c',
        ],
        summary: '3 of 10 predictions rows have an origin at or after the timestamp they forecast',
      },
    ],
    notRun: [{ id: 'fold-purge', reason: 'no fold layout given (--folds FILE)' }],
  },
});

describe('the backtest checks section', () => {
  it('one line per check with status, count and two examples, escaped and clipped', () => {
    const lines = backtestChecksSection(hostile);
    expect(lines[0]).toBe('**Backtest checks**: fail. Steps of 1h (given).');
    const check = lines.find((l) =>
      l.startsWith('- fail · look-ahead (origin at or after the timestamp): 3, e.g. '),
    )!;
    expect(check).toContain('series=a\\|b @\u200Bteam timestamp=&lt;img src=x&gt;');
    expect(check).toContain(`${'x'.repeat(150)}`);
    expect(check).not.toContain('x'.repeat(300));
    expect(check).not.toContain('series=c');
    expect(lines).toContain('- not run · fold-purge: no fold layout given (--folds FILE)');
  });

  it('is part of the Markdown report, and the terminal lists what is not ok', () => {
    expect(renderMarkdown(hostile)).toContain('**Backtest checks**: fail.');
    const terminal = backtestChecksLines(hostile, (t) => t);
    expect(terminal[0]).toBe('backtest checks: fail (1 run, 1 not run)');
    expect(terminal[1]).toMatch(/^ {2}fail look-ahead: 3, e\.g\. candidate line 2/);
  });

  it('a report without checks (a loss file) says so in one line', () => {
    const none = sampleReport({
      integrity: {
        ...hostile.integrity,
        outcome: 'ok',
        checks: [],
        notRun: [
          { id: 'look-ahead', reason: 'a pre-aggregated loss file has no forecast rows to check' },
        ],
      },
    });
    expect(backtestChecksSection(none)).toEqual([
      '**Backtest checks**: not run (a pre-aggregated loss file has no forecast rows to check).',
      '',
    ]);
  });
});

describe('backtest checks in the HTML report', () => {
  it('shows the outcome with its time step and each check that did not run, escaped', () => {
    const html = renderHtml(hostile);
    const section = html.slice(html.indexOf('<h2>Backtest checks</h2>'));
    expect(section).toContain('<p>Outcome: fail. Steps of 1h (given).</p>');
    for (const n of hostile.integrity.notRun) {
      expect(section).toContain(`<li>not run · ${n.id}: `);
    }
    expect(section).not.toMatch(/<(?!\/?(h2|p|div|table|thead|tbody|tr|th|td|ul|li)\b)[a-z]/);
  });
});
