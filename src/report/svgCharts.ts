import type { SeriesDirection } from '../decision/decideAdjusted.js';
import type { ResampleHistogram } from '../statistics/bootstrap/resampleHistogram.js';

/**
 * Small inline SVG charts for the HTML report, drawn from numbers only (no scripts, no fonts
 * beyond the page's): each returns one <svg> element that scales to its container. Text is
 * XML-escaped. Colours: the candidate worse in rust, better in blue, neither in grey.
 */

export const COLOURS = { worse: '#b4501a', better: '#2463a6', neutral: '#6b7280', ink: '#1f2328' };
const W = 640;
const H = 240;
const M = { left: 56, right: 16, top: 16, bottom: 40 };

/**
 * Text safe inside SVG/XML (and HTML) content and attribute values; bidirectional embedding,
 * override and isolate controls (U+202A–U+202E, U+2066–U+2069) become U+FFFD, so a name from a
 * file cannot read differently from what it is (as escapeMarkdown does for the comment).
 */
export function xml(text: string): string {
  return text
    .replace(/[\u202a-\u202e\u2066-\u2069]/g, '\uFFFD')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

interface Scale {
  (x: number): number;
  readonly ticks: readonly number[];
}

function linear(lo: number, hi: number, from: number, to: number): Scale {
  const span = hi - lo || 1;
  const f = (x: number) => from + ((x - lo) / span) * (to - from);
  return Object.assign(f, { ticks: niceTicks(lo, hi) });
}

function niceTicks(lo: number, hi: number, count = 5): number[] {
  const span = hi - lo || 1;
  const step0 = span / count;
  const mag = 10 ** Math.floor(Math.log10(step0));
  const step = [1, 2, 5, 10].map((k) => k * mag).find((s) => s >= step0) ?? 10 * mag;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) {
    out.push(Number(v.toPrecision(12)));
  }
  return out;
}

function fmt(x: number): string {
  return String(Number(x.toPrecision(3)));
}

function frame(title: string, body: string[], desc: string): string {
  return [
    `<svg viewBox="0 0 ${W} ${H}" width="100%" role="img" aria-label="${xml(title)}" xmlns="http://www.w3.org/2000/svg">`,
    `<title>${xml(title)}</title><desc>${xml(desc)}</desc>`,
    ...body,
    '</svg>',
  ].join('\n');
}

function yAxis(y: Scale, unit: string): string[] {
  return y.ticks.map(
    (t) =>
      `<line x1="${M.left}" x2="${W - M.right}" y1="${y(t).toFixed(1)}" y2="${y(t).toFixed(1)}" stroke="#e5e7eb"/>` +
      `<text x="${M.left - 6}" y="${(y(t) + 4).toFixed(1)}" font-size="11" text-anchor="end" fill="${COLOURS.neutral}">${xml(fmt(t))}${unit}</text>`,
  );
}

function hline(y: number, colour: string, dash: string, label: string): string {
  return (
    `<line x1="${M.left}" x2="${W - M.right}" y1="${y.toFixed(1)}" y2="${y.toFixed(1)}" stroke="${colour}" stroke-width="1.5" stroke-dasharray="${dash}"/>` +
    `<text x="${W - M.right - 2}" y="${(y - 4).toFixed(1)}" font-size="11" text-anchor="end" fill="${colour}">${xml(label)}</text>`
  );
}

/**
 * The relative difference per period (percent) as a line with dots, the zero line, the margin
 * line, and the overall change's interval as a shaded band.
 */
export function differenceOverTimeSvg(input: {
  readonly labels: readonly string[];
  readonly values: readonly number[];
  readonly margin: number | null;
  readonly band: { readonly lower: number; readonly upper: number } | null;
}): string {
  const { labels, values, margin, band } = input;
  const all = [
    0,
    ...values,
    ...(margin === null ? [] : [margin]),
    ...(band === null ? [] : [band.lower, band.upper]),
  ];
  const lo = Math.min(...all);
  const hi = Math.max(...all);
  const pad = (hi - lo) * 0.08 || 1;
  const y = linear(lo - pad, hi + pad, H - M.bottom, M.top);
  const n = values.length;
  const x = (i: number) => M.left + (n === 1 ? 0.5 : i / (n - 1)) * (W - M.left - M.right);
  const body = yAxis(y, '%');
  if (band !== null) {
    body.push(
      `<rect x="${M.left}" y="${y(band.upper).toFixed(1)}" width="${W - M.left - M.right}" height="${Math.max(1, y(band.lower) - y(band.upper)).toFixed(1)}" fill="${COLOURS.neutral}" fill-opacity="0.15"/>`,
    );
  }
  body.push(hline(y(0), COLOURS.ink, '0', 'no difference'));
  if (margin !== null) body.push(hline(y(margin), COLOURS.worse, '6 4', `margin ${fmt(margin)}%`));
  body.push(
    `<polyline fill="none" stroke="${COLOURS.ink}" stroke-width="1.5" points="${values.map((v, i) => `${x(i).toFixed(1)},${y(v).toFixed(1)}`).join(' ')}"/>`,
  );
  values.forEach((v, i) => {
    body.push(
      `<circle cx="${x(i).toFixed(1)}" cy="${y(v).toFixed(1)}" r="3" fill="${v > 0 ? COLOURS.worse : COLOURS.better}"><title>${xml(`${labels[i]}: ${fmt(v)}%`)}</title></circle>`,
    );
  });
  const step = Math.max(1, Math.ceil(n / 6));
  for (let i = 0; i < n; i += step) {
    body.push(
      `<text x="${x(i).toFixed(1)}" y="${H - M.bottom + 16}" font-size="11" text-anchor="middle" fill="${COLOURS.neutral}">${xml(labels[i] ?? '')}</text>`,
    );
  }
  return frame(
    'Change in mean loss per period',
    body,
    `Candidate's mean loss against the baseline's in each of ${n} periods, in percent; shaded: the overall change's interval.`,
  );
}

