import type { AlignedPanel } from '../core/panel.js';

/** A readable key for panel row p: "series=north timestamp=2024-01-02 horizon=1 origin=…". */
export function describePanelRow(panel: AlignedPanel, p: number): string {
  const parts: string[] = [];
  if (panel.seriesNames.length > 1 || panel.seriesNames[0] !== '') {
    parts.push(`series=${panel.seriesNames[panel.series[p]!]}`);
  }
  parts.push(`timestamp=${panel.timestamps[panel.time[p]!]}`);
  parts.push(`horizon=${panel.horizon[p]}`);
  if (panel.origin !== null) parts.push(`origin=${panel.origins[panel.origin[p]!]}`);
  if (panel.path !== null) parts.push(`path=${panel.paths[panel.path[p]!]}`);
  return parts.join(' ');
}
