/**
 * How the expected block length of the stationary bootstrap is chosen (`--block-length`): `auto`
 * (Politis & White 2004, with the correction of Patton, Politis & White 2009; see
 * `automaticBlockLength`) or a fixed length ≥ 1.
 */
export const BLOCK_LENGTH_RULE_KINDS = ['auto', 'fixed'] as const;
/** A block-length rule: the kinds other than `fixed` take no parameter. */
export type BlockLengthRule =
  | { kind: Exclude<(typeof BLOCK_LENGTH_RULE_KINDS)[number], 'fixed'> }
  | { kind: 'fixed'; length: number };
