import { TIME_FORMAT_NAMES } from '../alignment/timeFormat.js';
import { MAX_CANDIDATES, MAX_NAME_LENGTH } from '../candidates/candidateList.js';
import {
  type CandidateSummary,
  type ConfidenceSetSummary,
  PREFERRED_BY,
  type SelectionSummary,
  type SpaSummary,
} from '../candidates/candidatesModel.js';
import { SELECTION_RULES } from '../candidates/decideCandidates.js';
import { SPA_HYPOTHESES } from '../candidates/superiorAbilityTest.js';
import { InputError } from '../core/inputError.js';
import { FILE_ROLES, type FileSummary, TIMESTAMP_KINDS } from '../core/panel.js';
import { SERIES_DIRECTIONS } from '../decision/decideAdjusted.js';
import { ON_REJECT_VERDICTS } from '../decision/hypothesis.js';
import { AGREEMENTS, MARGIN_KINDS, POLICIES, SHORT_DATA_VERDICTS } from '../decision/policy.js';
import { VERDICTS } from '../decision/verdict.js';
import { noChecks } from '../integrity/checkPolicy.js';
import {
  CHECK_IDS,
  CHECK_MODES,
  CHECK_STATUSES,
  FREQUENCY_SOURCES,
  type IntegrityReport,
} from '../integrity/checkResult.js';
import { LOSS_NAMES, type LossName } from '../losses/lossName.js';
import { ZERO_ACTUALS_RULES } from '../losses/rowLosses.js';
import { ADJUSTMENT_METHODS } from '../multiplicity/adjustmentMethod.js';
import { COLUMN_ROLES, type ColumnMapping } from '../reading/columnMapping.js';
import { DECIMAL_MARKS, DELIMITER_NAMES, INPUT_FORMATS } from '../reading/inputFormat.js';
import type { MissingRowsGroup, MissingRowsSummary } from '../report/missingRows.js';
import {
  BOOTSTRAP_STATES,
  type BootstrapSummary,
  type Comparison,
  type DieboldMarianoSummary,
  type InputsSummary,
  type Interval,
  type MeasuredCoverage,
  type PathSummary,
  type PolicySummary,
  type RelativeChange,
  type Report,
  type SeriesSummary,
} from '../report/reportModel.js';
import { POOLINGS, SCALE_KINDS } from '../scaling/pooling.js';
import type { Settings } from '../settings/settings.js';
import { FLUCTUATION_SIDES } from '../stability/fluctuationCriticalValues.js';
import { MAX_PERIODS } from '../stability/periodBuckets.js';
import { RECENT_WINDOW_KINDS, type RecentWindow } from '../stability/recentWindow.js';
import { STABILITY_GATE_MODES } from '../stability/stabilityFinding.js';
import { STABILITY_ADJUSTMENTS } from '../stability/stabilityLevels.js';
import type {
  FluctuationSummary,
  Stability,
  StabilityLevels,
  TimeSpan,
} from '../stability/stabilityModel.js';
import { BLOCK_LENGTH_RULE_KINDS } from '../statistics/bootstrap/blockLengthRule.js';
import type { ResampleHistogram } from '../statistics/bootstrap/resampleHistogram.js';
import { DIEBOLD_MARIANO_STATES } from '../statistics/dieboldMariano.js';
import { CONFIDENCE_SET_STATISTICS } from '../statistics/modelConfidenceSet.js';
import { LAG_RULE_KINDS } from '../statistics/neweyWestLag.js';
import { VARIANCE_ESTIMATORS } from '../statistics/varianceEstimator.js';

/** Larger report files are refused before parsing. */
export const MAX_REPORT_BYTES = 64 * 1024 * 1024;

/**
 * Reads a JSON report written by an earlier run (typically an artifact of a pull request from
 * a fork) as untrusted data. A fresh Report is built field by field: every enum is checked
 * against its allowed values, every number must be a finite number (or null where the model
 * allows it), every string a string; unknown fields and estimator diagnostics are dropped. Renderers then escape the
 * strings as they do for any input. Anything malformed is an InputError naming the file and
 * the JSON path of the offending field.
 */
export function parseUntrustedReport(text: string, source: string): Report {
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch (error) {
    throw new InputError(`is not valid JSON: ${(error as Error).message}`, { file: source });
  }
  return readReport(new Reader(parsed, '$', source));
}

