import type { Report } from '../../src/report/reportModel.js';

/** A hand-kept report in the shape runComparison returns (taken from the demo data's passing run). */
export function sampleReport(overrides: Partial<Report> = {}): Report {
  const report: Report = {
    tool: {
      name: 'skillgate',
      version: '0.1.0',
    },
    name: '',
    verdict: 'pass',
    headline:
      "Tested whether the candidate's expected loss is higher than the baseline's, over 240 time points (mean loss down 16.49% against the baseline). The gate passes.",
    policy: {
      policy: 'no-regression',
      agreement: 'both',
      alpha: 0.05,
      margin: 0,
      marginKind: 'relative',
      nullHypothesis: "not (the candidate's expected loss is higher than the baseline's)",
      alternative: "the candidate's expected loss is higher than the baseline's",
      onReject: 'fail',
      baselineFactor: 1,
      boundary: 0,
    },
    comparisons: [
      {
        loss: 'squared',
        horizon: 'all',
        series: 'all',
        n: 240,
        rows: 2880,
        maxHorizon: 3,
        firstTimestamp: '2026-03-04',
        lastTimestamp: '2026-10-29',
        meanBaselineLoss: 4.596681922569442,
        meanCandidateLoss: 3.838693387152777,
        meanDifference: -0.7579885354166653,
        relativeDifference: -0.16489906158069922,
        meanTestedDifferential: -0.7579885354166669,
        relativeChange: {
          estimate: -0.16489906158069922,
          level: 0.9,
          lower: -0.2012,
          upper: -0.1287,
          method: 'Fieller (ewc) ∪ inverted bootstrap',
        },
        dieboldMariano: {
          state: 'ok',
          estimator: 'ewc',
          requestedEstimator: 'ewc',
          statistic: -7.745080486803853,
          pValue: 0.9999993599353291,
          pValueTwoSided: 1.2801293417960797e-6,
          decisionPValue: 0.9999993599353291,
          variance: 0.009577968476615139,
          longRunVariance: 2.2987124343876335,
          lag: null,
          degreesOfFreedom: 15,
          smallSample: null,
          interval: {
            level: 0.9,
            lower: -0.9665873126799988,
            upper: -0.5493897581533352,
            method: 'fixed-b t',
          },
          lagSelection: null,
          notes: [],
        },
        bootstrap: {
          state: 'ok',
          resamples: 9999,
          seed: 1729,
          expectedBlockLength: 3.6538357393873,
          blockLengthRule: 'auto',
          relativeInterval: null,
          blockLengthSelection: {
            n: 240,
            runLength: 5,
            maxLag: 21,
            maxBlockLength: 47,
            criticalValue: 0.1991737617304551,
            runFound: true,
            firstSmallLag: 2,
            bandwidth: 4,
            gHat: 1.8738292922628077,
            spectralSum: 4.1563500348830775,
            d: 34.55049122494512,
            unclamped: 3.6538357393873,
            blockLength: 3.6538357393873,
            notes: [],
          },
          standardError: 0.11613769531290219,
          interval: {
            level: 0.9,
            lower: -0.9879755315972226,
            upper: -0.5289580079861115,
            method: 'basic',
          },
          pValue: 1,
          pValueTwoSided: 0.0002,
          decisionPValue: 1,
          notes: [],
        },
        verdict: 'pass',
        reasons: [
          "Diebold–Mariano (ewc): p = 1.0000 > α = 0.05: no evidence that the candidate's expected loss is higher than the baseline's.",
          "Stationary bootstrap: p = 1.0000 > α = 0.05: no evidence that the candidate's expected loss is higher than the baseline's.",
        ],
        rejected: {
          dieboldMariano: false,
          bootstrap: false,
        },
      },
    ],
    inputs: {
      files: [
        {
          role: 'baseline',
          path: 'examples/data/baseline.csv',
          rows: 2880,
          sha256: 'sha256:a39c157ef724ec0bf243b960b2e42f1b20eb5c9d5be00fa510190f693a8c969c',
          columns: ['zone', 'target_date', 'horizon', 'issued', 'observed', 'forecast'],
          ignoredColumns: [],
          blankLines: 0,
        },
        {
          role: 'candidate',
          path: 'examples/data/candidate.csv',
          rows: 2880,
          sha256: 'sha256:7b62cea189368c0b7e1ec138b458e56debbf3fa84e492cd17d1e0b583997ac3e',
          columns: ['zone', 'target_date', 'horizon', 'issued', 'observed', 'forecast'],
          ignoredColumns: [],
          blankLines: 0,
        },
      ],
      rowsMatched: 2880,
      rowsDropped: {
        baseline: 0,
        candidate: 0,
        withoutActual: 0,
        actualsUnused: 0,
        skippedByLoss: 0,
      },
      examples: {
        baselineOnly: [],
        candidateOnly: [],
      },
      timestamps: {
        count: 240,
        kind: 'datetime',
        first: '2026-03-04',
        last: '2026-10-29',
        format: 'auto',
        order:
          'every timestamp is an ISO 8601 date or date-time: chronological order (no offset means UTC)',
      },
      series: 4,
      horizons: [1, 2, 3],
      quantileLevels: [],
      intervalCoverage: null,
    },
    settings: {
      name: '',
      baseline: 'examples/data/baseline.csv',
      candidate: 'examples/data/candidate.csv',
      candidates: [],
      modelColumn: null,
      baselineModel: null,
      preferred: null,
      selectionRule: 'preferred-in-set',
      setAlpha: 0.1,
      setStatistic: 'max',
      losses: null,
      actuals: null,
      columns: {
        series: 'zone',
        timestamp: 'target_date',
        origin: 'issued',
        actual: 'observed',
        prediction: 'forecast',
      },
      baselineColumns: {},
      candidateColumns: {},
      format: 'auto',
      delimiter: 'auto',
      decimal: '.',
      timeFormat: 'auto',
      lineLimit: 1048576,
      loss: 'squared',
      zeroActuals: 'error',
      alpha: 0.05,
      margin: 0,
      marginKind: 'relative',
      policy: 'no-regression',
      agreement: 'both',
      variance: 'ewc',
      lag: {
        kind: 'auto',
      },
      blockLength: {
        kind: 'auto',
      },
      resamples: 9999,
      seed: 1729,
      confidence: 0.9,
      minPoints: 30,
      shortData: 'warn',
      allowMissing: false,
      interval: null,
      pooling: 'raw',
      scale: 'baseline',
      history: null,
      season: 1,
      weights: false,
      adjust: 'holm',
      top: 10,
      recent: null,
      fluctuationWindow: 0.2,
      fluctuationSides: 'one',
      stabilityGate: 'warn',
      frequency: 'auto',
      folds: null,
      embargo: 0,
      backtestChecks: 'enforce',
      json: null,
      markdown: null,
      html: null,
    },
    reasons: [],
    seriesSummary: null,
    pathSummary: null,
    integrity: {
      mode: 'enforce',
      outcome: 'ok',
      affectsVerdict: true,
      frequency: { text: '1d', source: 'inferred' },
      checks: [
        {
          id: 'look-ahead',
          status: 'ok',
          count: 0,
          examples: [],
          summary:
            '0 of 5760 predictions rows have an origin at or after the timestamp they forecast',
        },
        {
          id: 'series-coverage',
          status: 'ok',
          count: 0,
          examples: [],
          summary: '0 of 4 series values only in the baseline, 0 of 4 only in the candidate',
        },
      ],
      notRun: [{ id: 'path-sets', reason: 'the files have no path column' }],
    },
    stability: {
      fluctuation: {
        statistic: 1.8421,
        criticalValue: 2.938,
        mu: 0.2,
        windowSize: 48,
        rejected: false,
        peak: { start: '2026-05-02', end: '2026-06-18' },
        worsePeriods: [],
      },
      recent: null,
      levels: { adjustment: 'none', alpha: 0.05, fluctuation: 0.05, recent: null },
      periods: [
        {
          start: '2026-03-04',
          end: '2026-03-08',
          n: 5,
          meanBaselineLoss: 4.61,
          meanCandidateLoss: 3.9,
          relativeDifference: -0.154,
        },
        {
          start: '2026-03-09',
          end: '2026-03-15',
          n: 7,
          meanBaselineLoss: 4.2,
          meanCandidateLoss: 0,
          relativeDifference: -1,
        },
      ],
    },
  };
  return { ...report, ...overrides };
}

