import { LOSS_LABELS } from '../losses/lossName.js';
import { ADJUSTMENTS } from '../multiplicity/adjustmentMethod.js';
import { holmAdjust } from '../multiplicity/holmAdjust.js';
import {
  asCommandLine,
  type OptionValue,
  settingsAsOptions,
} from '../settings/settingsAsOptions.js';
import { smallSampleValue } from '../statistics/smallSampleValue.js';
import {
  changeCell,
  evidenceOf,
  intervalText,
  percent,
  pValue,
  relativeInterval,
  significant,
} from './cells.js';
import { type DecidingReason, decidingReasons } from './decidingReason.js';
import { displayPath } from './displayPath.js';
import { inputNotes } from './inputNotes.js';
import { intervalNote, measuredCoverageText } from './relativeChangeText.js';
import { type ReportTable, table } from './reportTable.js';
import type { ComparisonView, ReportView } from './reportView.js';

/**
 * The content every rendering of a report shows (comment, job summary, HTML, terminal), built
 * once as plain text and tables so the renderers agree: the lead paragraph (verdict, the change
 * with its interval, the deciding reason), a compact main table, and the sections a reviewer
 * opens on demand.
 */
export interface ReportSections {
  readonly title: string;
  readonly verdict: ReportView['verdict'];
  /** The deciding reason first, then the other findings. */
  readonly reasons: readonly DecidingReason[];
  /** "FAIL: the candidate lacks 40 rows that the baseline scored." */
  readonly lead: string;
  /** "Mean loss −3.72% [−5.10%, −2.20%] against the baseline over 240 time points (…)." */
  readonly change: string;
  readonly main: ReportTable;
  /** What the intervals mean (their level and how they relate to the tests). */
  readonly intervalNote: string;
  readonly notes: readonly string[];
  /** Options that differ from the defaults, as typed (files left out: they are under inputs). */
  readonly changedSettings: string;
  readonly details: ReportTable;
  readonly detailNotes: readonly string[];
  readonly horizons: ReportTable | null;
  readonly series: { readonly summary: string; readonly table: ReportTable } | null;
  readonly paths: { readonly summary: string; readonly table: ReportTable | null } | null;
  readonly inputs: { readonly table: ReportTable; readonly lines: readonly string[] };
  /** The backtest checks, when the report has them. */
  readonly checks: ReportTable | null;
  readonly settings: ReportTable;
}

const VERDICT_WORD = { pass: 'PASS', warn: 'WARN', fail: 'FAIL' } as const;
const GATE_WORD = {
  pass: 'The gate passes',
  warn: 'The gate passes with a warning',
  fail: 'The gate fails',
} as const;

export interface SectionOptions {
  /** File paths are shown relative to this directory when they lie inside it. */
  readonly workingDirectory?: string;
}

export function reportSections(report: ReportView, options: SectionOptions = {}): ReportSections {
  const overall = report.comparisons[0];
  if (overall === undefined) throw new Error('a report needs the overall comparison');
  const paths = (f: string) => displayPath(f, options.workingDirectory);
  const reasons = decidingReasons(report);
  const first = reasons[0];
  const lead = `${GATE_WORD[report.verdict]}: ${first?.text ?? 'no finding'}.`;
  const interval = relativeInterval(overall);
  const onCommon = report.inputs.rowsDropped.baseline > 0 ? ' on the rows both models scored' : '';
  const change =
    overall.relativeDifference === null
      ? `Mean loss ${significant(overall.meanCandidateLoss)} against the baseline's ${significant(overall.meanBaselineLoss)}${onCommon}, over ${overall.n} time points.`
      : `Mean loss ${percent(overall.relativeDifference)}${
          interval === null
            ? ''
            : ` (${pct(interval.level)} interval ${
                interval.pieces === undefined && interval.lower !== null && interval.upper !== null
                  ? `${percent(interval.lower)} to ${percent(interval.upper)}`
                  : intervalText(interval)
              })`
        } against the baseline${onCommon}, over ${overall.n} time points${
          overall.firstTimestamp === null
            ? ''
            : ` from ${overall.firstTimestamp} to ${overall.lastTimestamp}`
        }.`;

  const options_ = settingsAsOptions(report.settings, paths);
  return {
    title: report.name === '' ? 'skillgate' : `skillgate · ${report.name}`,
    verdict: report.verdict,
    reasons,
    lead,
    change,
    main: mainTable(report, overall),
    intervalNote: intervalNote(report),
    notes: mainNotes(reasons),
    changedSettings: asCommandLine(options_.filter((o) => !o.isDefault && !o.file)),
    details: detailsTable(report, overall),
    detailNotes: detailNotes(report, overall),
    horizons: horizonTable(report),
    series: seriesSection(report),
    paths: pathSection(report),
    inputs: inputSection(report, paths),
    checks: checksTable(report),
    settings: settingsTable(options_),
  };
}