class Reader {
  constructor(
    readonly value: unknown,
    readonly path: string,
    readonly source: string,
  ) {}

  fail(expected: string): never {
    const shown = JSON.stringify(this.value) ?? String(this.value);
    throw new InputError(`field ${this.path} must be ${expected}`, {
      file: this.source,
      value: shown.length > 80 ? `${shown.slice(0, 80)}…` : shown,
    });
  }
  field(name: string): Reader {
    if (typeof this.value !== 'object' || this.value === null || Array.isArray(this.value)) {
      this.fail('an object');
    }
    const object = this.value as Record<string, unknown>;
    return new Reader(
      Object.hasOwn(object, name) ? object[name] : undefined,
      `${this.path}.${name}`,
      this.source,
    );
  }
  items(): Reader[] {
    if (!Array.isArray(this.value)) this.fail('an array');
    return (this.value as unknown[]).map(
      (v, i) => new Reader(v, `${this.path}[${i}]`, this.source),
    );
  }
  string(): string {
    if (typeof this.value !== 'string') this.fail('a string');
    return this.value as string;
  }
  stringOrNull(): string | null {
    return this.value === null ? null : this.string();
  }
  number(): number {
    if (typeof this.value !== 'number' || !Number.isFinite(this.value))
      this.fail('a finite number');
    return this.value as number;
  }
  numberOrNull(): number | null {
    return this.value === null ? null : this.number();
  }
  integer(min = 0): number {
    const x = this.number();
    if (!Number.isSafeInteger(x) || x < min) this.fail(`an integer ≥ ${min}`);
    return x;
  }
  integerOrNull(): number | null {
    return this.value === null ? null : this.integer();
  }
  boolean(): boolean {
    if (typeof this.value !== 'boolean') this.fail('true or false');
    return this.value as boolean;
  }
  booleanOrNull(): boolean | null {
    return this.value === null ? null : this.boolean();
  }
  oneOf<T extends string>(choices: readonly T[]): T {
    if (typeof this.value !== 'string' || !(choices as readonly string[]).includes(this.value)) {
      this.fail(`one of ${choices.join(', ')}`);
    }
    return this.value as T;
  }
  matching(pattern: RegExp, expected: string): string {
    const text = this.string();
    if (!pattern.test(text)) this.fail(expected);
    return text;
  }
  strings(): string[] {
    return this.items().map((r) => r.string());
  }
}

function readReport(r: Reader): Report {
  const tool = r.field('tool');
  tool.field('name').oneOf(['skillgate']);
  const comparisons = r.field('comparisons').items().map(readComparison);
  if (comparisons.length === 0) r.field('comparisons').fail('a non-empty array');
  return {
    tool: {
      name: 'skillgate',
      version: tool.field('version').matching(/^[0-9A-Za-z.+-]{1,40}$/, 'a version such as 0.1.0'),
    },
    name: r.field('name').string(),
    verdict: r.field('verdict').oneOf(VERDICTS),
    headline: r.field('headline').string(),
    policy: readPolicy(r.field('policy')),
    comparisons,
    inputs: readInputs(r.field('inputs')),
    seriesSummary: readSeriesSummary(r.field('seriesSummary')),
    pathSummary: readPathSummary(r.field('pathSummary')),
    integrity: readIntegrity(r.field('integrity')),
    stability: readStability(r.field('stability'), r.field('policy').field('alpha').number()),
    settings: readSettings(r.field('settings')),
    reasons: r.field('reasons').strings(),
    ...readCandidateSections(r),
  };
}

function readPolicy(r: Reader): PolicySummary {
  return {
    policy: r.field('policy').oneOf(POLICIES),
    agreement: r.field('agreement').oneOf(AGREEMENTS),
    alpha: r.field('alpha').number(),
    margin: r.field('margin').number(),
    marginKind: r.field('marginKind').oneOf(MARGIN_KINDS),
    nullHypothesis: r.field('nullHypothesis').string(),
    alternative: r.field('alternative').string(),
    onReject: r.field('onReject').oneOf(ON_REJECT_VERDICTS),
    baselineFactor: r.field('baselineFactor').number(),
    boundary: r.field('boundary').number(),
  };
}

