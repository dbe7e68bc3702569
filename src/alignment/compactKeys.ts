import type { AlignedPanel } from '../core/panel.js';
import { gatherIntRows } from './gatherRows.js';
import type { KeyLayout } from './keyLayout.js';
import type { SortedKeys } from './sortedKeys.js';

/** The key fields of the aligned panel. */
export type PanelKeys = Pick<
  AlignedPanel,
  | 'series'
  | 'seriesNames'
  | 'time'
  | 'timestamps'
  | 'timestampKind'
  | 'timestampKindReason'
  | 'timeFormat'
  | 'timeInstants'
  | 'horizon'
  | 'origin'
  | 'origins'
  | 'originKind'
  | 'path'
  | 'paths'
>;

/**
 * The panel's key columns from the baseline's key at the panel's rows, with ids compacted to the
 * labels that occur in the panel (keeping their order), so ids run 0..k−1 with no gaps.
 */
export function compactKeys(layout: KeyLayout, baseline: SortedKeys, rows: Int32Array): PanelKeys {
  const { series, time, horizons, origin, path } = layout.dictionaries;
  const keys = baseline.keys;
  const seriesIds = compact(gatherIntRows(keys.series, rows), series.names);
  const timeIds = compact(gatherIntRows(keys.timestamp, rows), time.order.labels);
  const instants = time.order.instants;
  const horizon = new Int32Array(rows.length);
  const horizonRank = keys.horizon!;
  const horizonValues = horizons.values;
  for (let p = 0; p < rows.length; p++) horizon[p] = horizonValues[horizonRank[rows[p]!]!]!;
  const originIds =
    origin === null ? null : compact(gatherIntRows(keys.origin!, rows), origin.order.labels);
  const pathIds = path === null ? null : compact(gatherIntRows(keys.path!, rows), path.names);
  return {
    series: seriesIds.ids,
    seriesNames: seriesIds.names,
    time: timeIds.ids,
    timestamps: timeIds.names,
    timestampKind: time.order.kind,
    timestampKindReason: time.order.reason,
    timeFormat: time.order.format,
    timeInstants:
      instants === null ? null : Float64Array.from(timeIds.kept, (rank) => instants[rank]!),
    horizon,
    origin: originIds === null ? null : originIds.ids,
    origins: originIds === null ? [] : originIds.names,
    originKind: origin === null ? 'text' : origin.order.kind,
    path: pathIds === null ? null : pathIds.ids,
    paths: pathIds === null ? [] : pathIds.names,
  };
}

/** Renumbers ids (in place) to 0..k−1 keeping their order, dropping ids that do not occur. */
function compact(
  ids: Int32Array,
  names: readonly string[],
): { ids: Int32Array; names: string[]; kept: number[] } {
  const remap = new Int32Array(names.length).fill(-1);
  for (let p = 0; p < ids.length; p++) remap[ids[p]!] = 0;
  const keptNames: string[] = [];
  const kept: number[] = [];
  for (let id = 0; id < names.length; id++) {
    if (remap[id] === 0) {
      remap[id] = keptNames.length;
      keptNames.push(names[id]!);
      kept.push(id);
    }
  }
  // Every id occurs (the usual case): the ids are already compact.
  if (keptNames.length < names.length)
    for (let p = 0; p < ids.length; p++) ids[p] = remap[ids[p]!]!;
  return { ids, names: keptNames, kept };
}
