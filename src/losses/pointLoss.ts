/**
 * A point loss maps an actual y and a point forecast ŷ to a non-negative number; smaller is
 * better. Each implementation is a pure function of one row.
 */
export type PointLossFunction = (actual: number, prediction: number) => number;