function readInterval(r: Reader): Interval | null {
  if (r.value === null) return null;
  return {
    level: r.field('level').number(),
    lower: r.field('lower').number(),
    upper: r.field('upper').number(),
    method: r.field('method').string(),
    ...readMeasuredCoverage(r.field('measuredCoverage')),
  };
}

function readMeasuredCoverage(r: Reader): { measuredCoverage?: MeasuredCoverage } {
  if (r.value === undefined) return {};
  return {
    measuredCoverage: {
      coverage: r.field('coverage').number(),
      level: r.field('level').number(),
      studiedN: r.field('studiedN').integer(),
    },
  };
}

const MAX_PIECES = 64;

/** Null ends mean unbounded; `pieces` only when the set is not one interval (RelativeChange). */
function readRelativeChange(r: Reader): RelativeChange | null {
  if (r.value === null || r.value === undefined) return null;
  const piece = (p: Reader) => ({
    lower: p.field('lower').numberOrNull(),
    upper: p.field('upper').numberOrNull(),
  });
  return {
    estimate: r.field('estimate').number(),
    level: r.field('level').number(),
    lower: r.field('lower').numberOrNull(),
    upper: r.field('upper').numberOrNull(),
    method: r.field('method').string(),
    ...(r.field('pieces').value === undefined ? {} : { pieces: readPieces(r.field('pieces')) }),
    ...readMeasuredCoverage(r.field('measuredCoverage')),
  };
  function readPieces(p: Reader) {
    const items = p.items();
    if (items.length > MAX_PIECES) p.fail(`at most ${MAX_PIECES} pieces`);
    return items.map(piece);
  }
}

function readComparison(r: Reader): Comparison {
  const horizon = r.field('horizon');
  const series = r.field('series');
  const rejected = r.field('rejected');
  return {
    loss: r.field('loss').oneOf<LossName>(LOSS_NAMES),
    horizon: horizon.value === 'all' ? 'all' : horizon.integer(1),
    series: series.string(),
    n: r.field('n').integer(),
    rows: r.field('rows').integer(),
    maxHorizon: r.field('maxHorizon').integer(),
    firstTimestamp: r.field('firstTimestamp').stringOrNull(),
    lastTimestamp: r.field('lastTimestamp').stringOrNull(),
    meanBaselineLoss: r.field('meanBaselineLoss').number(),
    meanCandidateLoss: r.field('meanCandidateLoss').number(),
    meanDifference: r.field('meanDifference').number(),
    relativeDifference: r.field('relativeDifference').numberOrNull(),
    meanTestedDifferential: r.field('meanTestedDifferential').number(),
    relativeChange: readRelativeChange(r.field('relativeChange')),
    dieboldMariano: readDieboldMariano(r.field('dieboldMariano')),
    bootstrap: readBootstrap(r.field('bootstrap')),
    verdict: r.field('verdict').oneOf(VERDICTS),
    reasons: r.field('reasons').strings(),
    ...(r.field('path').value === undefined ? {} : { path: r.field('path').string() }),
    rejected: {
      dieboldMariano: rejected.field('dieboldMariano').booleanOrNull(),
      bootstrap: rejected.field('bootstrap').booleanOrNull(),
    },
    ...(r.field('adjustedPValue').value === undefined
      ? {}
      : { adjustedPValue: r.field('adjustedPValue').numberOrNull() }),
    ...(r.field('direction').value === undefined
      ? {}
      : { direction: r.field('direction').oneOf(SERIES_DIRECTIONS) }),
    ...(r.field('directionPValue').value === undefined
      ? {}
      : { directionPValue: r.field('directionPValue').numberOrNull() }),
  };
}

/** Backtest checks; a report written before they existed reads as having none. */
function readIntegrity(r: Reader): IntegrityReport {
  if (r.value === undefined) {
    return noChecks('report', 'the report was written without backtest checks');
  }
  const frequency = r.field('frequency');
  return {
    mode: r.field('mode').oneOf(CHECK_MODES),
    outcome: r.field('outcome').oneOf(CHECK_STATUSES),
    affectsVerdict: r.field('affectsVerdict').boolean(),
    frequency:
      frequency.value === null
        ? null
        : {
            text: frequency
              .field('text')
              .matching(/^[0-9A-Za-z.]{1,20}$/, 'a frequency such as 1h'),
            source: frequency.field('source').oneOf(FREQUENCY_SOURCES),
          },
    checks: r
      .field('checks')
      .items()
      .map((c) => ({
        id: c.field('id').oneOf(CHECK_IDS),
        status: c.field('status').oneOf(CHECK_STATUSES),
        count: c.field('count').integer(),
        examples: c.field('examples').strings(),
        summary: c.field('summary').string(),
      })),
    notRun: r
      .field('notRun')
      .items()
      .map((c) => ({ id: c.field('id').oneOf(CHECK_IDS), reason: c.field('reason').string() })),
  };
}

