import { alignPanel } from '../alignment/alignPanel.js';
import { evaluatePanel, overallLossSeries, type PanelExtras } from '../comparison/evaluatePanel.js';
import { InputError } from '../core/inputError.js';
import { checkBacktest } from '../integrity/checkBacktest.js';
import { createRandomSource } from '../random/randomSource.js';
import type { ForecastTable } from '../reading/forecastTable.js';
import type { Report } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import { mean } from '../statistics/mean.js';
import { modelConfidenceSet } from '../statistics/modelConfidenceSet.js';
import type {
  CandidateSummary,
  ConfidenceSetSummary,
  SelectionSummary,
  SpaSummary,
} from './candidatesModel.js';
import { commonBlockLength } from './commonBlockLength.js';
import { decideCandidates, type SelectionRule } from './decideCandidates.js';
import { jointLossSeries } from './jointLossSeries.js';
import { sharedResampleDeviations } from './sharedResampleDeviations.js';
import { type SpaHypothesis, type SpaMargin, superiorAbilityTest } from './superiorAbilityTest.js';

export interface CandidateTable {
  readonly name: string;
  readonly file: string;
  readonly table: ForecastTable;
}

export interface CandidatesInput {
  readonly baselineName: string;
  readonly baseline: ForecastTable;
  readonly candidates: readonly CandidateTable[];
  readonly actuals?: ForecastTable;
  /** The fold layout for the backtest checks, when given. */
  readonly folds?: Parameters<typeof checkBacktest>[0]['folds'];
}

/** Fewest time points for the joint tests (the bootstrap's own minimum is 2). */
const MINIMUM_JOINT_POINTS = 2;

/**
 * The pure core for several candidates against one baseline (docs/design.md, "Several
 * candidates"): each candidate's own comparison exactly as in the two-model case (evaluatePanel),
 * all with one block length and seed so every bootstrap — each comparison's and the joint tests'
 * — resamples the same blocks; then Hansen's (2005) SPA test and White's (2000) reality check over
 * the candidates, the model confidence set of Hansen, Lunde & Nason (2011) over the baseline and
 * the candidates, and the decision of the selection rule. The report is the preferred candidate's
 * report with the candidates, spa, confidenceSet and selection sections added and the verdict,
 * headline and reasons of the rule.
 */
