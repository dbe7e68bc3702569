import { TIME_FORMAT_NAMES } from '../alignment/timeFormat.js';
import { SELECTION_RULES } from '../candidates/decideCandidates.js';
import { AGREEMENTS, MARGIN_KINDS, POLICIES, SHORT_DATA_VERDICTS } from '../decision/policy.js';
import { CHECK_MODES } from '../integrity/checkResult.js';
import { LOSS_ALIASES, LOSS_NAMES } from '../losses/lossName.js';
import { ZERO_ACTUALS_RULES } from '../losses/rowLosses.js';
import { ADJUSTMENT_METHODS } from '../multiplicity/adjustmentMethod.js';
import { DECIMAL_MARKS, DELIMITER_NAMES, INPUT_FORMATS } from '../reading/inputFormat.js';
import { POOLINGS, SCALE_KINDS } from '../scaling/pooling.js';
import { FLUCTUATION_SIDES } from '../stability/fluctuationCriticalValues.js';
import { STABILITY_GATE_MODES } from '../stability/stabilityFinding.js';
import { CONFIDENCE_SET_STATISTICS } from '../statistics/modelConfidenceSet.js';
import { VARIANCE_ESTIMATORS } from '../statistics/varianceEstimator.js';

/**
 * The engine's options, in one place: the CLI's flags (`--name`) and the action's inputs (`name`)
 * are both read from this table, so the two cannot drift apart. `action.yml` mirrors it (a test
 * checks that).
 */
export interface OptionSpec {
  readonly name: string;
  /** Default as text, or null when the option is required / has no default. */
  readonly defaultValue: string | null;
  readonly required?: boolean;
  /** Takes no value on the CLI (a switch); in the action it is "true"/"false". */
  readonly flag?: boolean;
  readonly choices?: readonly string[];
  /** How --help names the value (default VALUE). */
  readonly valueName?: string;
  readonly help: string;
}