/** One row per item: a dot at the estimate and a bar for its interval (percent), zero and margin lines. */
export function intervalsSvg(input: {
  readonly title: string;
  readonly rows: readonly {
    label: string;
    estimate: number;
    lower: number | null;
    upper: number | null;
  }[];
  readonly margin: number | null;
}): string {
  const { rows, margin } = input;
  const rowH = 22;
  const height = M.top + M.bottom + rowH * rows.length;
  const values = rows.flatMap((r) => [r.estimate, r.lower ?? r.estimate, r.upper ?? r.estimate]);
  const all = [0, ...values, ...(margin === null ? [] : [margin])];
  const lo = Math.min(...all);
  const hi = Math.max(...all);
  const pad = (hi - lo) * 0.06 || 1;
  const x = linear(lo - pad, hi + pad, M.left + 40, W - M.right);
  const body: string[] = [];
  for (const t of x.ticks) {
    body.push(
      `<line x1="${x(t).toFixed(1)}" x2="${x(t).toFixed(1)}" y1="${M.top}" y2="${height - M.bottom}" stroke="#e5e7eb"/>` +
        `<text x="${x(t).toFixed(1)}" y="${height - M.bottom + 16}" font-size="11" text-anchor="middle" fill="${COLOURS.neutral}">${xml(fmt(t))}%</text>`,
    );
  }
  body.push(
    `<line x1="${x(0).toFixed(1)}" x2="${x(0).toFixed(1)}" y1="${M.top}" y2="${height - M.bottom}" stroke="${COLOURS.ink}"/>`,
  );
  if (margin !== null) {
    body.push(
      `<line x1="${x(margin).toFixed(1)}" x2="${x(margin).toFixed(1)}" y1="${M.top}" y2="${height - M.bottom}" stroke="${COLOURS.worse}" stroke-dasharray="6 4"/>`,
    );
  }
  rows.forEach((r, i) => {
    const cy = M.top + rowH * i + rowH / 2;
    const colour =
      r.lower !== null && r.lower > 0
        ? COLOURS.worse
        : r.upper !== null && r.upper < 0
          ? COLOURS.better
          : COLOURS.neutral;
    body.push(
      `<text x="${M.left + 32}" y="${cy + 4}" font-size="11" text-anchor="end" fill="${COLOURS.ink}">${xml(r.label)}</text>`,
    );
    if (r.lower !== null && r.upper !== null) {
      body.push(
        `<line x1="${x(r.lower).toFixed(1)}" x2="${x(r.upper).toFixed(1)}" y1="${cy}" y2="${cy}" stroke="${colour}" stroke-width="2"/>`,
      );
    }
    body.push(
      `<circle cx="${x(r.estimate).toFixed(1)}" cy="${cy}" r="4" fill="${colour}"><title>${xml(`${r.label}: ${fmt(r.estimate)}%`)}</title></circle>`,
    );
  });
  return frame(
    input.title,
    body,
    'Dots: change in mean loss in percent; bars: its interval; vertical line: no difference.',
  ).replace(`viewBox="0 0 ${W} ${H}"`, `viewBox="0 0 ${W} ${height}"`);
}