function readPathSummary(r: Reader): PathSummary | null {
  if (r.value === null || r.value === undefined) return null;
  return {
    paths: r.field('paths').integer(),
    worse: r.field('worse').integer(),
    shareWorse: r.field('shareWorse').number(),
    significantlyWorse: r.field('significantlyWorse').integer(),
  };
}

/** report.stability; absent (a report from before it existed) reads as null. */
function readStability(r: Reader, alpha: number): Stability | null {
  if (r.value === null || r.value === undefined) return null;
  const periods = r.field('periods').items();
  if (periods.length > MAX_PERIODS) r.field('periods').fail(`at most ${MAX_PERIODS} periods`);
  const recentField = r.field('recent');
  const fluctuation = readFluctuation(r.field('fluctuation'));
  const recent = recentField.value === null ? null : readComparison(recentField);
  return {
    fluctuation,
    recent,
    levels: readStabilityLevels(r.field('levels'), alpha, fluctuation !== null, recent !== null),
    periods: periods.map((p) => ({
      ...readSpan(p),
      n: p.field('n').integer(1),
      meanBaselineLoss: p.field('meanBaselineLoss').number(),
      meanCandidateLoss: p.field('meanCandidateLoss').number(),
      relativeDifference: p.field('relativeDifference').numberOrNull(),
    })),
  };
}

/**
 * report.stability.levels; absent (a report from before the Bonferroni split) reads as each
 * check that ran at the policy's α, which is what those versions did.
 */
function readStabilityLevels(
  r: Reader,
  alpha: number,
  fluctuation: boolean,
  recent: boolean,
): StabilityLevels {
  if (r.value === undefined) {
    return {
      adjustment: 'none',
      alpha,
      fluctuation: fluctuation ? alpha : null,
      recent: recent ? alpha : null,
    };
  }
  return {
    adjustment: r.field('adjustment').oneOf(STABILITY_ADJUSTMENTS),
    alpha: r.field('alpha').number(),
    fluctuation: r.field('fluctuation').numberOrNull(),
    recent: r.field('recent').numberOrNull(),
  };
}

function readFluctuation(r: Reader): FluctuationSummary | null {
  if (r.value === null) return null;
  return {
    statistic: r.field('statistic').number(),
    criticalValue: r.field('criticalValue').number(),
    mu: r.field('mu').number(),
    windowSize: r.field('windowSize').integer(1),
    rejected: r.field('rejected').boolean(),
    peak: readSpan(r.field('peak')),
    worsePeriods: r.field('worsePeriods').items().map(readSpan),
  };
}

function readSpan(r: Reader): TimeSpan {
  return { start: r.field('start').string(), end: r.field('end').string() };
}

function readSeriesSummary(r: Reader): SeriesSummary | null {
  if (r.value === null || r.value === undefined) return null;
  return {
    method: r.field('method').oneOf(ADJUSTMENT_METHODS),
    alpha: r.field('alpha').number(),
    series: r.field('series').integer(),
    worse: r.field('worse').integer(),
    better: r.field('better').integer(),
    noEvidence: r.field('noEvidence').integer(),
    topRegressions: r.field('topRegressions').strings(),
  };
}

