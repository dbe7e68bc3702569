import { InputError } from '../core/inputError.js';

/** The most recent window (`recent`): a number of time points or a share of them. */
export type RecentWindow =
  | { readonly kind: 'points'; readonly points: number }
  | { readonly kind: 'share'; readonly share: number };
export const RECENT_WINDOW_KINDS = [
  'points',
  'share',
] as const satisfies readonly RecentWindow['kind'][];

/**
 * Reads `recent`: '' (no recent window), an integer N ≥ 2 (the last N time points) or a
 * percentage P% with 0 < P < 100 (the last ⌈P/100 · n⌉ time points).
 */
export function parseRecentWindow(text: string, label: string): RecentWindow | null {
  if (text === '') return null;
  const percent = /^(\d+(?:\.\d+)?)%$/.exec(text);
  if (percent !== null) {
    const share = Number(percent[1]) / 100;
    if (share > 0 && share < 1) return { kind: 'share', share };
  } else if (/^\d+$/.test(text)) {
    const points = Number(text);
    if (Number.isSafeInteger(points) && points >= 2) return { kind: 'points', points };
  }
  throw new InputError(
    `${label} must be a number of time points (an integer ≥ 2) or a percentage such as 15%`,
    { value: text },
  );
}

/** How many of n time points the window takes (all n when it asks for more). */
export function recentPoints(window: RecentWindow, n: number): number {
  const k = window.kind === 'points' ? window.points : Math.ceil(window.share * n - 1e-9);
  return Math.min(n, Math.max(k, 0));
}
