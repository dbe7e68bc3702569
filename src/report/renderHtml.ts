import { MARGIN_SIGN } from '../decision/policy.js';
import { candidatesChartSvg } from './candidatesChartSvg.js';
import { candidatesSection } from './candidatesSection.js';
import { percent, relativeInterval } from './cells.js';
import { chartCaption, differenceSeries, sparklineText } from './differenceChart.js';
import { missingRowsSection } from './missingRowsSection.js';
import { backtestChecksNotes } from './renderBacktestChecks.js';
import { overTimeParts } from './renderStabilitySection.js';
import type { Report } from './reportModel.js';
import { reportSections } from './reportSections.js';
import type { ReportTable } from './reportTable.js';
import type { ReportView } from './reportView.js';
import {
  bootstrapHistogramSvg,
  differenceOverTimeSvg,
  intervalsSvg,
  seriesDotPlotSvg,
  xml,
} from './svgCharts.js';

export interface HtmlOptions {
  /** File paths are shown relative to this directory. */
  readonly workingDirectory?: string;
}

const STYLE = `
:root { color-scheme: light; }
body { font: 15px/1.5 -apple-system, BlinkMacSystemFont, "Segoe UI", "Noto Sans", Helvetica, Arial, sans-serif;
  color: #1f2328; margin: 0 auto; padding: 16px; max-width: 980px; }
h1 { font-size: 1.4em; margin: 0 0 8px; } h2 { font-size: 1.15em; margin: 28px 0 8px; border-bottom: 1px solid #d0d7de; padding-bottom: 4px; }
.verdict { display: inline-block; padding: 1px 10px; border-radius: 12px; color: #fff; font-weight: 600; }
.pass { background: #2463a6; } .warn { background: #9a6700; } .fail { background: #b4501a; }
.lead { font-size: 1.05em; }
.scroll { overflow-x: auto; }
table { border-collapse: collapse; margin: 8px 0; font-variant-numeric: tabular-nums; }
th, td { border: 1px solid #d0d7de; padding: 4px 10px; vertical-align: top; }
th { background: #f6f8fa; text-align: left; }
td.r, th.r { text-align: right; }
figure { margin: 12px 0; } figcaption { color: #59636e; font-size: 0.9em; }
p, li, h1, h2, code { overflow-wrap: anywhere; }
code, .spark { font-family: ui-monospace, SFMono-Regular, Menlo, Consolas, monospace; font-size: 0.9em; }
.muted { color: #59636e; font-size: 0.9em; }
@media (max-width: 600px) { body { font-size: 14px; padding: 8px; } th, td { padding: 3px 6px; } }
@media print { body { max-width: none; } h2 { break-after: avoid; } figure, table { break-inside: avoid; } }
`;

/**
 * Renders the report as one self-contained HTML page: no scripts, no external fonts, styles or
 * images (a Content-Security-Policy forbids any request), charts as inline SVG. It shows the
 * same lead, tables and sections as the comment, plus the charts: the difference over time with
 * the overall interval as a band, per-horizon changes with intervals, a per-series dot plot
 * (change against adjusted evidence) and the bootstrap distribution with the observed value.
 * Readable on a phone (tables scroll sideways, charts scale) and printable.
 */
