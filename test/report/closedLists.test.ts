import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { TIME_FORMAT_NAMES } from '../../src/alignment/timeFormat.js';
import { PREFERRED_BY } from '../../src/candidates/candidatesModel.js';
import { SELECTION_RULES } from '../../src/candidates/decideCandidates.js';
import { SPA_HYPOTHESES } from '../../src/candidates/superiorAbilityTest.js';
import { FILE_ROLES, TIMESTAMP_KINDS } from '../../src/core/panel.js';
import { SERIES_DIRECTIONS } from '../../src/decision/decideAdjusted.js';
import { ON_REJECT_VERDICTS } from '../../src/decision/hypothesis.js';
import {
  AGREEMENTS,
  MARGIN_KINDS,
  POLICIES,
  SHORT_DATA_VERDICTS,
} from '../../src/decision/policy.js';
import { VERDICTS } from '../../src/decision/verdict.js';
import {
  CHECK_IDS,
  CHECK_MODES,
  CHECK_STATUSES,
  FREQUENCY_SOURCES,
} from '../../src/integrity/checkResult.js';
import { LOSS_ALIASES, LOSS_NAMES } from '../../src/losses/lossName.js';
import { ZERO_ACTUALS_RULES } from '../../src/losses/rowLosses.js';
import { ADJUSTMENT_METHODS } from '../../src/multiplicity/adjustmentMethod.js';
import { COLUMN_ROLES } from '../../src/reading/columnMapping.js';
import { DECIMAL_MARKS, DELIMITER_NAMES, INPUT_FORMATS } from '../../src/reading/inputFormat.js';
import { BOOTSTRAP_STATES } from '../../src/report/reportModel.js';
import { POOLINGS, SCALE_KINDS } from '../../src/scaling/pooling.js';
import { ENGINE_OPTIONS } from '../../src/settings/options.js';
import { FLUCTUATION_SIDES } from '../../src/stability/fluctuationCriticalValues.js';
import { RECENT_WINDOW_KINDS } from '../../src/stability/recentWindow.js';
import { STABILITY_GATE_MODES } from '../../src/stability/stabilityFinding.js';
import { STABILITY_ADJUSTMENTS } from '../../src/stability/stabilityLevels.js';
import { BLOCK_LENGTH_RULE_KINDS } from '../../src/statistics/bootstrap/blockLengthRule.js';
import { DIEBOLD_MARIANO_STATES } from '../../src/statistics/dieboldMariano.js';
import { CONFIDENCE_SET_STATISTICS } from '../../src/statistics/modelConfidenceSet.js';
import { LAG_RULE_KINDS } from '../../src/statistics/neweyWestLag.js';
import { VARIANCE_ESTIMATORS } from '../../src/statistics/varianceEstimator.js';
import { readActionYml } from '../action/actionYml.js';
import { pathPattern, readReportSchema, walkSchema } from '../action/reportSchemaWalk.js';
import { fullSampleReport } from '../action/sampleReport.js';

// Each closed set of words is one `as const` list in src/; the option table, the report model and
// the action's report reader take it from there. These tests keep the copies outside the code in
// step with those lists: docs/report.schema.json (every `enum`, in the same order) and the
// README's usage synopsis (every option with choices). test/action/reportSchema.test.ts holds the
// reader to the schema; test/integrity/checkIds.test.ts does the same for the check ids.

const root = path.resolve(import.meta.dirname, '..', '..');

