// The stationary bootstrap's public surface, for the statistics and decision layers.
export { type AutomaticBlockLength, automaticBlockLength } from './automaticBlockLength.js';
export {
  type BasicBootstrapInference,
  basicBootstrapInference,
  minimumResamples,
  tailOrderStatistic,
  tailProbability,
} from './basicBootstrapInference.js';
export {
  type RelativeDifferenceResult,
  relativeDifferenceBootstrap,
} from './relativeDifferenceBootstrap.js';
export {
  RESAMPLES_PER_STREAM,
  type ResampleJob,
  type ResampleRunner,
  resampleDeviationsOfStream,
  runResampleJob,
  streamCount,
  streamShare,
} from './resampleJob.js';
export {
  MINIMUM_BOOTSTRAP_LENGTH,
  type StationaryBootstrapOptions,
  type StationaryBootstrapResult,
  stationaryBootstrap,
  stationaryResampleDeviations,
  validateStationaryBootstrapOptions,
} from './stationaryBootstrap.js';
export { stationaryBootstrapVariance } from './stationaryBootstrapVariance.js';