function pct(level: number): string {
  return `${Number((level * 100).toPrecision(3))}%`;
}

function changeHeader(rows: readonly ComparisonView[]): string {
  const level = rows.map(relativeInterval).find((i) => i !== null)?.level;
  return level === undefined ? 'change' : `change [${pct(level)} interval]`;
}

/** At most six columns, so it fits a pull-request column: scope, losses, change, evidence, verdict. */
function mainTable(report: ReportView, overall: ComparisonView): ReportTable {
  const gate = report.verdict;
  const verdict =
    gate === overall.verdict
      ? VERDICT_WORD[gate]
      : `${VERDICT_WORD[gate]} (tests alone: ${overall.verdict})`;
  const scope = report.inputs.rowsDropped.baseline > 0 ? 'overall, common rows' : 'overall';
  const rows: string[][] = [
    [
      scope,
      significant(overall.meanBaselineLoss),
      significant(overall.meanCandidateLoss),
      changeCell(overall),
      evidenceOf(overall, report),
      verdict,
    ],
  ];
  const recent = report.stability?.recent ?? null;
  if (recent !== null) {
    rows.push([
      `recent: ${recent.firstTimestamp ?? 'n/a'} to ${recent.lastTimestamp ?? 'n/a'}`,
      significant(recent.meanBaselineLoss),
      significant(recent.meanCandidateLoss),
      changeCell(recent),
      evidenceOf(recent, report),
      `${recent.verdict} on its own`,
    ]);
  }
  return table(
    ['scope', 'baseline loss', 'candidate loss', changeHeader([overall]), 'evidence', 'verdict'],
    ['left', 'right', 'right', 'right', 'left', 'left'],
    rows,
  );
}

function mainNotes(reasons: readonly DecidingReason[]): string[] {
  const notes: string[] = [];
  for (const r of reasons.slice(1)) notes.push(`Also: ${r.text}.`);
  return notes;
}

function detailsTable(report: ReportView, c: ComparisonView): ReportTable {
  const dm = c.dieboldMariano;
  const bs = c.bootstrap;
  const interval = (i: ComparisonView['bootstrap']['interval']) =>
    i === null
      ? 'n/a'
      : `[${significant(i.lower)}, ${significant(i.upper)}] (${pct(i.level)})${measuredCoverageText(i.measuredCoverage)}`;
  const rows: string[][] = [
    [
      'statistic',
      dm.smallSample === null
        ? significant(dm.statistic)
        : `${significant(dm.smallSample.statistic)} (Harvey–Leybourne–Newbold; raw ${significant(dm.statistic)})`,
      bs.standardError === null ? 'n/a' : `standard error of d̄ ${significant(bs.standardError)}`,
    ],
    ['p, one-sided: candidate worse', pValue(smallSampleValue(dm)), pValue(bs.pValue)],
    [
      'p, in the policy’s direction (decides)',
      pValue(dm.decisionPValue),
      pValue(bs.decisionPValue),
    ],
    ['p, two-sided', pValue(smallSampleValue(dm, 'pValueTwoSided')), pValue(bs.pValueTwoSided)],
    ['interval for E[L_candidate − L_baseline]', interval(dm.interval), interval(bs.interval)],
    [
      'rejects H0 at α',
      c.rejected.dieboldMariano === null ? 'n/a' : c.rejected.dieboldMariano ? 'yes' : 'no',
      c.rejected.bootstrap === null ? 'n/a' : c.rejected.bootstrap ? 'yes' : 'no',
    ],
    [
      'variance',
      `${dm.estimator}${dm.estimator === dm.requestedEstimator ? '' : ` (asked: ${dm.requestedEstimator})`}, long-run variance ω̂² ${significant(dm.longRunVariance)}`,
      `expected block length ${significant(bs.expectedBlockLength, 3)} (${bs.blockLengthRule})`,
    ],
    [
      'lag / resamples',
      `lag ${dm.lag ?? 'n/a (fixed-b)'}, ${dm.degreesOfFreedom === null ? 'normal reference' : `${significant(dm.degreesOfFreedom, 3)} df`}`,
      `${bs.resamples} resamples, seed ${bs.seed}`,
    ],
  ];
  const coverage = report.inputs.intervalCoverage;
  if (coverage !== null) {
    rows.push([
      `coverage of the ${pct(coverage.nominal)} interval`,
      `baseline ${percent(coverage.baseline).replace('+', '')}`,
      `candidate ${percent(coverage.candidate).replace('+', '')}`,
    ]);
  }
  return table(['', 'Diebold–Mariano', 'stationary bootstrap'], ['left', 'left', 'left'], rows);
}

