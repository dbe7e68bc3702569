import { TIME_FORMAT_NAMES } from '../alignment/timeFormat.js';
import { parseCandidateList } from '../candidates/candidateList.js';
import { SELECTION_RULES } from '../candidates/decideCandidates.js';
import { InputError } from '../core/inputError.js';
import { AGREEMENTS, MARGIN_KINDS, POLICIES, SHORT_DATA_VERDICTS } from '../decision/policy.js';
import { CHECK_MODES } from '../integrity/checkResult.js';
import { FREQUENCY_SYNTAX, parseFrequency } from '../integrity/frequency.js';
import { canonicalLoss } from '../losses/lossName.js';
import { ZERO_ACTUALS_RULES } from '../losses/rowLosses.js';
import { ADJUSTMENT_METHODS } from '../multiplicity/adjustmentMethod.js';
import { parseColumnMapping } from '../reading/columnMapping.js';
import {
  DECIMAL_MARKS,
  DELIMITER_NAMES,
  type DecimalMark,
  INPUT_FORMATS,
} from '../reading/inputFormat.js';
import { POOLINGS, SCALE_KINDS } from '../scaling/pooling.js';
import { FLUCTUATION_SIDES } from '../stability/fluctuationCriticalValues.js';
import { parseRecentWindow } from '../stability/recentWindow.js';
import { STABILITY_GATE_MODES } from '../stability/stabilityFinding.js';
import type { BlockLengthRule } from '../statistics/bootstrap/blockLengthRule.js';
import { CONFIDENCE_SET_STATISTICS } from '../statistics/modelConfidenceSet.js';
import type { LagRule } from '../statistics/neweyWestLag.js';
import { VARIANCE_ESTIMATORS } from '../statistics/varianceEstimator.js';
import { defaultConfidence } from './defaultConfidence.js';
import { ENGINE_OPTIONS, type OptionSpec } from './options.js';
import type { Settings } from './settings.js';

/** Raw option values by option name (as typed by the user, before validation). */
export type RawOptions = Readonly<Record<string, string | undefined>>;

/**
 * Validates raw option text into Settings. `label(name)` says how the user spelled the option
 * (`--alpha` on the CLI, input `alpha` in the action) so messages point at what they typed.
 * Every failure is an InputError naming the option and the value.
 */