export const ENGINE_OPTIONS: readonly OptionSpec[] = [
  {
    name: 'baseline',
    valueName: 'FILE',
    defaultValue: null,
    required: true,
    help: 'predictions of the model on the main branch (CSV/TSV, optionally .gz)',
  },
  {
    name: 'candidate',
    valueName: 'FILE|NAME=FILE',
    defaultValue: null,
    required: true,
    help: "predictions of the pull request's model; repeat as NAME=FILE (one per line in the action) to test several candidates at once (the name defaults to the file's stem)",
  },
  {
    name: 'model-column',
    valueName: 'COLUMN',
    defaultValue: '',
    help: 'several candidates in one long candidate file: the column naming the model of each row',
  },
  {
    name: 'baseline-model',
    valueName: 'NAME',
    defaultValue: '',
    help: 'with --model-column: the model of that file that is the baseline (then no --baseline file)',
  },
  {
    name: 'preferred',
    valueName: 'NAME',
    defaultValue: '',
    help: 'with several candidates: the one the pull request would ship (default: the lowest mean loss)',
  },
  {
    name: 'selection-rule',
    defaultValue: 'preferred-in-set',
    choices: SELECTION_RULES,
    help: 'with several candidates: preferred-in-set passes when the preferred candidate is in the model confidence set and passes its own comparison; none-worse fails on evidence that some candidate is worse than the baseline (SPA test); some-better passes only on evidence that some candidate is better (SPA test)',
  },
  {
    name: 'set-alpha',
    valueName: 'NUMBER',
    defaultValue: '0.1',
    help: 'with several candidates: α of the model confidence set, which then holds the best models with probability 1 − α (0.1 as in Hansen, Lunde & Nason 2011)',
  },
  {
    name: 'set-statistic',
    defaultValue: 'max',
    choices: CONFIDENCE_SET_STATISTICS,
    help: 'with several candidates: statistic of the model confidence set, max (T_max) or range (T_R; over-rejects with skewed losses at a few hundred points, see docs/validation.md)',
  },
  {
    name: 'losses',
    valueName: 'FILE',
    defaultValue: null,
    help: 'instead of baseline and candidate: a pre-aggregated file with timestamp, baseline_loss, candidate_loss (optional differential, rows, horizon) per time point',
  },
  {
    name: 'actuals',
    valueName: 'FILE',
    defaultValue: null,
    help: 'observed values keyed by series and timestamp, when the prediction files lack an actual column',
  },
  {
    name: 'columns',
    valueName: 'ROLE=HEADER,…',
    defaultValue: '',
    help: 'rename columns, e.g. actual=observed,prediction=point,series=zone',
  },
  {
    name: 'baseline-columns',
    valueName: 'ROLE=HEADER,…',
    defaultValue: '',
    help: 'renames for the baseline file only, over --columns (two pipelines that name columns differently)',
  },
  {
    name: 'candidate-columns',
    valueName: 'ROLE=HEADER,…',
    defaultValue: '',
    help: 'renames for the candidate file only, over --columns',
  },
  {
    name: 'format',
    defaultValue: 'auto',
    choices: INPUT_FORMATS,
    help: 'input format; auto: Parquet for .parquet, TSV for .tsv/.tsv.gz, else CSV',
  },
  {
    name: 'delimiter',
    defaultValue: 'auto',
    choices: DELIMITER_NAMES,
    help: 'field separator of CSV files: auto (tab for TSV, else comma), or comma , semicolon ; pipe | tab',
  },
  {
    name: 'decimal',
    defaultValue: '.',
    choices: DECIMAL_MARKS,
    help: 'decimal mark of numbers in CSV files; "," (decimal comma) needs another --delimiter',
  },
  {
    name: 'time-format',
    defaultValue: 'auto',
    choices: TIME_FORMAT_NAMES,
    help: 'how timestamps read: auto (all numbers or all ISO 8601, else refused), number, iso-8601, day-month-year (31/12/2026 [23:59[:59]]), month-day-year (12/31/2026 [23:59[:59]]), text-order (compare as text: 10 before 9)',
  },
  {
    name: 'line-limit',
    valueName: 'BYTES',
    defaultValue: '1048576',
    help: 'longest line (and field) accepted in a CSV file, in characters; longer is refused',
  },
  {
    name: 'loss',
    defaultValue: 'squared',
    choices: [...LOSS_NAMES, ...Object.keys(LOSS_ALIASES)],
    help: 'loss per row (mse = squared, mae = absolute, mape = ape): squared, absolute, ape (absolute percentage), sape (symmetric), pinball (quantile columns), interval (interval score of --interval)',
  },
  {
    name: 'zero-actuals',
    defaultValue: 'error',
    choices: ZERO_ACTUALS_RULES,
    help: 'with ape: refuse rows whose actual is 0, or skip and count them',
  },
  {
    name: 'alpha',
    valueName: 'NUMBER',
    defaultValue: '0.05',
    help: 'significance level of each one-sided test',
  },
  {
    name: 'margin',
    valueName: 'NUMBER|PERCENT%',
    defaultValue: '0',
    help: 'allowed margin: with --margin-kind relative, 0.02 or 2% means the candidate may be up to 2% worse (a relative margin above 1 must be written as a percentage)',
  },
  {
    name: 'margin-kind',
    defaultValue: 'relative',
    choices: MARGIN_KINDS,
    help: 'relative (fraction of the baseline loss) or absolute (loss units)',
  },
  {
    name: 'policy',
    defaultValue: 'no-regression',
    choices: POLICIES,
    help: 'no-regression: fail only on evidence the candidate is worse than the margin; non-inferiority: pass only on evidence it is not; superiority: pass only on evidence it is better by the margin',
  },
  {
    name: 'agreement',
    defaultValue: 'both',
    choices: AGREEMENTS,
    help: 'which tests must reject for the decision; with both, a split verdict is a warning',
  },
  {
    name: 'variance',
    defaultValue: 'ewc-ar1',
    choices: VARIANCE_ESTIMATORS,
    help: 'long-run variance for Diebold–Mariano: ewc-ar1 (equal-weighted cosine, fixed-b, cosine terms from the data), ewc (the same with 0.4·n^(2/3) terms), bartlett (Newey–West), uniform',
  },
  {
    name: 'lag',
    valueName: 'auto|h-1|N',
    defaultValue: 'auto',
    help: 'HAC lag for bartlett/uniform: auto (Newey–West 1994, at least h−1), h-1, or a number',
  },
  {
    name: 'block-length',
    valueName: 'auto|N',
    defaultValue: 'auto',
    help: 'expected block length of the stationary bootstrap: auto (Politis–White) or a number ≥ 1',
  },
  { name: 'resamples', valueName: 'N', defaultValue: '9999', help: 'bootstrap resamples' },
  {
    name: 'seed',
    valueName: 'N',
    defaultValue: '1729',
    help: 'seed of the bootstrap random numbers (same seed, same numbers on every machine)',
  },
  {
    name: 'confidence',
    valueName: 'NUMBER',
    defaultValue: '',
    help: 'level of the intervals in the report; default 1 − 2·alpha (0.9 for alpha 0.05), so each end is the one-sided bound of the tests and the interval shows the decision at any margin; another level may disagree with the tests',
  },
  {
    name: 'min-points',
    valueName: 'N',
    defaultValue: '30',
    help: 'fewest time points for a firm verdict (fewer: too little data)',
  },
  {
    name: 'short-data',
    defaultValue: 'warn',
    choices: SHORT_DATA_VERDICTS,
    help: 'verdict when there are fewer time points than --min-points',
  },
  {
    name: 'allow-missing',
    defaultValue: 'false',
    flag: true,
    help: 'let the gate pass although the candidate lacks rows the baseline has',
  },
  {
    name: 'interval',
    valueName: 'LOWER,UPPER',
    defaultValue: '',
    help: 'with --loss interval: the two quantile levels of the central interval, e.g. 0.1,0.9 (an 80% interval)',
  },
  {
    name: 'pooling',
    defaultValue: 'raw',
    choices: POOLINGS,
    help: 'pool raw losses across series, or losses divided by a per-series scale (so no large series dominates)',
  },
  {
    name: 'scale',
    defaultValue: 'baseline',
    choices: SCALE_KINDS,
    help: "with --pooling scaled: each series' mean baseline loss, or the in-sample error of the seasonal naive forecast on --history (as in MASE)",
  },
  {
    name: 'history',
    valueName: 'FILE',
    defaultValue: null,
    help: 'in-sample history (series, timestamp, actual) for --scale seasonal-naive',
  },
  {
    name: 'season',
    valueName: 'N',
    defaultValue: '1',
    help: 'period m of the seasonal naive forecast for --scale seasonal-naive (1: naive)',
  },
  {
    name: 'weights',
    defaultValue: 'false',
    flag: true,
    help: 'weight rows by the weight column when averaging losses per time point',
  },
  {
    name: 'adjust',
    defaultValue: 'holm',
    choices: ADJUSTMENT_METHODS,
    help: 'multiplicity adjustment of the per-series p-values: holm (family-wise error) or bh (false discovery rate)',
  },
  {
    name: 'top',
    valueName: 'N',
    defaultValue: '10',
    help: 'how many series with the largest significant regressions to list',
  },
  {
    name: 'recent',
    valueName: 'N|P%',
    defaultValue: '',
    help: 'also compare on the most recent window: the last N time points, or the last P% of them (e.g. 15%)',
  },
  {
    name: 'fluctuation-window',
    valueName: 'MU',
    defaultValue: '0.2',
    help: 'window of the fluctuation test (Giacomini–Rossi) as a fraction of the time points, 0.1 to 0.9',
  },
  {
    name: 'fluctuation-sides',
    defaultValue: 'one',
    choices: FLUCTUATION_SIDES,
    help: 'fluctuation test against a candidate worse in some stretch (one) or a difference of either sign (two)',
  },
  {
    name: 'stability-gate',
    defaultValue: 'warn',
    choices: STABILITY_GATE_MODES,
    help: 'what a candidate significantly worse recently or in some stretch does to the gate: nothing, warn, or fail',
  },
  {
    name: 'frequency',
    valueName: 'auto|STEP',
    defaultValue: 'auto',
    help: 'step of the time grid for the backtest checks: auto (inferred from the timestamps), a count and unit (s, min, h, d, bd for business days, w, mo, q, y; e.g. 1h, 1d, 1mo), or a number for numeric timestamps',
  },
  {
    name: 'folds',
    valueName: 'FILE',
    defaultValue: null,
    help: 'fold layout (fold or path, role train|test, start, end; one row per segment) to check purging, embargo and that every row lies in its test window',
  },
  {
    name: 'embargo',
    valueName: 'N',
    defaultValue: '0',
    help: 'with --folds: steps after each test window that training must also avoid',
  },
  {
    name: 'backtest-checks',
    defaultValue: 'enforce',
    choices: CHECK_MODES,
    help: 'enforce: look-ahead and rows outside their test window fail the gate, other findings warn; warn: every finding warns; report: findings are shown but leave the verdict alone',
  },
  {
    name: 'name',
    valueName: 'TEXT',
    defaultValue: '',
    help: 'a name for this comparison (report title; keeps two gates apart on one pull request)',
  },
  {
    name: 'json',
    valueName: 'FILE',
    defaultValue: null,
    help: 'write the JSON report to this file (- for standard output)',
  },
  {
    name: 'markdown',
    valueName: 'FILE',
    defaultValue: null,
    help: 'write the Markdown report to this file (- for standard output)',
  },
  {
    name: 'html',
    valueName: 'FILE',
    defaultValue: null,
    help: 'write the report as one self-contained HTML file (charts as inline SVG; opens offline)',
  },
];
