import { InputError } from '../core/inputError.js';
import type { AlignedPanel } from '../core/panel.js';
import { type CheckFinding, type CheckNotRun, FindingCollector } from './checkResult.js';
import type { FoldLayout, FoldSegment } from './foldLayout.js';
import { type Frequency, formatFrequency } from './frequency.js';
import { describePanelRow } from './panelRowKey.js';
import { stepsAhead } from './stepCount.js';
import { compareTimePoints, type TimePoint, toTimePoint } from './timePoint.js';

interface Segment extends FoldSegment {
  readonly from: TimePoint;
  readonly to: TimePoint;
}

export interface FoldCheckInput {
  readonly panel: AlignedPanel;
  readonly layout: FoldLayout;
  /** Steps after each test segment that training must also avoid (`--embargo N`). */
  readonly embargo: number;
  readonly frequency: Frequency | null;
  readonly frequencyReason: string;
}

/**
 * Checks the backtest against its declared fold layout:
 *
 * - fold-purge: no training segment of a fold may touch [test start − H steps, test end + N
 *   steps] of any of the fold's test segments, where H is the largest horizon in the panel and N
 *   the embargo. Segments are the times of the samples; a training sample's target lies up to H
 *   steps after it, so a training sample within H steps before the test window has a target
 *   inside it (purging), and one right after the window is correlated with it (the embargo).
 *   López de Prado (2018), Advances in Financial Machine Learning, ch. 7 (purged k-fold
 *   cross-validation and embargo). Counts (training segment, test segment) pairs that touch.
 * - outside-test-window: every evaluated (matched) row's timestamp must lie in a test segment of
 *   its fold (the fold named by its path; without a path column, any fold). A row evaluated
 *   outside its test window was scored on data its model may have trained on; rolling-origin
 *   evaluation scores only the test period after each origin (Tashman 2000, International
 *   Journal of Forecasting 16). Counts rows.
 *
 * Layout timestamps that cannot be read like the panel's, or a segment that ends before it
 * starts, or a fold without a test segment, are InputErrors naming the layout file and line.
 */