export function resolveSettings(raw: RawOptions, label: (name: string) => string): Settings {
  const value = (name: string): string => {
    const spec = specOf(name);
    const given = raw[name];
    const text = given === undefined || given === '' ? spec.defaultValue : given.trim();
    if (text === null || (spec.required && text === '')) {
      throw new InputError(`${label(name)} is required: ${spec.help}`);
    }
    if (spec.choices !== undefined && !spec.choices.includes(text)) {
      throw new InputError(`${label(name)} must be one of ${spec.choices.join(', ')}`, {
        value: text,
      });
    }
    return text;
  };
  /** The option's value as one of its listed values (the table's choices are those lists). */
  const choice = <T extends string>(name: string, values: readonly T[]): T => {
    const text = value(name);
    const found = values.find((v) => v === text);
    if (found === undefined) throw new Error(`option ${name} lists other choices than ${values}`);
    return found;
  };
  const optional = (name: string): string | null => {
    const given = raw[name]?.trim();
    return given === undefined || given === '' ? null : given;
  };
  const number = (name: string, check: (x: number) => boolean, expected: string): number => {
    const text = value(name);
    const x = Number(text);
    if (text === '' || !Number.isFinite(x) || !check(x)) {
      throw new InputError(`${label(name)} must be ${expected}`, { value: text });
    }
    return x;
  };
  const integer = (name: string, min: number, max = Number.MAX_SAFE_INTEGER): number =>
    number(
      name,
      (x) => Number.isInteger(x) && x >= min && x <= max,
      `an integer from ${min} to ${max}`,
    );
  const bool = (name: string): boolean => {
    const text = value(name).toLowerCase();
    if (text === 'true') return true;
    if (text === 'false') return false;
    throw new InputError(`${label(name)} must be true or false`, { value: text });
  };

  const losses = optional('losses');
  if (losses !== null) {
    for (const name of ['baseline', 'candidate', 'actuals']) {
      if (optional(name) !== null) {
        throw new InputError(
          `${label('losses')} replaces ${label('baseline')} and ${label('candidate')}; give one or the other`,
          {
            value: name,
          },
        );
      }
    }
  }
  const alpha = number(
    'alpha',
    (x) => x > 0 && x < 0.5,
    'a number between 0 and 0.5, such as 0.05',
  );
  const baselineModel = optional('baseline-model');
  const modelColumn = optional('model-column');
  if (baselineModel !== null && (modelColumn === null || optional('baseline') !== null)) {
    throw new InputError(
      `${label('baseline-model')} takes the baseline from the ${label('model-column')} file; give it with ${label('model-column')} and without ${label('baseline')}`,
      { value: baselineModel },
    );
  }
  const candidates =
    losses === null ? parseCandidateList(value('candidate'), label('candidate')) : [];
  if (modelColumn !== null && candidates.length !== 1) {
    throw new InputError(
      `${label('model-column')} reads every candidate from one file; give exactly one ${label('candidate')} file`,
      { value: modelColumn },
    );
  }
  return {
    name: value('name'),
    baseline: losses === null && baselineModel === null ? value('baseline') : '',
    candidate: candidates[0]?.path ?? '',
    // Listed only when several are compared (or read from a model column): a two-model report
    // keeps the settings it always had.
    candidates: candidates.length > 1 || modelColumn !== null ? candidates : [],
    modelColumn,
    baselineModel,
    preferred: optional('preferred'),
    selectionRule: choice('selection-rule', SELECTION_RULES),
    setAlpha: number('set-alpha', (x) => x > 0 && x < 1, 'a number between 0 and 1, such as 0.1'),
    setStatistic: choice('set-statistic', CONFIDENCE_SET_STATISTICS),
    losses,
    actuals: optional('actuals'),
    columns: parseColumnMapping(value('columns'), label('columns')),
    baselineColumns: parseColumnMapping(value('baseline-columns'), label('baseline-columns')),
    candidateColumns: parseColumnMapping(value('candidate-columns'), label('candidate-columns')),
    format: choice('format', INPUT_FORMATS),
    delimiter: choice('delimiter', DELIMITER_NAMES),
    decimal: parseDecimalMark(choice('decimal', DECIMAL_MARKS), value('delimiter'), label),
    timeFormat: choice('time-format', TIME_FORMAT_NAMES),
    lineLimit: integer('line-limit', 1024, 1 << 28),
    loss: canonicalLoss(value('loss')),
    zeroActuals: choice('zero-actuals', ZERO_ACTUALS_RULES),
    alpha,
    margin: parseMargin(value('margin'), value('margin-kind'), label),
    marginKind: choice('margin-kind', MARGIN_KINDS),
    policy: choice('policy', POLICIES),
    agreement: choice('agreement', AGREEMENTS),
    variance: choice('variance', VARIANCE_ESTIMATORS),
    lag: parseLag(value('lag'), label('lag')),
    blockLength: parseBlockLength(value('block-length'), label('block-length')),
    resamples: integer('resamples', 99, 10_000_000),
    seed: integer('seed', 0, 2 ** 31 - 1),
    confidence:
      optional('confidence') === null
        ? defaultConfidence(alpha)
        : number('confidence', (x) => x > 0.5 && x < 1, 'a number between 0.5 and 1, such as 0.9'),
    minPoints: integer('min-points', 1),
    shortData: choice('short-data', SHORT_DATA_VERDICTS),
    allowMissing: bool('allow-missing'),
    interval: parseInterval(
      value('interval'),
      label('interval'),
      canonicalLoss(value('loss')) === 'interval',
    ),
    pooling: choice('pooling', POOLINGS),
    scale: choice('scale', SCALE_KINDS),
    history: optional('history'),
    season: integer('season', 1),
    weights: bool('weights'),
    adjust: choice('adjust', ADJUSTMENT_METHODS),
    top: integer('top', 0, 10_000),
    recent: parseRecentWindow(value('recent'), label('recent')),
    fluctuationWindow: number(
      'fluctuation-window',
      (x) => x >= 0.1 && x <= 0.9,
      'a number from 0.1 to 0.9 (the window as a fraction of the time points)',
    ),
    fluctuationSides: choice('fluctuation-sides', FLUCTUATION_SIDES),
    stabilityGate: choice('stability-gate', STABILITY_GATE_MODES),
    frequency: parseFrequencyOption(value('frequency'), label('frequency')),
    folds: optional('folds'),
    embargo: integer('embargo', 0, 1_000_000),
    backtestChecks: choice('backtest-checks', CHECK_MODES),
    json: optional('json'),
    markdown: optional('markdown'),
    html: optional('html'),
  };
}