export function evaluateCandidates(
  input: CandidatesInput,
  settings: Settings,
  extras: PanelExtras = {},
): Report {
  const names = [input.baselineName, ...input.candidates.map((c) => c.name)];
  if (new Set(names).size !== names.length) {
    throw new InputError(
      `every model needs its own name; the baseline and the candidates are named ${names.join(', ')}`,
    );
  }
  const pairs = input.candidates.map((c) => {
    const panel = alignPanel(
      {
        baseline: input.baseline,
        candidate: c.table,
        ...(input.actuals === undefined ? {} : { actuals: input.actuals }),
      },
      { timeFormat: settings.timeFormat },
    );
    const own = { ...settings, candidate: c.file };
    // The backtest checks of each candidate's own comparison, as in the two-model run.
    const integrity = checkBacktest(
      {
        panel,
        baseline: input.baseline,
        candidate: c.table,
        ...(input.actuals === undefined ? {} : { actuals: input.actuals }),
        ...(input.folds === undefined ? {} : { folds: input.folds }),
      },
      { frequency: settings.frequency, embargo: settings.embargo, mode: settings.backtestChecks },
    );
    const extrasOf = { ...extras, integrity };
    return { ...c, panel, own, extrasOf, series: overallLossSeries(panel, own, extras) };
  });
  const joint = jointLossSeries(
    pairs.map((p) => ({
      name: p.name,
      file: p.file,
      series: p.series,
      timestamps: p.panel.timestamps,
    })),
  );
  const n = joint.baseline.length;
  if (n < MINIMUM_JOINT_POINTS) {
    throw new InputError(
      `the candidates share ${n} time point(s) with the baseline; the joint tests need at least ${MINIMUM_JOINT_POINTS}`,
    );
  }
  const block = commonBlockLength(joint.baseline, joint.candidates, settings.blockLength);
  const reports = pairs.map((p) =>
    evaluatePanel(p.panel, { ...p.own, blockLength: { kind: 'fixed', length: block } }, p.extrasOf),
  );

  const models = [joint.baseline, ...joint.candidates];
  const deviations = sharedResampleDeviations(
    models,
    { expectedBlockLength: block, resamples: settings.resamples, seed: settings.seed },
    createRandomSource,
    extras.resampleRunner,
  );
  const hypothesis: SpaHypothesis =
    settings.selectionRule === 'none-worse' ? 'none-worse' : 'none-better';
  const test = superiorAbilityTest(
    joint.baseline,
    joint.candidates,
    deviations,
    block,
    hypothesis,
    spaMargin(settings, hypothesis),
  );
  const means = models.map(mean);
  const mcs = modelConfidenceSet({
    means,
    deviations,
    statistic: settings.setStatistic,
    alpha: settings.setAlpha,
  });

  const byLoss = input.candidates.map((_, k) => k).sort((a, b) => means[a + 1]! - means[b + 1]!);
  const candidates: CandidateSummary[] = input.candidates.map((c, k) => ({
    name: c.name,
    file: c.file,
    comparison: reports[k]!.comparisons[0]!,
    inConfidenceSet: mcs.members.includes(k + 1),
    mcsPValue: mcs.pValues[k + 1]!,
    spaPValue: test.spa.adjustedPValues[k]!,
    rank: byLoss.indexOf(k) + 1,
  }));
  const preferredIndex = preferredCandidate(settings, input.candidates, byLoss);
  const preferred = candidates[preferredIndex]!;
  const base = reports[preferredIndex]!;
  const decision = decideCandidates({
    rule: settings.selectionRule,
    alpha: settings.alpha,
    setAlpha: settings.setAlpha,
    preferred: {
      name: preferred.name,
      verdict: base.verdict,
      inConfidenceSet: preferred.inConfidenceSet,
      mcsPValue: preferred.mcsPValue,
    },
    spaPValue: test.spa.pValueConsistent,
    missingRows: settings.allowMissing
      ? []
      : reports.flatMap((r, k) => (r.inputs.rowsDropped.baseline > 0 ? [candidates[k]!.name] : [])),
  });

  const spa: SpaSummary = {
    hypothesis,
    statistic: test.spa.statistic,
    pValueLower: test.spa.pValueLower,
    pValueConsistent: test.spa.pValueConsistent,
    pValueUpper: test.spa.pValueUpper,
    resamples: settings.resamples,
    expectedBlockLength: block,
    realityCheck: test.realityCheck,
  };
  const confidenceSet: ConfidenceSetSummary = {
    level: mcs.level,
    statistic: mcs.statistic,
    members: mcs.members.map((i) => names[i]!),
    eliminationOrder: mcs.eliminationOrder.map((i) => names[i]!),
    stepPValues: mcs.stepPValues,
    baseline: {
      name: input.baselineName,
      meanLoss: means[0]!,
      inConfidenceSet: mcs.members.includes(0),
      mcsPValue: mcs.pValues[0]!,
    },
  };
  const selection: SelectionSummary = {
    rule: settings.selectionRule,
    preferred: preferred.name,
    preferredBy: settings.preferred === null ? 'lowest-mean-loss' : 'option',
    verdict: decision.verdict,
    reasons: decision.reasons,
    timePoints: n,
    expectedBlockLength: block,
    blockLengthRule: settings.blockLength.kind,
  };
  return {
    ...base,
    verdict: decision.verdict,
    headline: headline(decision.verdict, candidates.length, preferred.name, settings.selectionRule),
    reasons: [...decision.reasons, ...base.reasons],
    settings,
    candidates,
    spa,
    confidenceSet,
    selection,
  };
}

function spaMargin(settings: Settings, hypothesis: SpaHypothesis): SpaMargin {
  if (settings.marginKind === 'absolute') return { factor: 1, shift: settings.margin };
  return {
    factor: hypothesis === 'none-worse' ? 1 + settings.margin : 1 - settings.margin,
    shift: 0,
  };
}

function preferredCandidate(
  settings: Settings,
  candidates: readonly CandidateTable[],
  byLoss: readonly number[],
): number {
  if (settings.preferred === null) return byLoss[0]!;
  const index = candidates.findIndex((c) => c.name === settings.preferred);
  if (index < 0) {
    throw new InputError(
      `the preferred candidate is not among the candidates (${candidates.map((c) => c.name).join(', ')})`,
      { file: 'preferred', value: settings.preferred },
    );
  }
  return index;
}

function headline(
  verdict: Report['verdict'],
  k: number,
  preferred: string,
  rule: SelectionRule,
): string {
  const question =
    rule === 'preferred-in-set'
      ? `whether the preferred candidate ${preferred} is among the most accurate of ${k + 1} models (model confidence set) and not worse than the baseline`
      : rule === 'none-worse'
        ? `whether any of ${k} candidates is worse than the baseline (superior predictive ability test)`
        : `whether any of ${k} candidates beats the baseline, allowing for the choice among them (superior predictive ability test)`;
  const outcome =
    verdict === 'pass'
      ? 'The gate passes.'
      : verdict === 'warn'
        ? 'The evidence is mixed or thin: the gate passes with a warning.'
        : 'The gate fails.';
  return `Tested ${question}. ${outcome}`;
}