/** Per-series dots: change in mean loss (x, percent) against −log10 of the adjusted p-value (y). */
export function seriesDotPlotSvg(input: {
  readonly points: readonly {
    label: string;
    change: number;
    p: number;
    direction: SeriesDirection;
  }[];
  readonly alpha: number;
}): string {
  const { points, alpha } = input;
  const sig = (p: number) => -Math.log10(Math.max(p, 1e-12));
  const xs = [0, ...points.map((p) => p.change)];
  const ys = [0, sig(alpha), ...points.map((p) => sig(p.p))];
  const xPad = (Math.max(...xs) - Math.min(...xs)) * 0.06 || 1;
  const x = linear(Math.min(...xs) - xPad, Math.max(...xs) + xPad, M.left, W - M.right);
  const y = linear(0, Math.max(...ys) * 1.1, H - M.bottom, M.top);
  const body = yAxis(y, '');
  body.push(hline(y(sig(alpha)), COLOURS.neutral, '4 3', `adjusted p = ${alpha}`));
  body.push(
    `<line x1="${x(0).toFixed(1)}" x2="${x(0).toFixed(1)}" y1="${M.top}" y2="${H - M.bottom}" stroke="${COLOURS.ink}"/>`,
  );
  for (const t of x.ticks) {
    body.push(
      `<text x="${x(t).toFixed(1)}" y="${H - M.bottom + 16}" font-size="11" text-anchor="middle" fill="${COLOURS.neutral}">${xml(fmt(t))}%</text>`,
    );
  }
  body.push(
    `<text x="${W / 2}" y="${H - 6}" font-size="11" text-anchor="middle" fill="${COLOURS.neutral}">change in mean loss; up: stronger evidence (−log10 adjusted p)</text>`,
  );
  for (const p of points) {
    const colour =
      p.direction === 'worse'
        ? COLOURS.worse
        : p.direction === 'better'
          ? COLOURS.better
          : COLOURS.neutral;
    body.push(
      `<circle cx="${x(p.change).toFixed(1)}" cy="${y(sig(p.p)).toFixed(1)}" r="4" fill="${colour}" fill-opacity="0.8"><title>${xml(`${p.label}: ${fmt(p.change)}%, adjusted p ${p.p.toPrecision(2)}`)}</title></circle>`,
    );
  }
  return frame(
    'Series: change against evidence',
    body,
    'Each dot is a series; right of the vertical line its loss is higher; above the dashed line the adjusted evidence is significant.',
  );
}

/** Histogram of the bootstrap resample means with the observed mean and the H0 boundary marked. */
export function bootstrapHistogramSvg(input: {
  readonly histogram: ResampleHistogram;
  readonly observed: number;
  readonly boundary: number;
}): string {
  const { histogram, observed, boundary } = input;
  const lo = Math.min(histogram.lower, observed, boundary);
  const hi = Math.max(histogram.upper, observed, boundary);
  const pad = (hi - lo) * 0.04 || 1;
  const x = linear(lo - pad, hi + pad, M.left, W - M.right);
  const max = Math.max(...histogram.counts);
  const y = linear(0, max * 1.1, H - M.bottom, M.top);
  const bins = histogram.counts.length;
  const width = (histogram.upper - histogram.lower) / bins;
  const body: string[] = [];
  histogram.counts.forEach((c, j) => {
    const x0 = x(histogram.lower + j * width);
    const x1 = x(histogram.lower + (j + 1) * width);
    body.push(
      `<rect x="${x0.toFixed(1)}" y="${y(c).toFixed(1)}" width="${Math.max(0.5, x1 - x0 - 0.5).toFixed(1)}" height="${(y(0) - y(c)).toFixed(1)}" fill="${COLOURS.neutral}" fill-opacity="0.5"/>`,
    );
  });
  for (const t of x.ticks) {
    body.push(
      `<text x="${x(t).toFixed(1)}" y="${H - M.bottom + 16}" font-size="11" text-anchor="middle" fill="${COLOURS.neutral}">${xml(fmt(t))}</text>`,
    );
  }
  const vline = (
    v: number,
    colour: string,
    dash: string,
    label: string,
    side: 'start' | 'end',
    row: number,
  ) => {
    // Keep the label inside the plot: flip it to the other side of its line when it would not fit.
    const width = label.length * 6.2;
    const anchor =
      side === 'end' && x(v) - width < M.left
        ? 'start'
        : side === 'start' && x(v) + width > W - M.right
          ? 'end'
          : side;
    return (
      `<line x1="${x(v).toFixed(1)}" x2="${x(v).toFixed(1)}" y1="${M.top}" y2="${H - M.bottom}" stroke="${colour}" stroke-width="2" stroke-dasharray="${dash}"/>` +
      `<text x="${x(v).toFixed(1)}" y="${M.top + 10 + 14 * row}" font-size="11" text-anchor="${anchor}" fill="${colour}">${xml(label)}</text>`
    );
  };
  body.push(
    vline(
      boundary,
      COLOURS.ink,
      '4 3',
      ` H0 boundary ${fmt(boundary)} `,
      observed >= boundary ? 'end' : 'start',
      0,
    ),
  );
  body.push(
    vline(
      observed,
      COLOURS.worse,
      '0',
      ` observed ${fmt(observed)} `,
      observed >= boundary ? 'start' : 'end',
      1,
    ),
  );
  body.push(
    `<text x="${W / 2}" y="${H - 6}" font-size="11" text-anchor="middle" fill="${COLOURS.neutral}">resampled mean of the tested differential d</text>`,
  );
  return frame(
    'Bootstrap distribution',
    body,
    'Histogram of the stationary-bootstrap resample means of d, with the observed mean and the boundary of H0.',
  );
}