/**
 * The margin as a number: "0.02" or "2%" (= 0.02). A relative margin above 1 (the candidate may be
 * more than twice as bad) is nearly always a percentage typed without its sign ("5" for 5%), so it
 * is refused unless written as a percentage ("150%") or made absolute.
 */
function parseMargin(text: string, kind: string, label: (name: string) => string): number {
  const percent = text.endsWith('%');
  const body = percent ? text.slice(0, -1).trim() : text;
  const x = body === '' ? Number.NaN : Number(body);
  if (!Number.isFinite(x) || x < 0) {
    throw new InputError(
      `${label('margin')} must be a number ≥ 0 or a percentage (0.02 or 2% with ${label('margin-kind')} relative)`,
      { value: text },
    );
  }
  if (percent) {
    if (kind !== 'relative') {
      throw new InputError(
        `${label('margin')} as a percentage needs ${label('margin-kind')} relative (an absolute margin is in loss units)`,
        { value: text },
      );
    }
    return x / 100;
  }
  if (kind === 'relative' && x > 1) {
    throw new InputError(
      `${label('margin')} ${text} with ${label('margin-kind')} relative would allow the candidate to be ${x * 100}% worse; write ${text}% for ${text} percent, ${x / 100} for the same as a fraction, or set ${label('margin-kind')} absolute for loss units`,
      { value: text },
    );
  }
  return x;
}

/** The decimal mark, which must differ from the field separator. */
function parseDecimalMark(
  text: DecimalMark,
  delimiter: string,
  label: (name: string) => string,
): DecimalMark {
  // With delimiter auto the reader decides per file (a TSV file is fine, a CSV file is refused).
  if (text === ',' && delimiter === ',') {
    throw new InputError(
      `${label('decimal')} , (decimal comma) needs a field separator other than the comma: add ${label('delimiter')} ";" (or tab, |)`,
      { value: text },
    );
  }
  return text;
}

function specOf(name: string): OptionSpec {
  const spec = ENGINE_OPTIONS.find((o) => o.name === name);
  if (spec === undefined) throw new Error(`unknown option ${name}`);
  return spec;
}

function parseInterval(
  text: string,
  label: string,
  needed: boolean,
): readonly [number, number] | null {
  if (text === '') {
    if (needed) throw new InputError(`${label} is required with the interval loss, e.g. 0.1,0.9`);
    return null;
  }
  const parts = text.split(',').map((p) => Number(p.trim()));
  const [lower, upper] = parts;
  if (
    parts.length !== 2 ||
    lower === undefined ||
    upper === undefined ||
    !(lower > 0 && lower < upper && upper < 1) ||
    Math.abs(lower + upper - 1) > 1e-9
  ) {
    throw new InputError(
      `${label} takes two quantile levels of a central interval, lower,upper with lower + upper = 1 (e.g. 0.1,0.9)`,
      { value: text },
    );
  }
  return [lower, upper];
}

function parseLag(text: string, label: string): LagRule {
  if (text === 'auto') return { kind: 'auto' };
  if (text === 'h-1') return { kind: 'horizon' };
  const lag = Number(text);
  if (!Number.isInteger(lag) || lag < 0) {
    throw new InputError(`${label} must be auto, h-1 or an integer ≥ 0`, { value: text });
  }
  return { kind: 'fixed', lag };
}

function parseBlockLength(text: string, label: string): BlockLengthRule {
  if (text === 'auto') return { kind: 'auto' };
  const length = Number(text);
  if (!Number.isFinite(length) || length < 1) {
    throw new InputError(`${label} must be auto or a number ≥ 1`, { value: text });
  }
  return { kind: 'fixed', length };
}

function parseFrequencyOption(text: string, label: string): string {
  if (text === 'auto' || parseFrequency(text) !== null) return text;
  throw new InputError(`${label} must be ${FREQUENCY_SYNTAX}`, { value: text });
}
