/**
 * The fold layout a user declares with `--folds FILE`: which stretches of time each fold (or
 * backtest path) trained on and was tested on. Segments include both ends.
 */
export interface FoldSegment {
  /** Fold label, matched exactly to the predictions' path column when there is one. */
  readonly fold: string;
  readonly role: 'train' | 'test';
  /** Timestamps as written in the layout file. */
  readonly start: string;
  readonly end: string;
  /** Physical line in the layout file. */
  readonly line: number;
}

export interface FoldLayout {
  readonly file: string;
  readonly segments: readonly FoldSegment[];
}
