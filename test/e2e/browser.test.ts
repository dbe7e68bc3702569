/// <reference lib="dom" />
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { marked } from 'marked';
import { type BrowserContext, chromium } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { differenceSeries, mermaidChart } from '../../src/report/differenceChart.js';
import { renderHtml } from '../../src/report/renderHtml.js';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import { sampleReport } from '../action/sampleReport.js';
import { withPeriods } from '../report/periodsFixture.js';
import { root, runCli } from './cliHelpers.js';

// Every check that needs a browser, in one file so one Chromium runs at a time: Debian's
// chromium, headless, driven by playwright-core (no browser download). Screenshots go to
// tmp/screenshots/ for a person to look at.

const SHOTS = path.join(root, 'tmp', 'screenshots');
const GOLDEN = path.join(root, 'test', 'report', 'golden');
const FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

// A persistent context on a fresh, empty profile folder (the --user-data-dir).
let browser: BrowserContext;
beforeAll(async () => {
  mkdirSync(SHOTS, { recursive: true });
  browser = await chromium.launchPersistentContext(
    mkdtempSync(path.join(tmpdir(), 'skillgate-chromium-')),
    { executablePath: '/usr/bin/chromium', headless: true, args: FLAGS },
  );
});
afterAll(async () => {
  await browser?.close();
});

/**
 * The comment as GitHub shows it, roughly: the GFM rendering (marked, GitHub-flavoured) in a
 * 760 px column with a system font at 14 px, and tables as GitHub styles them in comments
 * (display: block; max-width: 100%; overflow: auto), so a table that is too wide scrolls.
 */
function commentPage(markdown: string): string {
  return `<!doctype html><html><head><meta charset="utf-8"><style>
  body { margin: 0; }
  .comment { width: 760px; box-sizing: border-box; padding: 16px;
    font: 14px/1.5 -apple-system, BlinkMacSystemFont, "Segoe UI", "Noto Sans", Helvetica, Arial, sans-serif; }
  table { display: block; width: max-content; max-width: 100%; overflow: auto; border-spacing: 0; border-collapse: collapse; }
  th, td { padding: 6px 13px; border: 1px solid #d1d9e0; }
  h3 { font-size: 1.25em; margin: 0 0 16px; }
  pre { overflow: auto; padding: 16px; background: #f6f8fa; }
  </style></head><body><div class="comment">${marked.parse(markdown, { gfm: true, async: false })}</div></body></html>`;
}

const CASES = ['demo-pass', 'demo-fail', 'warn', 'missing-rows', 'wide'];

describe('the comment in a pull-request column (760 px)', () => {
  for (const name of CASES) {
    it(`${name}: the main table fits, the verdict and the deciding reason are in the first 600 px`, async () => {
      const md = readFileSync(path.join(GOLDEN, `${name}.md`), 'utf8');
      await expectReadable(md, name);
    });
  }

  it('with the chart of the difference over time (hand-built periods)', async () => {
    await expectReadable(renderMarkdown(withPeriods(sampleReport())), 'with-periods');
  });
});

async function expectReadable(md: string, name: string): Promise<void> {
  const page = await browser.newPage();
  await page.setViewportSize({ width: 760, height: 900 });
  try {
    await page.setContent(commentPage(md));
    const layout = await page.evaluate(() => {
      const table = document.querySelector('table')!;
      const verdict = document.querySelector('h3')!;
      const reason = document.querySelector('.comment > p strong')!;
      return {
        scrollWidth: table.scrollWidth,
        clientWidth: table.clientWidth,
        verdictBottom: verdict.getBoundingClientRect().bottom,
        verdictText: verdict.textContent ?? '',
        reasonBottom: reason.getBoundingClientRect().bottom,
        reasonText: reason.textContent ?? '',
      };
    });
    await page.screenshot({ path: path.join(SHOTS, `comment-${name}.png`), fullPage: true });
    expect(layout.scrollWidth).toBeLessThanOrEqual(layout.clientWidth);
    expect(layout.verdictText).toMatch(/: (PASS|WARN|FAIL)$/);
    expect(layout.verdictBottom).toBeLessThanOrEqual(600);
    expect(layout.reasonText).toMatch(/^The gate (passes|fails)/);
    expect(layout.reasonBottom).toBeLessThanOrEqual(600);
  } finally {
    await page.close();
  }
}