function detailNotes(report: ReportView, c: ComparisonView): string[] {
  const p = report.policy;
  const k = p.baselineFactor;
  const d =
    k === 1
      ? 'd_t = L_candidate − L_baseline'
      : `d_t = L_candidate − ${Number(k.toPrecision(6))} · L_baseline`;
  const boundary = p.boundary === 0 ? '0' : significant(p.boundary);
  return [
    `Loss: ${LOSS_LABELS[c.loss]}. Tested differential ${d} (mean ${significant(c.meanTestedDifferential)}); H0 says E[d] is on the ${
      p.onReject === 'fail' ? 'low' : 'high'
    } side of ${boundary}.`,
    `H0: ${p.nullHypothesis}. H1: ${p.alternative}. Rejecting H0 makes the gate ${p.onReject}; each test is one-sided at α = ${p.alpha}.`,
    ...report.reasons.filter((r) => !r.startsWith('The candidate lacks')),
    ...c.reasons,
    ...[...c.dieboldMariano.notes, ...c.bootstrap.notes].map((n) => `Note: ${n}`),
  ];
}

/**
 * Per-horizon rows for locating a change: the policy's p-values are Holm-adjusted across the
 * horizons (Holm 1979), and the table has no verdict column, so no row reads as the gate's.
 */
function horizonTable(report: ReportView): ReportTable | null {
  const rows = report.comparisons.filter(
    (c) => c.horizon !== 'all' && c.series === 'all' && c.path === undefined,
  );
  if (rows.length === 0) return null;
  const adjusted = holmAdjust(rows.map((c) => c.dieboldMariano.decisionPValue));
  return table(
    [
      'horizon',
      'baseline loss',
      'candidate loss',
      changeHeader(rows),
      'evidence',
      'policy p, Holm',
    ],
    ['left', 'right', 'right', 'right', 'left', 'right'],
    rows.map((c, j) => [
      String(c.horizon),
      significant(c.meanBaselineLoss),
      significant(c.meanCandidateLoss),
      changeCell(c),
      evidenceOf(c, report),
      pValue(adjusted[j]),
    ]),
  );
}

const SERIES_ROWS = 50;

