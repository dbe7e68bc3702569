import type { LossSeries } from '../aggregation/lossSeries.js';
import type { TimestampKind } from '../core/panel.js';
import type { Hypothesis } from '../decision/hypothesis.js';
import type { Settings } from '../settings/settings.js';
import type { ResampleRunner } from '../statistics/bootstrap/resampleJob.js';
import { periodBreakdown } from './periodBreakdown.js';
import type { Stability } from './stabilityModel.js';

export interface StabilityInputs {
  /** The overall per-time-point loss series (the one that decides the gate). */
  readonly series: LossSeries;
  /** Labels that series.time indexes, and how they are ordered. */
  readonly timestamps: readonly string[];
  readonly kind: TimestampKind;
  readonly hypothesis: Hypothesis;
  readonly settings: Settings;
  readonly runner?: ResampleRunner;
}

/** `report.stability` for the overall loss series: fluctuation test, recent window, periods. */
export function assessStability(inputs: StabilityInputs): Stability {
  const { periods } = periodBreakdown(inputs.series, inputs.timestamps, inputs.kind);
  return { fluctuation: null, recent: null, periods };
}