describe('the Mermaid chart', () => {
  it("parses with Mermaid's own parser (the mermaid package, loaded from its local file)", async () => {
    const report = sampleReport();
    const view = withPeriods({ ...report, policy: { ...report.policy, margin: 0.02 } });
    const block = mermaidChart(differenceSeries(view)!);
    const diagram = block.slice(1, -1).join('\n');
    expect(block[1]).toMatch(/^%%\{init: /);
    const page = await browser.newPage();
    await page.setViewportSize({ width: 760, height: 500 });
    try {
      await page.setContent('<!doctype html><html><body><div id="out"></div></body></html>');
      await page.addScriptTag({
        path: path.join(root, 'node_modules', 'mermaid', 'dist', 'mermaid.min.js'),
      });
      const result = await page.evaluate(async (text) => {
        const m = (
          window as unknown as {
            mermaid: {
              initialize: (c: object) => void;
              parse: (t: string) => Promise<{ diagramType: string }>;
              render: (id: string, t: string) => Promise<{ svg: string }>;
            };
          }
        ).mermaid;
        m.initialize({ startOnLoad: false });
        const parsed = await m.parse(text);
        const { svg } = await m.render('chart', text);
        document.getElementById('out')!.innerHTML = svg;
        let broken = '';
        try {
          await m.parse(`${text}\n    line [1, 2`);
        } catch (e) {
          broken = String(e);
        }
        return { type: parsed.diagramType, svg: svg.length, broken };
      }, diagram);
      await page.screenshot({ path: path.join(SHOTS, 'mermaid-chart.png') });
      expect(result.type).toBe('xychart');
      expect(result.svg).toBeGreaterThan(1000);
      // The parser does reject a broken diagram, so the check above can fail.
      expect(result.broken).not.toBe('');
    } finally {
      await page.close();
    }
  });
});

describe('the HTML report', () => {
  it('opens offline with no console errors and no network requests, and is not blank', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'skillgate-html-'));
    const file = path.join(dir, 'report.html');
    const cli = runCli([
      'compare',
      '--baseline',
      path.join(root, 'examples', 'data', 'baseline.csv'),
      '--candidate',
      path.join(root, 'examples', 'data', 'candidate-regressed.csv'),
      '--columns',
      'series=zone,timestamp=target_date,origin=issued,actual=observed,prediction=forecast',
      '--resamples',
      '999',
      '--json',
      path.join(dir, 'report.json'),
      '--html',
      file,
      '--quiet',
    ]);
    expect(cli.status).toBe(1);
    // The CLI's own report, plus the hand-built periods, so the chart of the difference over
    // time is drawn too.
    const report = JSON.parse(readFileSync(path.join(dir, 'report.json'), 'utf8'));
    const withChart = path.join(dir, 'with-periods.html');
    writeFileSync(withChart, renderHtml(withPeriods(report)));
    for (const [target, shot] of [
      [file, 'html-report.png'],
      [withChart, 'html-report-with-periods.png'],
    ] as const) {
      const html = readFileSync(target, 'utf8');
      expect(html).not.toMatch(/<script|<link|@import|url\(|src=/i);
      const page = await browser.newPage();
      await page.setViewportSize({ width: 1000, height: 900 });
      const errors: string[] = [];
      const requests: string[] = [];
      page.on('console', (m) => {
        if (m.type() === 'error') errors.push(m.text());
      });
      page.on('pageerror', (e) => errors.push(String(e)));
      page.on('request', (r) => {
        if (r.url() !== `file://${target}`) requests.push(r.url());
      });
      try {
        await page.goto(`file://${target}`);
        await page.waitForLoadState('load');
        const png = await page.screenshot({ path: path.join(SHOTS, shot), fullPage: true });
        expect(errors).toEqual([]);
        expect(requests).toEqual([]);
        expect(await page.locator('svg').count()).toBeGreaterThanOrEqual(
          target === withChart ? 4 : 3,
        );
        expect(await inkShare(png)).toBeGreaterThan(0.01);
        // Readable on a phone: nothing wider than the screen but the scrolling tables.
        await page.setViewportSize({ width: 390, height: 800 });
        const overflow = await page.evaluate(
          () => document.documentElement.scrollWidth - window.innerWidth,
        );
        expect(overflow, target).toBeLessThanOrEqual(0);
        await page.screenshot({ path: path.join(SHOTS, shot.replace('.png', '-phone.png')) });
      } finally {
        await page.close();
      }
    }
  });
});

/** Share of pixels of a PNG that are not near-white, decoded by the browser itself. */
async function inkShare(png: Buffer): Promise<number> {
  const page = await browser.newPage();
  try {
    return await page.evaluate(async (data) => {
      const image = new Image();
      image.src = `data:image/png;base64,${data}`;
      await image.decode();
      const canvas = document.createElement('canvas');
      canvas.width = image.width;
      canvas.height = image.height;
      const ctx = canvas.getContext('2d')!;
      ctx.drawImage(image, 0, 0);
      const pixels = ctx.getImageData(0, 0, canvas.width, canvas.height).data;
      let ink = 0;
      for (let i = 0; i < pixels.length; i += 4) {
        if (pixels[i]! < 235 || pixels[i + 1]! < 235 || pixels[i + 2]! < 235) ink++;
      }
      return ink / (pixels.length / 4);
    }, png.toString('base64'));
  } finally {
    await page.close();
  }
}