function readDieboldMariano(r: Reader): DieboldMarianoSummary {
  const small = r.field('smallSample');
  return {
    state: r.field('state').oneOf(DIEBOLD_MARIANO_STATES),
    estimator: r.field('estimator').oneOf(VARIANCE_ESTIMATORS),
    requestedEstimator: r.field('requestedEstimator').oneOf(VARIANCE_ESTIMATORS),
    statistic: r.field('statistic').numberOrNull(),
    pValue: r.field('pValue').numberOrNull(),
    pValueTwoSided: r.field('pValueTwoSided').numberOrNull(),
    decisionPValue: r.field('decisionPValue').numberOrNull(),
    variance: r.field('variance').numberOrNull(),
    longRunVariance: r.field('longRunVariance').numberOrNull(),
    lag: r.field('lag').integerOrNull(),
    degreesOfFreedom: r.field('degreesOfFreedom').numberOrNull(),
    smallSample:
      small.value === null
        ? null
        : {
            statistic: small.field('statistic').number(),
            pValue: small.field('pValue').number(),
            pValueTwoSided: small.field('pValueTwoSided').number(),
            degreesOfFreedom: small.field('degreesOfFreedom').number(),
          },
    interval: readInterval(r.field('interval')),
    // Estimator diagnostics are not shown by the renderers and not carried over from untrusted data.
    lagSelection: null,
    notes: r.field('notes').strings(),
  };
}

function readBootstrap(r: Reader): BootstrapSummary {
  return {
    state: r.field('state').oneOf(BOOTSTRAP_STATES),
    resamples: r.field('resamples').integer(),
    seed: r.field('seed').integer(),
    expectedBlockLength: r.field('expectedBlockLength').number(),
    blockLengthRule: r.field('blockLengthRule').oneOf(BLOCK_LENGTH_RULE_KINDS),
    blockLengthSelection: null,
    standardError: r.field('standardError').numberOrNull(),
    interval: readInterval(r.field('interval')),
    relativeInterval: readInterval(r.field('relativeInterval')),
    pValue: r.field('pValue').numberOrNull(),
    pValueTwoSided: r.field('pValueTwoSided').numberOrNull(),
    decisionPValue: r.field('decisionPValue').numberOrNull(),
    ...(r.field('distribution').value === undefined
      ? {}
      : { distribution: readHistogram(r.field('distribution')) }),
    notes: r.field('notes').strings(),
  };
}

/** At most this many bins of a bootstrap histogram are accepted from an untrusted report. */
const MAX_HISTOGRAM_BINS = 200;

function readHistogram(r: Reader): ResampleHistogram | null {
  if (r.value === null) return null;
  const counts = r.field('counts').items();
  if (counts.length === 0 || counts.length > MAX_HISTOGRAM_BINS) {
    r.field('counts').fail(`an array of 1 to ${MAX_HISTOGRAM_BINS} counts`);
  }
  return {
    lower: r.field('lower').number(),
    upper: r.field('upper').number(),
    counts: counts.map((c) => c.integer()),
  };
}

function readFile(r: Reader): FileSummary {
  return {
    role: r.field('role').oneOf(FILE_ROLES),
    path: r.field('path').string(),
    rows: r.field('rows').integer(),
    sha256: r.field('sha256').matching(/^sha256:[0-9a-f]{64}$/, 'sha256: and 64 hex digits'),
    columns: r.field('columns').strings(),
    ignoredColumns: r.field('ignoredColumns').strings(),
    blankLines: r.field('blankLines').integer(),
  };
}

function readInputs(r: Reader): InputsSummary {
  const d = r.field('rowsDropped');
  const examples = r.field('examples');
  const timestamps = r.field('timestamps');
  return {
    files: r.field('files').items().map(readFile),
    rowsMatched: r.field('rowsMatched').integer(),
    rowsDropped: {
      baseline: d.field('baseline').integer(),
      candidate: d.field('candidate').integer(),
      withoutActual: d.field('withoutActual').integer(),
      actualsUnused: d.field('actualsUnused').integer(),
      skippedByLoss: d.field('skippedByLoss').integer(),
    },
    examples: {
      baselineOnly: examples.field('baselineOnly').strings(),
      candidateOnly: examples.field('candidateOnly').strings(),
    },
    timestamps: {
      count: timestamps.field('count').integer(),
      kind: timestamps.field('kind').oneOf(TIMESTAMP_KINDS),
      first: timestamps.field('first').stringOrNull(),
      last: timestamps.field('last').stringOrNull(),
      format:
        timestamps.field('format').value === undefined
          ? 'auto'
          : timestamps.field('format').oneOf(TIME_FORMAT_NAMES),
      order:
        timestamps.field('order').value === undefined ? '' : timestamps.field('order').string(),
    },
    series: r.field('series').integer(),
    horizons: r
      .field('horizons')
      .items()
      .map((h) => h.integer(1)),
    quantileLevels: r
      .field('quantileLevels')
      .items()
      .map((q) => q.number()),
    intervalCoverage: readIntervalCoverage(r.field('intervalCoverage')),
    ...(r.field('missingRows').value === undefined
      ? {}
      : { missingRows: readMissingRows(r.field('missingRows')) }),
  };
}

