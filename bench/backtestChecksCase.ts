// The backtest checks' cost against alignment, in one process on the same tables: builds two
// predictions tables of SERIES × DAYS × 3 horizons rows with an origin column (invented numbers,
// fixed arithmetic, no randomness), then times alignPanel (the reference) and checkBacktest,
// RUNS times each, and prints the medians and their ratio. Usage (via bench/backtestChecks.mjs).
import { alignPanel } from '../src/alignment/alignPanel.js';
import { checkBacktest } from '../src/integrity/checkBacktest.js';
import { parseForecastText } from '../src/reading/forecastTableReader.js';

const [seriesArg, daysArg, runsArg] = process.argv.slice(2);
const SERIES = Number(seriesArg ?? 100);
const DAYS = Number(daysArg ?? 3000);
const RUNS = Number(runsArg ?? 5);
const DAY = 86_400_000;
const START = Date.UTC(2010, 0, 1);
const date = (i: number) => new Date(START + i * DAY).toISOString().slice(0, 10);

function* text(shift: number): Generator<string> {
  yield 'series,timestamp,horizon,origin,actual,prediction\n';
  const dates = Array.from({ length: DAYS + 3 }, (_, i) => date(i));
  for (let s = 0; s < SERIES; s++) {
    const lines: string[] = [];
    for (let t = 3; t < DAYS + 3; t++) {
      const actual = ((s * 7919 + t * 104729) % 1000) / 10;
      for (let h = 1; h <= 3; h++) {
        lines.push(`s${s},${dates[t]},${h},${dates[t - h]},${actual},${actual + shift + h * 0.1}`);
      }
    }
    yield `${lines.join('\n')}\n`;
  }
}

const baseline = parseForecastText(text(0.3), 'baseline.csv', { role: 'baseline' });
const candidate = parseForecastText(text(-0.25), 'candidate.csv', { role: 'candidate' });
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const alignTimes: number[] = [];
const checkTimes: number[] = [];
let outcome = '';
for (let r = 0; r < RUNS; r++) {
  let t0 = performance.now();
  const panel = alignPanel({ baseline, candidate });
  alignTimes.push(performance.now() - t0);
  t0 = performance.now();
  const report = checkBacktest(
    { panel, baseline, candidate },
    { frequency: 'auto', embargo: 0, mode: 'enforce' },
  );
  checkTimes.push(performance.now() - t0);
  const flagged = report.checks
    .filter((x) => x.status !== 'ok')
    .map((x) => `${x.id} ${x.count} (${x.examples[0]})`);
  outcome = `${report.outcome}, ${report.checks.length} checks run, frequency ${report.frequency?.text}${flagged.length > 0 ? `; flagged: ${flagged.join(', ')}` : ''}`;
}
const a = median(alignTimes);
const c = median(checkTimes);
process.stdout.write(
  `${baseline.size} rows per file (${SERIES} series × ${DAYS} days × 3 horizons, origin column); ${RUNS} runs, medians\n` +
    `  alignPanel (reference) ${a.toFixed(0)} ms · checkBacktest ${c.toFixed(0)} ms · ratio ${(c / a).toFixed(2)}× · checks: ${outcome}\n`,
);