export function renderHtml(report: Report, options: HtmlOptions = {}): string {
  const view = report as ReportView;
  const s = reportSections(view, options);
  const overall = view.comparisons[0]!;
  const out: string[] = [];
  out.push(
    '<!doctype html>',
    '<html lang="en"><head><meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${xml(s.title)}: ${s.verdict.toUpperCase()}</title>`,
    `<style>${STYLE}</style></head><body>`,
    `<h1>${xml(s.title)} <span class="verdict ${s.verdict}">${s.verdict.toUpperCase()}</span></h1>`,
    `<p class="lead"><strong>${xml(s.lead)}</strong> ${xml(s.change)}</p>`,
    htmlTable(s.main),
    `<p class="muted">${xml(s.intervalNote)}</p>`,
  );
  if (s.notes.length > 0) out.push(`<ul>${s.notes.map((n) => `<li>${xml(n)}</li>`).join('')}</ul>`);
  out.push(
    `<p class="muted">${s.changedSettings === '' ? 'Settings: the defaults.' : `Settings that differ from the defaults: <code>${xml(s.changedSettings)}</code>`}</p>`,
  );

  const chart = differenceSeries(view);
  if (chart !== null) {
    const interval = relativeInterval(overall);
    const band =
      interval === null || interval.lower === null || interval.upper === null
        ? null
        : { lower: interval.lower, upper: interval.upper, level: interval.level };
    out.push(
      '<h2>Difference over time</h2>',
      `<figure>${differenceOverTimeSvg({
        labels: chart.labels,
        values: chart.values,
        margin: chart.margin,
        band: band === null ? null : { lower: band.lower * 100, upper: band.upper * 100 },
      })}<figcaption>${xml(chartCaption(chart))}${band === null ? '' : ` Shaded: the overall change's ${Math.round(band.level * 100)}% interval (${percent(band.lower)} to ${percent(band.upper)}).`}</figcaption></figure>`,
      `<p class="spark">${xml(sparklineText(chart))}</p>`,
    );
  }

  const overTime = overTimeParts(report);
  if (overTime !== null) {
    out.push('<h2>Over time</h2>');
    if (overTime.windows !== null) out.push(htmlTable(overTime.windows));
    out.push(...overTime.sentences.map((t) => `<p>${xml(t)}</p>`));
    if (overTime.periods !== null) {
      out.push(
        `<details><summary>Mean loss by period (${overTime.periods.rows.length} periods)</summary>${htmlTable(overTime.periods)}</details>`,
      );
    }
  }

  const candidates = candidatesSection(report);
  if (candidates !== null) {
    const chart = candidatesChartSvg(report);
    out.push(`<h2>${xml(candidates.heading)}</h2>`);
    if (chart !== '') out.push(`<figure>${chart}</figure>`);
    out.push(
      htmlTable(candidates.ranking),
      `<p>${xml(candidates.spaSentence)}</p>`,
      `<p>${xml(candidates.setSentence)}</p>`,
    );
  }

  const horizons = view.comparisons.filter(
    (c) => c.horizon !== 'all' && c.series === 'all' && c.path === undefined,
  );
  if (s.horizons !== null) {
    const rows = horizons
      .filter((c) => c.relativeDifference !== null)
      .map((c) => {
        const i = relativeInterval(c);
        return {
          label: `h ${c.horizon}`,
          estimate: (c.relativeDifference as number) * 100,
          lower: i?.lower == null ? null : i.lower * 100,
          upper: i?.upper == null ? null : i.upper * 100,
        };
      });
    out.push('<h2>By horizon (for locating a change only)</h2>');
    if (rows.length > 0) {
      out.push(
        `<figure>${intervalsSvg({ title: 'Change in mean loss by horizon', rows, margin: differenceSeries(view)?.margin ?? marginPercent(view) })}<figcaption>Each horizon on its own: the dot is the change in mean loss, the bar its interval; right of the line the candidate is worse.</figcaption></figure>`,
      );
    }
    out.push(
      '<p class="muted">The p-values are Holm-adjusted across horizons; the gate’s verdict rests on the overall comparison.</p>',
      htmlTable(s.horizons),
    );
  }

  if (s.series !== null) {
    const points = view.comparisons
      .filter((c) => c.series !== 'all' && c.relativeDifference !== null)
      .map((c) => ({
        label: String(c.series),
        change: (c.relativeDifference as number) * 100,
        p: c.directionPValue ?? c.adjustedPValue ?? 1,
        direction: c.direction ?? ('no evidence' as const),
      }));
    out.push('<h2>By series</h2>');
    if (points.length > 0) {
      out.push(
        `<figure>${seriesDotPlotSvg({ points, alpha: view.policy.alpha })}<figcaption>Each dot is a series: across, the change in its mean loss; up, the strength of the evidence (−log10 of the multiplicity-adjusted p-value). Rust: worse, blue: better, grey: no clear difference.</figcaption></figure>`,
      );
    }
    out.push(`<p>${xml(s.series.summary)}</p>`, htmlTable(s.series.table));
  }

  if (s.paths !== null) {
    out.push('<h2>By backtest path</h2>', `<p>${xml(s.paths.summary)}</p>`);
    if (s.paths.table !== null) out.push(htmlTable(s.paths.table));
  }

  const missing = missingRowsSection(view);
  if (missing !== null) {
    out.push(
      `<h2>${xml(missing.title)}</h2>`,
      ...missing.lines.map((l) => `<p>${xml(l)}</p>`),
      ...missing.tables.map(htmlTable),
    );
  }

  out.push('<h2>How the overall comparison was tested</h2>');
  const histogram = overall.bootstrap.distribution ?? null;
  if (histogram !== null) {
    out.push(
      `<figure>${bootstrapHistogramSvg({ histogram, observed: overall.meanTestedDifferential, boundary: view.policy.boundary })}<figcaption>The stationary bootstrap's resampled means of the tested differential d (${overall.bootstrap.resamples} resamples). The observed mean is marked, and so is the boundary of H0.</figcaption></figure>`,
    );
  }
  out.push(
    htmlTable(s.details),
    `<ul>${s.detailNotes.map((n) => `<li>${xml(n)}</li>`).join('')}</ul>`,
  );
  if (s.checks !== null || report.integrity.notRun.length > 0) {
    const notes = backtestChecksNotes(report);
    out.push('<h2>Backtest checks</h2>', `<p>Outcome: ${xml(notes.summary)}</p>`);
    if (s.checks !== null) out.push(htmlTable(s.checks));
    if (notes.notRun.length > 0) {
      out.push(`<ul>${notes.notRun.map((l) => `<li>${xml(l)}</li>`).join('')}</ul>`);
    }
  }
  out.push(
    '<h2>Inputs and coverage</h2>',
    htmlTable(s.inputs.table),
    ...s.inputs.lines.map((l) => `<p>${xml(l)}</p>`),
  );
  out.push('<h2>All settings</h2>', htmlTable(s.settings));
  out.push(
    `<p class="muted">A pass is evidence, not proof: it is only as good as the backtest behind it. Generated by skillgate ${xml(report.tool.version)}.</p>`,
    '</body></html>',
  );
  return `${out.join('\n')}\n`;
}

function marginPercent(report: ReportView): number | null {
  const p = report.policy;
  if (p.marginKind !== 'relative' || p.margin === 0) return null;
  return MARGIN_SIGN[p.policy] * p.margin * 100;
}

function htmlTable(t: ReportTable): string {
  const cell = (tag: string, text: string, j: number) =>
    `<${tag}${t.align[j] === 'right' ? ' class="r"' : ''}>${xml(text)}</${tag}>`;
  return [
    '<div class="scroll"><table>',
    `<thead><tr>${t.header.map((h, j) => cell('th', h, j)).join('')}</tr></thead>`,
    `<tbody>${t.rows.map((r) => `<tr>${r.map((c, j) => cell('td', c, j)).join('')}</tr>`).join('')}</tbody>`,
    '</table></div>',
  ].join('');
}