/** At most this many groups per breakdown are kept from an untrusted report. */
const MAX_MISSING_GROUPS = 50;

function readMissingRows(r: Reader): MissingRowsSummary | null {
  if (r.value === null || r.value === undefined) return null;
  const groups = (g: Reader): MissingRowsGroup[] =>
    g
      .items()
      .slice(0, MAX_MISSING_GROUPS)
      .map((x) => ({
        key: x.field('key').string(),
        rows: x.field('rows').integer(),
        first: x.field('first').stringOrNull(),
        last: x.field('last').stringOrNull(),
        meanBaselineLoss: x.field('meanBaselineLoss').numberOrNull(),
      }));
  return {
    rows: r.field('rows').integer(),
    first: r.field('first').stringOrNull(),
    last: r.field('last').stringOrNull(),
    meanBaselineLoss: r.field('meanBaselineLoss').numberOrNull(),
    meanBaselineLossCommon: r.field('meanBaselineLossCommon').numberOrNull(),
    rowsWithoutLoss: r.field('rowsWithoutLoss').integer(),
    bySeries: groups(r.field('bySeries')),
    byHorizon: groups(r.field('byHorizon')),
  };
}

function readIntervalCoverage(r: Reader): InputsSummary['intervalCoverage'] {
  if (r.value === null || r.value === undefined) return null;
  return {
    nominal: r.field('nominal').number(),
    baseline: r.field('baseline').numberOrNull(),
    candidate: r.field('candidate').numberOrNull(),
  };
}

function readSettings(r: Reader): Settings {
  const columns: Record<string, string> = {};
  const mapping = r.field('columns');
  for (const role of COLUMN_ROLES) {
    const name = mapping.field(role);
    if (name.value !== undefined) columns[role] = name.string();
  }
  const lag = r.field('lag');
  const lagKind = lag.field('kind').oneOf(LAG_RULE_KINDS);
  const block = r.field('blockLength');
  const blockKind = block.field('kind').oneOf(BLOCK_LENGTH_RULE_KINDS);
  return {
    name: r.field('name').string(),
    baseline: r.field('baseline').string(),
    candidate: r.field('candidate').string(),
    ...readCandidateSettings(r),
    losses: r.field('losses').value === undefined ? null : r.field('losses').stringOrNull(),
    actuals: r.field('actuals').stringOrNull(),
    columns: columns as ColumnMapping,
    baselineColumns: readMapping(r.field('baselineColumns')),
    candidateColumns: readMapping(r.field('candidateColumns')),
    format: r.field('format').oneOf(INPUT_FORMATS),
    delimiter: absent(r, 'delimiter') ? 'auto' : r.field('delimiter').oneOf(DELIMITER_NAMES),
    decimal: absent(r, 'decimal') ? '.' : r.field('decimal').oneOf(DECIMAL_MARKS),
    timeFormat: absent(r, 'timeFormat') ? 'auto' : r.field('timeFormat').oneOf(TIME_FORMAT_NAMES),
    lineLimit: absent(r, 'lineLimit') ? 1 << 20 : r.field('lineLimit').integer(1),
    loss: r.field('loss').oneOf<LossName>(LOSS_NAMES),
    zeroActuals: r.field('zeroActuals').oneOf(ZERO_ACTUALS_RULES),
    alpha: r.field('alpha').number(),
    margin: r.field('margin').number(),
    marginKind: r.field('marginKind').oneOf(MARGIN_KINDS),
    policy: r.field('policy').oneOf(POLICIES),
    agreement: r.field('agreement').oneOf(AGREEMENTS),
    variance: r.field('variance').oneOf(VARIANCE_ESTIMATORS),
    lag:
      lagKind === 'fixed' ? { kind: 'fixed', lag: lag.field('lag').integer() } : { kind: lagKind },
    blockLength:
      blockKind === 'fixed'
        ? { kind: 'fixed', length: block.field('length').number() }
        : { kind: 'auto' },
    resamples: r.field('resamples').integer(),
    seed: r.field('seed').integer(),
    confidence: r.field('confidence').number(),
    minPoints: r.field('minPoints').integer(),
    shortData: r.field('shortData').oneOf(SHORT_DATA_VERDICTS),
    allowMissing: r.field('allowMissing').boolean(),
    interval: readLevels(r.field('interval')),
    pooling: r.field('pooling').oneOf(POOLINGS),
    scale: r.field('scale').oneOf(SCALE_KINDS),
    history: r.field('history').stringOrNull(),
    season: r.field('season').integer(),
    weights: r.field('weights').boolean(),
    adjust: r.field('adjust').oneOf(ADJUSTMENT_METHODS),
    top: r.field('top').integer(),
    recent: readRecentWindow(r.field('recent')),
    fluctuationWindow:
      r.field('fluctuationWindow').value === undefined
        ? 0.2
        : r.field('fluctuationWindow').number(),
    fluctuationSides:
      r.field('fluctuationSides').value === undefined
        ? 'one'
        : r.field('fluctuationSides').oneOf(FLUCTUATION_SIDES),
    stabilityGate:
      r.field('stabilityGate').value === undefined
        ? 'warn'
        : r.field('stabilityGate').oneOf(STABILITY_GATE_MODES),
    // Absent from reports written before the backtest checks: their defaults.
    frequency:
      r.field('frequency').value === undefined
        ? 'auto'
        : r.field('frequency').matching(/^[0-9A-Za-z.]{1,20}$/, 'a frequency such as 1h'),
    folds: r.field('folds').value === undefined ? null : r.field('folds').stringOrNull(),
    embargo: r.field('embargo').value === undefined ? 0 : r.field('embargo').integer(),
    backtestChecks:
      r.field('backtestChecks').value === undefined
        ? 'enforce'
        : r.field('backtestChecks').oneOf(CHECK_MODES),
    json: r.field('json').stringOrNull(),
    markdown: r.field('markdown').stringOrNull(),
    html: r.field('html').value === undefined ? null : r.field('html').stringOrNull(),
  };
}