/**
 * The sample with the several-candidates sections (hand-kept, in the shape evaluateCandidates
 * returns): three candidates, their comparisons the sample's overall one with its diagnostics
 * dropped (as the untrusted reader drops them), so the report reads back unchanged.
 */
export function sampleCandidatesReport(): Report {
  const base = sampleReport();
  const c = base.comparisons[0]!;
  const comparison = {
    ...c,
    dieboldMariano: { ...c.dieboldMariano, lagSelection: null },
    bootstrap: { ...c.bootstrap, blockLengthSelection: null },
  };
  return {
    ...base,
    comparisons: [comparison],
    candidates: [
      {
        name: 'gbm-v2',
        file: 'out/gbm-v2.csv',
        comparison,
        inConfidenceSet: true,
        mcsPValue: 1,
        spaPValue: 0.012,
        rank: 1,
      },
      {
        name: 'gbm-v3',
        file: 'out/gbm-v3.csv',
        comparison: {
          ...comparison,
          meanCandidateLoss: 4.1,
          relativeDifference: 0.02,
          verdict: 'warn',
        },
        inConfidenceSet: true,
        mcsPValue: 0.31,
        spaPValue: 1,
        rank: 2,
      },
      {
        name: 'ensemble_1',
        file: 'out/ensemble_1.csv',
        comparison: {
          ...comparison,
          meanCandidateLoss: 5.3,
          relativeDifference: 0.31,
          verdict: 'fail',
        },
        inConfidenceSet: false,
        mcsPValue: 0.004,
        spaPValue: 1,
        rank: 3,
      },
    ],
    spa: {
      hypothesis: 'none-better',
      statistic: 2.71,
      pValueLower: 0.008,
      pValueConsistent: 0.012,
      pValueUpper: 0.02,
      resamples: 9999,
      expectedBlockLength: 6.5,
      realityCheck: { statistic: 3.2, pValue: 0.03 },
    },
    confidenceSet: {
      level: 0.9,
      statistic: 'range',
      members: ['gbm-v2', 'gbm-v3'],
      eliminationOrder: ['ensemble_1', 'baseline', 'gbm-v3', 'gbm-v2'],
      stepPValues: [0.004, 0.021, 0.31, 1],
      baseline: { name: 'baseline', meanLoss: 4.02, inConfidenceSet: false, mcsPValue: 0.021 },
    },
    selection: {
      rule: 'preferred-in-set',
      preferred: 'gbm-v2',
      preferredBy: 'lowest-mean-loss',
      verdict: 'pass',
      reasons: [
        'The preferred candidate gbm-v2 is in the 90% model confidence set (MCS p-value 1.00).',
      ],
      timePoints: 240,
      expectedBlockLength: 6.5,
      blockLengthRule: 'auto',
    },
  };
}

