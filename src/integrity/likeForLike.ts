import { readLabel } from '../alignment/timeOrder.js';
import type { TimestampKind } from '../core/panel.js';
import type { ForecastTable, LabelColumn } from '../reading/forecastTable.js';
import {
  type CheckFinding,
  type CheckId,
  type CheckNotRun,
  FindingCollector,
  MAX_EXAMPLES,
} from './checkResult.js';

export interface LikeForLikeInput {
  readonly baseline: ForecastTable;
  readonly candidate: ForecastTable;
  readonly timestampKind: TimestampKind;
  readonly originKind: TimestampKind;
}

/**
 * Whether the two models were backtested alike: the same origins, paths and horizons, over the
 * same span of timestamps, on the same series. A candidate evaluated on other folds, other
 * horizons or a friendlier period is not comparable, even where rows happen to match. Each check
 * counts the labels found in one file only (time-spans: timestamps of one file outside the
 * other's first–last span) and names a few with the file that has them. Labels denoting the same
 * time ("2024-01-01" and "2024-01-01T00:00Z") are the same origin.
 */
export function checkLikeForLike(input: LikeForLikeInput): {
  findings: CheckFinding[];
  notRun: CheckNotRun[];
} {
  const { baseline: b, candidate: c } = input;
  const findings: CheckFinding[] = [];
  const notRun: CheckNotRun[] = [];
  const labelSets = (
    id: CheckId,
    what: string,
    pick: (t: ForecastTable) => LabelColumn | null,
    keyOf: (label: string) => string,
  ): void => {
    const bc = pick(b);
    const cc = pick(c);
    if (bc === null || cc === null) {
      notRun.push({ id, reason: `the files have no ${what} column` });
      return;
    }
    findings.push(compareSets(id, what, keyed(bc.labels, keyOf), keyed(cc.labels, keyOf)));
  };
  labelSets('origin-sets', 'origin', (t) => t.origin, timeKey(input.originKind));
  labelSets(
    'path-sets',
    'path',
    (t) => t.path,
    (label) => label,
  );
  if (b.horizon === null || c.horizon === null) {
    notRun.push({ id: 'horizon-sets', reason: 'the files have no horizon column' });
  } else {
    findings.push(
      compareSets(
        'horizon-sets',
        'horizon',
        new Map([...distinct(b.horizon.values)].map((h) => [String(h), String(h)])),
        new Map([...distinct(c.horizon.values)].map((h) => [String(h), String(h)])),
      ),
    );
  }
  if (input.timestampKind === 'text') {
    notRun.push({ id: 'time-spans', reason: 'timestamps are in text order' });
  } else {
    findings.push(timeSpans(b, c, input.timestampKind));
  }
  labelSets(
    'series-coverage',
    'series',
    (t) => t.series,
    (label) => label,
  );
  return { findings, notRun };
}

function timeKey(kind: TimestampKind): (label: string) => string {
  if (kind === 'text') return (label) => label;
  return (label) => {
    const r = readLabel(label);
    return typeof r === 'string' || r.kind === 'text' ? label : String(r.key);
  };
}

/** key → the first label seen with that key. */
function keyed(labels: readonly string[], keyOf: (label: string) => string): Map<string, string> {
  const out = new Map<string, string>();
  for (const label of labels) {
    const key = keyOf(label);
    if (!out.has(key)) out.set(key, label);
  }
  return out;
}

function distinct(values: Int32Array): Set<number> {
  const out = new Set<number>();
  for (let i = 0; i < values.length; i++) out.add(values[i]!);
  return out;
}

function compareSets(
  id: CheckId,
  what: string,
  baseline: Map<string, string>,
  candidate: Map<string, string>,
): CheckFinding {
  const onlyIn = (mine: Map<string, string>, other: Map<string, string>, role: string) => {
    const found = new FindingCollector();
    for (const [key, label] of mine) {
      if (!other.has(key)) found.add(() => `${what}=${label} only in the ${role}`);
    }
    return found;
  };
  const b = onlyIn(baseline, candidate, 'baseline');
  const c = onlyIn(candidate, baseline, 'candidate');
  // Examples from both sides when both have some.
  const examples = [...b.examples.slice(0, c.count > 0 ? 3 : MAX_EXAMPLES), ...c.examples].slice(
    0,
    MAX_EXAMPLES,
  );
  return {
    id,
    count: b.count + c.count,
    examples,
    summary: `${b.count} of ${baseline.size} ${what} values only in the baseline, ${c.count} of ${candidate.size} only in the candidate`,
  };
}

function timeSpans(b: ForecastTable, c: ForecastTable, kind: TimestampKind): CheckFinding {
  const keyOf = timeKey(kind);
  const order = (x: string, y: string): number =>
    kind === 'number' ? Number(x) - Number(y) : x < y ? -1 : x > y ? 1 : 0;
  const span = (t: ForecastTable) => {
    const keys = keyed(t.timestamp.labels, keyOf);
    const sorted = [...keys.keys()].sort(order);
    return { keys, first: sorted[0]!, last: sorted[sorted.length - 1]! };
  };
  const sb = span(b);
  const sc = span(c);
  const found = new FindingCollector();
  const outside = (
    mine: ReturnType<typeof span>,
    other: ReturnType<typeof span>,
    role: string,
    otherRole: string,
  ): number => {
    let n = 0;
    for (const [key, label] of mine.keys) {
      if (order(key, other.first) < 0 || order(key, other.last) > 0) {
        n++;
        found.add(() => `timestamp=${label} in the ${role}, outside the ${otherRole}'s span`);
      }
    }
    return n;
  };
  const nb = outside(sb, sc, 'baseline', 'candidate');
  const nc = outside(sc, sb, 'candidate', 'baseline');
  const label = (s: ReturnType<typeof span>) => `${s.keys.get(s.first)} to ${s.keys.get(s.last)}`;
  return {
    id: 'time-spans',
    count: found.count,
    examples: found.examples,
    summary: `baseline spans ${label(sb)}, candidate ${label(sc)}: ${nb} baseline and ${nc} candidate timestamps lie outside the other's span`,
  };
}