/** The several-candidates settings; absent in reports of earlier versions (then the defaults). */
function readCandidateSettings(
  r: Reader,
): Pick<
  Settings,
  | 'candidates'
  | 'modelColumn'
  | 'baselineModel'
  | 'preferred'
  | 'selectionRule'
  | 'setAlpha'
  | 'setStatistic'
> {
  const present = (name: string) => r.field(name).value !== undefined;
  return {
    candidates: present('candidates')
      ? r
          .field('candidates')
          .items()
          .map((c) => ({ name: c.field('name').string(), path: c.field('path').string() }))
      : [],
    modelColumn: present('modelColumn') ? r.field('modelColumn').stringOrNull() : null,
    baselineModel: present('baselineModel') ? r.field('baselineModel').stringOrNull() : null,
    preferred: present('preferred') ? r.field('preferred').stringOrNull() : null,
    selectionRule: present('selectionRule')
      ? r.field('selectionRule').oneOf(SELECTION_RULES)
      : 'preferred-in-set',
    setAlpha: present('setAlpha') ? r.field('setAlpha').number() : 0.1,
    setStatistic: present('setStatistic')
      ? r.field('setStatistic').oneOf(CONFIDENCE_SET_STATISTICS)
      : 'max',
  };
}

/** A field that reports written before it existed lack. */
function absent(r: Reader, name: string): boolean {
  return r.field(name).value === undefined;
}

/** A per-file column mapping (empty when absent). */
function readMapping(r: Reader): ColumnMapping {
  const columns: Record<string, string> = {};
  if (r.value === undefined) return columns;
  for (const role of COLUMN_ROLES) {
    const name = r.field(role);
    if (name.value !== undefined) columns[role] = name.string();
  }
  return columns as ColumnMapping;
}

/** settings.recent; absent in reports from before it existed. */
function readRecentWindow(r: Reader): RecentWindow | null {
  if (r.value === null || r.value === undefined) return null;
  return r.field('kind').oneOf(RECENT_WINDOW_KINDS) === 'points'
    ? { kind: 'points', points: r.field('points').integer(2) }
    : { kind: 'share', share: r.field('share').number() };
}

