import { describe, expect, it } from 'vitest';
import { alignPanel } from '../../src/alignment/alignPanel.js';
import { evaluatePanel } from '../../src/comparison/evaluatePanel.js';
import { createRandomSource, type RandomSource } from '../../src/random/randomSource.js';
import { parseForecastText } from '../../src/reading/forecastTableReader.js';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import type { Report } from '../../src/report/reportModel.js';
import { resolveSettings } from '../../src/settings/resolveSettings.js';

// A series is "worse" only with evidence that the candidate's loss is higher, "better" only with
// evidence that it is lower, whatever the policy and margin. Invented panel, fixed seed: five
// series with AR(1) errors; the candidate's error is scaled by 0.7 on "planted-better" (about
// 51% lower squared loss), by 1.4 on "planted-worse" (about 96% higher) and left alone elsewhere.

function normal(random: RandomSource): number {
  const u = 1 - random.nextDouble();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * random.nextDouble());
}

const SCALES: Record<string, number> = {
  'planted-better': 0.7,
  'planted-worse': 1.4,
  'same-a': 1,
  'same-b': 1,
  'same-c': 1,
};

function files(seed: number): { baseline: string; candidate: string } {
  const random = createRandomSource(seed);
  const b = ['series,timestamp,actual,prediction'];
  const c = [...b];
  for (const [name, scale] of Object.entries(SCALES)) {
    let eb = 0;
    let ec = 0;
    for (let t = 0; t < 400; t++) {
      eb = 0.5 * eb + normal(random);
      ec = 0.5 * ec + normal(random);
      b.push(`${name},${t},10,${10 + eb}`);
      c.push(`${name},${t},10,${10 + scale * ec}`);
    }
  }
  return { baseline: `${b.join('\n')}\n`, candidate: `${c.join('\n')}\n` };
}

function evaluate(extra: Record<string, string>): Report {
  const f = files(97);
  const panel = alignPanel({
    baseline: parseForecastText(f.baseline, 'b.csv', { role: 'baseline' }),
    candidate: parseForecastText(f.candidate, 'c.csv', { role: 'candidate' }),
  });
  const settings = resolveSettings(
    { baseline: 'b.csv', candidate: 'c.csv', resamples: '199', ...extra },
    (n) => `--${n}`,
  );
  return evaluatePanel(panel, settings);
}

function directions(report: Report): Record<string, string | undefined> {
  return Object.fromEntries(
    report.comparisons.filter((c) => c.series !== 'all').map((c) => [c.series, c.direction]),
  );
}

describe('per-series direction follows the evidence, not the policy', () => {
  // The directions under the default policy; the null series may, at α = 5% each, show a
  // direction by chance, so they are checked for invariance across policies, not pinned.
  const reference = directions(evaluate({}));

  it('finds the planted series under the default policy', () => {
    expect(reference['planted-better']).toBe('better');
    expect(reference['planted-worse']).toBe('worse');
  });

  for (const extra of <Record<string, string>[]>[
    { policy: 'superiority', margin: '0.10' },
    { policy: 'non-inferiority', margin: '0.10' },
    { policy: 'no-regression', margin: '0.10' },
  ]) {
    it(`${extra.policy} with margin ${extra.margin}: the same directions, counts and list`, () => {
      const report = evaluate(extra);
      expect(directions(report)).toEqual(reference);
      const count = (d: string) => Object.values(reference).filter((x) => x === d).length;
      expect(report.seriesSummary).toMatchObject({
        worse: count('worse'),
        better: count('better'),
        noEvidence: count('no evidence'),
      });
      expect(report.seriesSummary?.topRegressions).toContain('planted-worse');
      expect(report.seriesSummary?.topRegressions).not.toContain('planted-better');
      for (const c of report.comparisons.filter((x) => x.series !== 'all')) {
        // The p-value behind the word is small exactly when there is a direction.
        expect(c.directionPValue ?? 1).toSatisfy((p: number) =>
          c.direction === 'no evidence' ? p > 0.05 : p <= 0.05,
        );
      }
    });
  }
});

describe('the comment says the same', () => {
  it('under superiority with a 10% margin: the better series reads "better", not "worse"', () => {
    const md = renderMarkdown(evaluate({ policy: 'superiority', margin: '0.10' }));
    expect(md).toMatch(/<summary>By series \(5\): [1-9] worse, [1-9] better<\/summary>/);
    expect(md).toMatch(/^\| planted-better \| [^|]+ \| [^|]+ \| -\d[^|]*% \| better \| /m);
    expect(md).toMatch(/^\| planted-worse \| [^|]+ \| [^|]+ \| \+\d[^|]*% \| worse \| /m);
    expect(md).toMatch(/^\| same-b \| [^|]+ \| [^|]+ \| [^|]+ \| no clear difference \| /m);
  });

  it('under non-inferiority the planted worse series is counted as worse', () => {
    const md = renderMarkdown(evaluate({ policy: 'non-inferiority', margin: '0.10' }));
    expect(md).toMatch(/<summary>By series \(5\): [1-9] worse, /);
    expect(md).toMatch(/^\| planted-worse \| [^|]+ \| [^|]+ \| \+\d[^|]*% \| worse \| /m);
  });
});