/** Where each list stands in the report (a field of every item of a list as [*]). */
const SCHEMA_LISTS: Readonly<Record<string, readonly string[]>> = {
  '$.tool.name': ['skillgate'],
  '$.verdict': VERDICTS,
  '$.policy.policy': POLICIES,
  '$.policy.agreement': AGREEMENTS,
  '$.policy.marginKind': MARGIN_KINDS,
  '$.policy.onReject': ON_REJECT_VERDICTS,
  '$.comparisons[*].loss': LOSS_NAMES,
  '$.comparisons[*].verdict': VERDICTS,
  '$.comparisons[*].direction': SERIES_DIRECTIONS,
  '$.comparisons[*].dieboldMariano.state': DIEBOLD_MARIANO_STATES,
  '$.comparisons[*].dieboldMariano.estimator': VARIANCE_ESTIMATORS,
  '$.comparisons[*].dieboldMariano.requestedEstimator': VARIANCE_ESTIMATORS,
  '$.comparisons[*].bootstrap.state': BOOTSTRAP_STATES,
  '$.comparisons[*].bootstrap.blockLengthRule': BLOCK_LENGTH_RULE_KINDS,
  '$.inputs.files[*].role': FILE_ROLES,
  '$.inputs.timestamps.kind': TIMESTAMP_KINDS,
  '$.inputs.timestamps.format': TIME_FORMAT_NAMES,
  '$.seriesSummary.method': ADJUSTMENT_METHODS,
  '$.integrity.mode': CHECK_MODES,
  '$.integrity.outcome': CHECK_STATUSES,
  '$.integrity.frequency.source': FREQUENCY_SOURCES,
  '$.integrity.checks[*].id': CHECK_IDS,
  '$.integrity.checks[*].status': CHECK_STATUSES,
  '$.integrity.notRun[*].id': CHECK_IDS,
  '$.stability.levels.adjustment': STABILITY_ADJUSTMENTS,
  '$.spa.hypothesis': SPA_HYPOTHESES,
  '$.confidenceSet.statistic': CONFIDENCE_SET_STATISTICS,
  '$.selection.rule': SELECTION_RULES,
  '$.selection.preferredBy': PREFERRED_BY,
  '$.selection.verdict': VERDICTS,
  '$.selection.blockLengthRule': BLOCK_LENGTH_RULE_KINDS,
  '$.settings.selectionRule': SELECTION_RULES,
  '$.settings.setStatistic': CONFIDENCE_SET_STATISTICS,
  '$.settings.format': INPUT_FORMATS,
  '$.settings.delimiter': DELIMITER_NAMES,
  '$.settings.decimal': DECIMAL_MARKS,
  '$.settings.timeFormat': TIME_FORMAT_NAMES,
  '$.settings.loss': LOSS_NAMES,
  '$.settings.zeroActuals': ZERO_ACTUALS_RULES,
  '$.settings.marginKind': MARGIN_KINDS,
  '$.settings.policy': POLICIES,
  '$.settings.agreement': AGREEMENTS,
  '$.settings.variance': VARIANCE_ESTIMATORS,
  '$.settings.lag.kind': LAG_RULE_KINDS,
  '$.settings.blockLength.kind': BLOCK_LENGTH_RULE_KINDS,
  '$.settings.shortData': SHORT_DATA_VERDICTS,
  '$.settings.pooling': POOLINGS,
  '$.settings.scale': SCALE_KINDS,
  '$.settings.adjust': ADJUSTMENT_METHODS,
  '$.settings.recent.kind': RECENT_WINDOW_KINDS,
  '$.settings.fluctuationSides': FLUCTUATION_SIDES,
  '$.settings.stabilityGate': STABILITY_GATE_MODES,
  '$.settings.backtestChecks': CHECK_MODES,
};

/** The same list reached again inside a comparison that sits elsewhere in the report. */
const asComparison = (pattern: string) =>
  pattern
    .replace(/^\$\.candidates\[\*\]\.comparison\./, '$.comparisons[*].')
    .replace(/^\$\.stability\.recent\./, '$.comparisons[*].');

describe('closed lists: code, schema and README in step', () => {
  const schema = readReportSchema();
  const closed = walkSchema(schema, fullSampleReport()).closed;

  it('every enum of docs/report.schema.json is the list in src/, in its order', () => {
    const found = new Map<string, readonly unknown[]>();
    for (const field of closed) {
      const pattern = pathPattern(field.at);
      const list = SCHEMA_LISTS[pattern] ?? SCHEMA_LISTS[asComparison(pattern)];
      expect(list, `${pattern}: no list in src/ named for it`).toBeDefined();
      expect(field.values, pattern).toEqual([...list!]);
      found.set(asComparison(pattern), field.values);
    }
    expect([...found.keys()].sort()).toEqual(Object.keys(SCHEMA_LISTS).sort());
  });

  it('the schema names every column role in a column mapping', () => {
    expect(Object.keys(schema.definitions?.columnMapping?.properties ?? {})).toEqual([
      ...COLUMN_ROLES,
    ]);
  });

  it("the README's usage lists each option's choices as the option table does", () => {
    const readme = readFileSync(path.join(root, 'README.md'), 'utf8');
    const usage = readme.slice(
      readme.indexOf('## Usage'),
      readme.indexOf('### As a GitHub Action'),
    );
    const shown = (choices: readonly string[]) =>
      choices.map((c) => (c === '|' ? "'|'" : c)).join('|');
    for (const option of ENGINE_OPTIONS) {
      if (option.choices === undefined) continue;
      // The loss's trade names (mse, mae, mape) are explained in the text below the synopsis.
      const choices = option.choices.filter((c) => !Object.hasOwn(LOSS_ALIASES, c));
      expect(usage, option.name).toContain(`[--${option.name} ${shown(choices)}]`);
    }
  });

  it('action.yml names every choice of each input that has them', () => {
    const yml = readActionYml(path.join(root, 'action.yml'));
    const missing: string[] = [];
    for (const option of ENGINE_OPTIONS) {
      const description = yml.inputs.get(option.name)?.description ?? '';
      for (const choice of option.choices ?? []) {
        const word = /^[a-z0-9-]+$/.test(choice)
          ? new RegExp(`(^|[^a-z0-9-])${choice}($|[^a-z0-9-])`).test(description)
          : description.includes(choice);
        if (!word) missing.push(`${option.name}: ${choice}`);
      }
    }
    expect(missing).toEqual([]);
  });
});