/**
 * The sample with every field the schema (docs/report.schema.json) lets a report have: the
 * optional ones present and the nullable ones filled (a per-series comparison with its adjusted
 * p-values and direction, a backtest path, a relative change in pieces, measured coverage,
 * small-sample statistics, the bootstrap's relative interval and histogram, series and path
 * summaries, the missing-rows breakdown, interval coverage, a recent window, and the
 * several-candidates sections). Estimator diagnostics are null, as the untrusted reader leaves
 * them, so the report reads back unchanged.
 */
export function fullSampleReport(): Report {
  const base = sampleCandidatesReport();
  const overall = base.comparisons[0]!;
  const measuredCoverage = { coverage: 0.861, level: 0.9, studiedN: 48 };
  const perSeries = {
    ...overall,
    series: 'north',
    horizon: 2,
    path: 'fold-1',
    n: 60,
    rows: 60,
    maxHorizon: 2,
    relativeChange: {
      estimate: 0.031,
      level: 0.9,
      lower: null,
      upper: null,
      method: 'Fieller (bartlett)',
      pieces: [
        { lower: null, upper: -0.41 },
        { lower: 0.012, upper: null },
      ],
      measuredCoverage,
    },
    dieboldMariano: {
      ...overall.dieboldMariano,
      estimator: 'bartlett' as const,
      requestedEstimator: 'uniform' as const,
      lag: 2,
      degreesOfFreedom: null,
      smallSample: { statistic: 1.21, pValue: 0.115, pValueTwoSided: 0.23, degreesOfFreedom: 59 },
      interval: { ...overall.dieboldMariano.interval!, measuredCoverage },
      notes: ['The uniform estimate was not positive; Bartlett weights were used instead.'],
    },
    bootstrap: {
      ...overall.bootstrap,
      state: 'not-run' as const,
      blockLengthRule: 'fixed' as const,
      interval: { ...overall.bootstrap.interval!, measuredCoverage },
      relativeInterval: {
        level: 0.9,
        lower: -0.02,
        upper: 0.05,
        method: 'basic',
        measuredCoverage,
      },
      distribution: { lower: -1.2, upper: 0.4, counts: [3, 40, 120, 31, 2] },
    },
    verdict: 'warn' as const,
    adjustedPValue: 0.23,
    direction: 'no evidence' as const,
    directionPValue: 0.46,
  };
  const group = {
    key: 'north',
    rows: 12,
    first: '2026-04-01',
    last: '2026-04-12',
    meanBaselineLoss: 5.2,
  };
  const [first, ...others] = base.candidates!;
  return {
    ...base,
    comparisons: [overall, perSeries],
    candidates: [{ ...first!, comparison: { ...perSeries, series: 'all' } }, ...others],
    inputs: {
      ...base.inputs,
      files: [
        ...base.inputs.files,
        { ...base.inputs.files[0]!, role: 'actuals', path: 'examples/data/actuals.csv' },
        { ...base.inputs.files[0]!, role: 'losses', path: 'out/losses.csv' },
      ],
      quantileLevels: [0.1, 0.9],
      intervalCoverage: { nominal: 0.8, baseline: 0.77, candidate: 0.81 },
      missingRows: {
        rows: 12,
        first: '2026-04-01',
        last: '2026-04-12',
        meanBaselineLoss: 5.2,
        meanBaselineLossCommon: 4.6,
        rowsWithoutLoss: 0,
        bySeries: [group],
        byHorizon: [{ ...group, key: '1' }],
      },
    },
    seriesSummary: {
      method: 'bh',
      alpha: 0.05,
      series: 4,
      worse: 1,
      better: 2,
      noEvidence: 1,
      topRegressions: ['north'],
    },
    pathSummary: { paths: 3, worse: 1, shareWorse: 1 / 3, significantlyWorse: 0 },
    stability: {
      ...base.stability!,
      fluctuation: {
        ...base.stability!.fluctuation!,
        rejected: true,
        worsePeriods: [{ start: '2026-08-01', end: '2026-08-30' }],
      },
      recent: { ...perSeries, series: 'all', horizon: 'all', n: 36, firstTimestamp: '2026-09-24' },
      levels: { adjustment: 'bonferroni', alpha: 0.05, fluctuation: 0.025, recent: 0.025 },
    },
    settings: {
      ...base.settings,
      recent: { kind: 'share', share: 0.15 },
      interval: [0.1, 0.9],
      lag: { kind: 'fixed', lag: 2 },
      blockLength: { kind: 'fixed', length: 6.5 },
    },
  };
}
