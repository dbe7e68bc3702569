import { lossDifferential } from '../src/aggregation/lossSeries.js';
import { createRandomSource } from '../src/random/randomSource.js';
import { automaticBlockLength } from '../src/statistics/bootstrap/automaticBlockLength.js';
import { stationaryBootstrap } from '../src/statistics/bootstrap/stationaryBootstrap.js';
import { studentisedBootstrapInterval } from '../src/statistics/bootstrap/studentisedBootstrapInterval.js';
import { ewcDegreesOfFreedom } from '../src/statistics/ewcLongRunVariance.js';
import { coverageDesigns, coverageTruth, simulateCoverageSeries } from './coverageDesigns.js';

/**
 * `npm run validate -- --candidates`: the measurement behind rejecting the studentised
 * stationary bootstrap (ewc studentisation in every resample, src/statistics/bootstrap/
 * studentisedBootstrapInterval.ts) as a replacement for the basic bootstrap interval of
 * E[L_c − L_b]: its coverage on the coverage study's designs (same streams, 90% level, B = 999)
 * and its CPU time at n = 500 and 2,000 with B = 9,999 against the basic bootstrap's.
 */
export function candidateStudy(replications: number): string {
  const lines = [
    `Studentised stationary bootstrap (ewc per resample), ${replications} replications, B = 999, level 90%:`,
    '',
    '| design | n | coverage of E[L_c − L_b] |',
    '|---|---:|---:|',
  ];
  for (const n of [50, 100]) {
    for (const design of coverageDesigns(n)) {
      const truth = coverageTruth(design).difference;
      let covered = 0;
      for (let r = 0; r < replications; r++) {
        const series = simulateCoverageSeries(design, createRandomSource(20261201, r));
        const d = lossDifferential(series, 0);
        const interval = studentisedBootstrapInterval(d, {
          resamples: 999,
          expectedBlockLength: automaticBlockLength(d).blockLength,
          seed: 1729,
          level: 0.9,
          degreesOfFreedom: ewcDegreesOfFreedom(n),
        });
        if (interval !== null && interval.lower <= truth && truth <= interval.upper) covered++;
      }
      lines.push(`| ${design.label} | ${n} | ${((100 * covered) / replications).toFixed(1)}% |`);
    }
  }
  lines.push('', 'CPU time (process.cpuUsage), B = 9,999:', '');
  const cpu = (f: () => void) => {
    const start = process.cpuUsage();
    f();
    const used = process.cpuUsage(start);
    return (used.user + used.system) / 1000;
  };
  for (const n of [500, 2000]) {
    const d = Float64Array.from(
      { length: n },
      (_, t) => Math.sin(t * 0.37) + ((t * 7919) % 13) / 13,
    );
    for (const b of [1, 5, 20]) {
      const basic = cpu(() =>
        stationaryBootstrap(d, {
          resamples: 9999,
          expectedBlockLength: b,
          seed: 1729,
          confidence: 0.9,
          margin: 0,
        }),
      );
      const studentised = cpu(() =>
        studentisedBootstrapInterval(d, {
          resamples: 9999,
          expectedBlockLength: b,
          seed: 1729,
          level: 0.9,
          degreesOfFreedom: ewcDegreesOfFreedom(n),
        }),
      );
      lines.push(
        `- n = ${n}, b = ${b}: basic ${basic.toFixed(0)} ms, studentised ${studentised.toFixed(0)} ms`,
      );
    }
  }
  return `${lines.join('\n')}\n`;
}
