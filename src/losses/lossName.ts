/** The losses a comparison can use, by the name the CLI and the action accept. */
export const LOSS_NAMES = ['squared', 'absolute', 'ape', 'sape', 'pinball', 'interval'] as const;
export type LossName = (typeof LOSS_NAMES)[number];

/** Plain-words label for reports. */
export const LOSS_LABELS: Record<LossName, string> = {
  squared: 'squared error',
  absolute: 'absolute error',
  ape: 'absolute percentage error (%)',
  sape: 'symmetric absolute percentage error (%)',
  pinball: 'pinball loss (mean over quantile levels)',
  interval: 'interval score of the central interval (Gneiting & Raftery 2007)',
};

/**
 * Names the trade uses for the same losses: the mean of squared errors (MSE), of absolute errors
 * (MAE) and of absolute percentage errors (MAPE) are what the tests compare under those losses.
 */
export const LOSS_ALIASES: Readonly<Record<string, LossName>> = {
  mse: 'squared',
  mae: 'absolute',
  mape: 'ape',
};

/** The loss a name or alias stands for. */
export function canonicalLoss(name: string): LossName {
  return LOSS_ALIASES[name] ?? (name as LossName);
}
