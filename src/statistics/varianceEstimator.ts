/**
 * The long-run variance estimators of the Diebold–Mariano test (`--variance`), in the order the
 * options list them (the default first):
 *
 * - `ewc-ar1`: equal-weighted cosine (fixed-b, Lazarus, Lewis, Stock & Watson 2018) with ν
 *   chosen from the data (`ar1PluginCosineTerms`);
 * - `ewc`: the same estimator with ν = max(2, round(0.4 n^{2/3}));
 * - `bartlett`: Newey & West (1987), lag from `LagRule`;
 * - `uniform`: the truncated (uniform-kernel) estimator, lag from `LagRule`.
 */
export const VARIANCE_ESTIMATORS = ['ewc-ar1', 'ewc', 'bartlett', 'uniform'] as const;
export type VarianceEstimator = (typeof VARIANCE_ESTIMATORS)[number];
