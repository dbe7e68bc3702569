/**
 * How losses of several series are pooled into one comparison (`--pooling`): `raw` losses, or
 * `scaled` ones, each series' losses divided by its own scale so no large series dominates.
 */
export const POOLINGS = ['raw', 'scaled'] as const;
export type Pooling = (typeof POOLINGS)[number];

/**
 * The per-series scale of `scaled` pooling (`--scale`): `baseline`, the series' mean baseline
 * loss (`baselineMeanLossScale`), or `seasonal-naive`, the in-sample error of the seasonal naive
 * forecast on the history (`seasonalNaiveScale`, as in the MASE of Hyndman & Koehler 2006).
 */
export const SCALE_KINDS = ['baseline', 'seasonal-naive'] as const;
export type ScaleKind = (typeof SCALE_KINDS)[number];