export function checkFolds(input: FoldCheckInput): {
  findings: CheckFinding[];
  notRun: CheckNotRun[];
} {
  const { panel, layout } = input;
  const kind = panel.timestampKind;
  if (kind === 'text') {
    throw new InputError(
      '--folds needs timestamps that are all numbers or all ISO 8601 date-times; these are in text order',
      { file: layout.file },
    );
  }
  const folds = new Map<string, { train: Segment[]; test: Segment[] }>();
  for (const s of layout.segments) {
    const point = (label: string, column: string): TimePoint => {
      const p = toTimePoint(label, kind);
      if (p === null) {
        throw new InputError(
          `${column} is not a ${kind === 'number' ? 'number' : 'ISO 8601 date-time'} like the predictions' timestamps`,
          { file: layout.file, line: s.line, column, value: label },
        );
      }
      return p;
    };
    const from = point(s.start, 'start');
    const to = point(s.end, 'end');
    if (compareTimePoints(from, to) > 0) {
      throw new InputError(`the segment ends (${s.end}) before it starts (${s.start})`, {
        file: layout.file,
        line: s.line,
        value: s.end,
      });
    }
    let fold = folds.get(s.fold);
    if (fold === undefined) {
      fold = { train: [], test: [] };
      folds.set(s.fold, fold);
    }
    fold[s.role].push({ ...s, from, to });
  }
  for (const [name, fold] of folds) {
    if (fold.test.length === 0) {
      const line = fold.train[0]!.line;
      throw new InputError(`fold "${name}" has no test segment`, {
        file: layout.file,
        line,
        value: name,
      });
    }
  }
  const findings: CheckFinding[] = [];
  const notRun: CheckNotRun[] = [];

  // Purging and embargo.
  let maxHorizon = 1;
  for (let p = 0; p < panel.size; p++) maxHorizon = Math.max(maxHorizon, panel.horizon[p]!);
  const f = input.frequency;
  if (f === null) {
    notRun.push({ id: 'fold-purge', reason: input.frequencyReason });
  } else {
    const purge = new FindingCollector();
    let pairs = 0;
    for (const [name, fold] of folds) {
      for (const test of fold.test) {
        for (const train of fold.train) {
          pairs++;
          if (touches(train, test, maxHorizon, input.embargo, f)) {
            purge.add(
              () =>
                `fold ${name}: train ${train.start} to ${train.end} (line ${train.line}) touches test ${test.start} to ${test.end} (line ${test.line})`,
            );
          }
        }
      }
    }
    findings.push({
      id: 'fold-purge',
      count: purge.count,
      examples: purge.examples,
      summary: `${purge.count} of ${pairs} (training, test) segment pairs overlap the test window widened by ${maxHorizon} steps before (largest horizon) and ${input.embargo} after (embargo), at ${formatFrequency(f)}`,
    });
  }

  // Evaluated rows inside their fold's test window (merged, sorted windows; binary search).
  const times = panel.timestamps.map((label) => toTimePoint(label, kind)!);
  const windows = new Map<string, Window[]>();
  for (const [name, fold] of folds) windows.set(name, mergeWindows(fold.test));
  const anyFold = mergeWindows([...folds.values()].flatMap((fold) => fold.test));
  const outside = new FindingCollector();
  for (let p = 0; p < panel.size; p++) {
    const tests = panel.path === null ? anyFold : windows.get(panel.paths[panel.path[p]!]!);
    if (tests === undefined || !insideAny(tests, times[panel.time[p]!]!)) {
      outside.add(
        () =>
          `${describePanelRow(panel, p)}${tests === undefined ? ' (no such fold in the layout)' : ''}`,
      );
    }
  }
  findings.push({
    id: 'outside-test-window',
    count: outside.count,
    examples: outside.examples,
    summary: `${outside.count} of ${panel.size} evaluated rows lie outside the test segments of their fold${panel.path === null ? ' (no path column: any fold)' : ''}`,
  });
  return { findings, notRun };
}

/**
 * Whether training segment [a, b] shares a point with [s − H steps, e + N steps]: b is not more
 * than H steps before s, and a not more than N steps after e (on the grid of the frequency,
 * counted with stepsAhead).
 */
function touches(train: Segment, test: Segment, h: number, n: number, f: Frequency): boolean {
  const endsLate =
    compareTimePoints(train.to, test.from) >= 0 || stepsAhead(train.to, test.from, f) <= h;
  const startsEarly =
    compareTimePoints(train.from, test.to) <= 0 || stepsAhead(test.to, train.from, f) <= n;
  return endsLate && startsEarly;
}

interface Window {
  readonly from: TimePoint;
  readonly to: TimePoint;
}

/** The union of segments as disjoint windows sorted by start. */
function mergeWindows(segments: readonly Segment[]): Window[] {
  const sorted = [...segments].sort((a, b) => compareTimePoints(a.from, b.from));
  const out: { from: TimePoint; to: TimePoint }[] = [];
  for (const s of sorted) {
    const last = out[out.length - 1];
    if (last !== undefined && compareTimePoints(s.from, last.to) <= 0) {
      if (compareTimePoints(s.to, last.to) > 0) last.to = s.to;
    } else {
      out.push({ from: s.from, to: s.to });
    }
  }
  return out;
}

/** Whether t lies in one of the sorted disjoint windows (both ends included). */
function insideAny(windows: readonly Window[], t: TimePoint): boolean {
  let lo = 0;
  let hi = windows.length - 1;
  let found = -1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (compareTimePoints(windows[mid]!.from, t) <= 0) {
      found = mid;
      lo = mid + 1;
    } else {
      hi = mid - 1;
    }
  }
  return found >= 0 && compareTimePoints(t, windows[found]!.to) <= 0;
}