function seriesSection(report: ReportView): ReportSections['series'] {
  const s = report.seriesSummary;
  if (s === null) return null;
  const method = ADJUSTMENTS[s.method].name;
  const rows = report.comparisons
    .filter((c) => c.series !== 'all')
    .sort((a, b) => (b.relativeDifference ?? 0) - (a.relativeDifference ?? 0));
  const shown =
    rows.length <= SERIES_ROWS
      ? rows
      : [...rows.slice(0, SERIES_ROWS / 2), ...rows.slice(-SERIES_ROWS / 2)];
  const summary = `${s.series} series: ${s.worse} worse, ${s.better} better, ${s.noEvidence} with no clear difference (Diebold–Mariano on L_candidate − L_baseline per series, ${method}-adjusted, α = ${s.alpha}; whatever the policy, "worse" needs evidence of a higher loss and "better" of a lower one).${
    shown.length < rows.length
      ? ` Shown: the ${SERIES_ROWS / 2} largest increases and the ${SERIES_ROWS / 2} largest decreases.`
      : ''
  }`;
  return {
    summary,
    table: table(
      ['series', 'baseline loss', 'candidate loss', 'change', 'evidence', `adjusted p`],
      ['left', 'right', 'right', 'right', 'left', 'right'],
      shown.map((c) => [
        String(c.series),
        significant(c.meanBaselineLoss),
        significant(c.meanCandidateLoss),
        percent(c.relativeDifference),
        evidenceOf(c, report),
        pValue(c.directionPValue ?? c.adjustedPValue),
      ]),
    ),
  };
}

function pathSection(report: ReportView): ReportSections['paths'] {
  const s = report.pathSummary;
  if (s === null) return null;
  const rows = report.comparisons.filter((c) => c.path !== undefined);
  return {
    summary: `The candidate's mean loss is higher on ${s.worse} of ${s.paths} backtest paths (${percent(s.shareWorse).replace('+', '')}), significantly so (one-sided Diebold–Mariano, p ≤ ${report.policy.alpha}, unadjusted) on ${s.significantlyWorse}. The verdict tests the path-averaged differential.`,
    table:
      rows.length > 50
        ? null
        : table(
            ['path', 'baseline loss', 'candidate loss', 'change', 'p, worse'],
            ['left', 'right', 'right', 'right', 'right'],
            rows.map((c) => [
              c.path ?? '',
              significant(c.meanBaselineLoss),
              significant(c.meanCandidateLoss),
              percent(c.relativeDifference),
              pValue(smallSampleValue(c.dieboldMariano)),
            ]),
          ),
  };
}

function inputSection(report: ReportView, paths: (f: string) => string): ReportSections['inputs'] {
  const i = report.inputs;
  const d = i.rowsDropped;
  const lines = [
    ...inputNotes(report),
    `Rows matched: ${i.rowsMatched} over ${i.timestamps.count} timestamps (${i.timestamps.first ?? 'n/a'} to ${i.timestamps.last ?? 'n/a'}), ${i.series} series, horizons ${compactRange(i.horizons)}.`,
    `Left out: ${d.baseline} baseline rows the candidate lacks, ${d.candidate} candidate rows the baseline lacks, ${d.withoutActual} rows without an actual, ${d.actualsUnused} unused actuals, ${d.skippedByLoss} rows skipped by the loss.`,
  ];
  return {
    table: table(
      ['file', 'role', 'rows', 'blank lines', 'columns not used', 'sha256'],
      ['left', 'left', 'right', 'right', 'left', 'left'],
      i.files.map((f) => [
        paths(f.path),
        f.role,
        String(f.rows),
        String(f.blankLines),
        f.ignoredColumns.join(', '),
        f.sha256.replace(/^sha256:/, '').slice(0, 12),
      ]),
    ),
    lines,
  };
}

function checksTable(report: ReportView): ReportTable | null {
  const checks = report.integrity.checks;
  if (checks.length === 0) return null;
  return table(
    ['check', 'status', 'found', 'examples'],
    ['left', 'left', 'right', 'left'],
    checks.map((c) => [c.id, c.status, String(c.count), c.examples.slice(0, 3).join('; ')]),
  );
}

/** 1–24, or 1, 3, 6. */
export function compactRange(values: readonly number[]): string {
  if (values.length === 0) return '1';
  const contiguous = values.every((v, j) => j === 0 || v === values[j - 1]! + 1);
  if (contiguous && values.length > 2) return `${values[0]}–${values.at(-1)}`;
  return values.join(', ');
}

function settingsTable(options: readonly OptionValue[]): ReportTable {
  return table(
    ['option', 'value', 'default'],
    ['left', 'left', 'left'],
    options.map((o) => [
      `--${o.name}`,
      o.value === '' ? '(none)' : o.value,
      o.isDefault ? 'yes' : 'no',
    ]),
  );
}