function readLevels(r: Reader): readonly [number, number] | null {
  if (r.value === null) return null;
  const [lower, upper, ...rest] = r.items().map((x) => x.number());
  if (lower === undefined || upper === undefined || rest.length > 0) r.fail('two quantile levels');
  return [lower, upper];
}

const MODEL_NAME = new RegExp(`^[A-Za-z0-9][A-Za-z0-9._+-]{0,${MAX_NAME_LENGTH - 1}}$`);

/**
 * The several-candidates sections (absent in a two-model report: then absent here too). Names
 * must be model names as the engine accepts them; at most MAX_CANDIDATES candidates and as many
 * names in the set and the elimination order as there are models.
 */
function readCandidateSections(r: Reader): {
  candidates?: CandidateSummary[];
  spa?: SpaSummary;
  confidenceSet?: ConfidenceSetSummary;
  selection?: SelectionSummary;
} {
  const field = r.field('candidates');
  if (field.value === undefined) return {};
  const name = (x: Reader) => x.matching(MODEL_NAME, 'a model name (letters, digits, . _ + -)');
  const items = field.items();
  if (items.length === 0 || items.length > MAX_CANDIDATES) {
    field.fail(`an array of 1 to ${MAX_CANDIDATES} candidates`);
  }
  const candidates = items.map((c) => ({
    name: name(c.field('name')),
    file: c.field('file').string(),
    comparison: readComparison(c.field('comparison')),
    inConfidenceSet: c.field('inConfidenceSet').boolean(),
    mcsPValue: readProbability(c.field('mcsPValue')),
    spaPValue: readProbability(c.field('spaPValue')),
    rank: c.field('rank').integer(1),
  }));
  const s = r.field('spa');
  const rc = s.field('realityCheck');
  const spa: SpaSummary = {
    hypothesis: s.field('hypothesis').oneOf(SPA_HYPOTHESES),
    statistic: s.field('statistic').number(),
    pValueLower: readProbability(s.field('pValueLower')),
    pValueConsistent: readProbability(s.field('pValueConsistent')),
    pValueUpper: readProbability(s.field('pValueUpper')),
    resamples: s.field('resamples').integer(1),
    expectedBlockLength: s.field('expectedBlockLength').number(),
    realityCheck: {
      statistic: rc.field('statistic').number(),
      pValue: readProbability(rc.field('pValue')),
    },
  };
  const m = r.field('confidenceSet');
  const names = (x: Reader) => {
    const list = x.items();
    if (list.length > MAX_CANDIDATES + 1) x.fail(`at most ${MAX_CANDIDATES + 1} names`);
    return list.map(name);
  };
  const b = m.field('baseline');
  const steps = m.field('stepPValues').items();
  if (steps.length > MAX_CANDIDATES + 1) m.field('stepPValues').fail('one p-value per model');
  const confidenceSet: ConfidenceSetSummary = {
    level: readProbability(m.field('level')),
    statistic: m.field('statistic').oneOf(CONFIDENCE_SET_STATISTICS),
    members: names(m.field('members')),
    eliminationOrder: names(m.field('eliminationOrder')),
    stepPValues: steps.map(readProbability),
    baseline: {
      name: name(b.field('name')),
      meanLoss: b.field('meanLoss').number(),
      inConfidenceSet: b.field('inConfidenceSet').boolean(),
      mcsPValue: readProbability(b.field('mcsPValue')),
    },
  };
  const sel = r.field('selection');
  const selection: SelectionSummary = {
    rule: sel.field('rule').oneOf(SELECTION_RULES),
    preferred: name(sel.field('preferred')),
    preferredBy: sel.field('preferredBy').oneOf(PREFERRED_BY),
    verdict: sel.field('verdict').oneOf(VERDICTS),
    reasons: sel.field('reasons').strings(),
    timePoints: sel.field('timePoints').integer(2),
    expectedBlockLength: sel.field('expectedBlockLength').number(),
    blockLengthRule: sel.field('blockLengthRule').oneOf(BLOCK_LENGTH_RULE_KINDS),
  };
  return { candidates, spa, confidenceSet, selection };
}

function readProbability(r: Reader): number {
  const x = r.number();
  if (x < 0 || x > 1) r.fail('a number from 0 to 1');
  return x;
}
