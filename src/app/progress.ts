/** A progress update from a long run: which stage, and how far through it (0..1). */
export interface Progress {
  readonly stage: string;
  readonly fraction: number;
}
