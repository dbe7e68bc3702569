import { autocovariances } from './autocovariance.js';
import { ewcDegreesOfFreedom } from './ewcLongRunVariance.js';

/** The AR(1) coefficient at which the fixed rule ν = 0.4 n^{2/3} is the loss-minimising one. */
const CALIBRATION_AUTOCORRELATION = 0.7;
/** The plug-in AR(1) coefficient is kept in this range (see `ar1PluginCosineTerms`). */
const AUTOCORRELATION_FLOOR = 0.05;
const AUTOCORRELATION_CEILING = 0.97;

/**
 * ω^{(2)} = Σ_j j² γ_j / Σ_j γ_j (sums over all integers j) for an AR(1) with coefficient ρ:
 * 2ρ/(1 − ρ)². The curvature of the spectral density at frequency 0 relative to its level, which
 * sets the bias of the EWC estimator (Lazarus, Lewis, Stock & Watson 2018, §3, notation ω^{(q)}
 * with q = 2).
 *
 * @example ar1SpectralCurvature(0.7) // 1.4/0.09 = 15.5556
 */
export function ar1SpectralCurvature(rho: number): number {
  return (2 * rho) / (1 - rho) ** 2;
}

export interface CosineTermsChoice {
  /** ν, the number of cosine terms (the Student t degrees of freedom). */
  readonly terms: number;
  /** ρ̂ = γ̂_1/γ̂_0 of the series (divide by n), before clamping; 0 when γ̂_0 = 0. */
  readonly autocorrelation: number;
  /** ρ̃, the bias-corrected and clamped ρ̂ that enters the rule. */
  readonly pluginAutocorrelation: number;
}

/**
 * The number of cosine terms ν of the equal-weighted cosine (EWC) long-run variance chosen from
 * the data, by the size–power loss-minimising rule of Lazarus, Lewis, Stock & Watson (2018, "HAR
 * inference: recommendations for practice", JBES 36(4), §3–4; the size–power frontier of
 * Lazarus, Lewis & Stock 2021, "The size-power tradeoff in HAR inference", Econometrica 89(5))
 * with an AR(1) plug-in for the spectral curvature, in the manner of Andrews (1991) and of the
 * testing-optimal series rule of Sun (2013, Econometrics Journal 16), which has the same n^{2/3}
 * rate and the same bias term.
 *
 * The expansion behind it: for the EWC estimator the size distortion of the t test is
 * proportional to ω^{(2)}·(ν/n)² (the bias of ω̂², −(π²/6)·ω^{(2)}·(ν/n)² relative to ω²) and the
 * size-adjusted power loss to 1/ν, with constants that do not depend on the process. Minimising
 * κ·Δ_size² + (1 − κ)·Δ_power² over ν gives ν* = C_κ·(ω^{(2)})^{−1/3}·n^{2/3}. The published fixed
 * rule ν = 0.4·n^{2/3} is this ν* for κ = 0.9 at an AR(1) with ρ = 0.7 (LLSW 2018's calibration;
 * from memory), which fixes C_κ = 0.4·ω^{(2)}(0.7)^{1/3}. With ω^{(2)} = 2ρ/(1 − ρ)² for an AR(1):
 *
 *   ν̂ = clamp( round( 0.4 · n^{2/3} · (ω^{(2)}(0.7) / ω^{(2)}(ρ̃))^{1/3} ), 2, ⌊n/2⌋ ),
 *   ρ̃ = min(max(ρ̂ + (1 + 3ρ̂)/n, 0.05), 0.97),  ρ̂ = γ̂_1/γ̂_0 (autocovariances divide by n).
 *
 * The term (1 + 3ρ̂)/n removes the first-order small-sample bias of ρ̂ for an AR(1) with unknown
 * mean, E[ρ̂] − ρ = −(1 + 3ρ)/n + O(n^{−2}) (Kendall 1954, "Note on bias in the estimation of
 * autocorrelation", Biometrika 41; Marriott & Pope 1954, Biometrika 41): without it the plug-in
 * under-states persistence at n = 100 exactly where the fixed rule is oversized (the first
 * measurement, without the correction, is kept in docs/decisions/0012-ewc-cosine-terms.md).
 *
 * So ν̂ equals today's fixed rule when ρ̃ = 0.7, is smaller (fewer terms, less bias, wider
 * t_ν critical values) for stronger persistence and larger for weaker. Conventions: the floor
 * 0.05 keeps ν̂ finite for white or negatively correlated series (then ν̂ ≈ 2.1·n^{2/3}); the
 * ceiling 0.97 keeps it above 2 for near-unit roots; ⌊n/2⌋ keeps the cosines well below the
 * Nyquist frequency, and ν ≤ n − 1 always holds, as `ewcLongRunVariance` requires. Rounding to
 * nearest (`Math.round`). For n < 4 it returns the fixed rule's ν (= 2).
 *
 * @example ar1PluginCosineTerms(x) for n = 100 and ρ̂ = 0.669 (ρ̃ = 0.669 + 3.007/100 = 0.699)
 *   → ν = 9 (= ewcDegreesOfFreedom(100)); for ρ̃ = 0.81 → round(8.618 · (15.556/44.88)^{1/3})
 *   = round(6.05) = 6.
 */
export function ar1PluginCosineTerms(x: Float64Array): CosineTermsChoice {
  const n = x.length;
  if (n < 4) return { terms: ewcDegreesOfFreedom(n), autocorrelation: 0, pluginAutocorrelation: 0 };
  const [gamma0, gamma1] = autocovariances(x, 1);
  const rho = gamma0! > 0 ? gamma1! / gamma0! : 0;
  const corrected = rho + (1 + 3 * rho) / n;
  const plugin = Math.min(Math.max(corrected, AUTOCORRELATION_FLOOR), AUTOCORRELATION_CEILING);
  return {
    terms: cosineTermsForAutocorrelation(n, plugin),
    autocorrelation: rho,
    pluginAutocorrelation: plugin,
  };
}

/** The rule of `ar1PluginCosineTerms` for a given (already clamped) AR(1) coefficient ρ̃. */
export function cosineTermsForAutocorrelation(n: number, rho: number): number {
  const ratio = ar1SpectralCurvature(CALIBRATION_AUTOCORRELATION) / ar1SpectralCurvature(rho);
  const raw = Math.round(0.4 * n ** (2 / 3) * Math.cbrt(ratio));
  return Math.min(Math.max(2, raw), Math.max(2, Math.floor(n / 2)));
}
