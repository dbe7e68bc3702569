import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { commentMarker } from '../../src/action/gateComment.js';
import { FakeGitHub } from './fakeGitHubServer.js';
import { checkRequest } from './restDescription.js';
import { BUNDLE, demoInputs, pullRequestEvent, runBundle } from './runBundle.js';

// These tests run the committed bundle (run `npm run build` after changing src/).
const marker = commentMarker('');

let api: FakeGitHub;
let scratch: string;
beforeAll(() => {
  if (!existsSync(BUNDLE)) throw new Error('dist/index.js is missing: run npm run build');
});
beforeEach(async () => {
  api = new FakeGitHub();
  await api.start();
  scratch = mkdtempSync(path.join(tmpdir(), 'skillgate-e2e-'));
});
afterEach(async () => {
  await api.stop();
  // Every request the action made exists, with those fields, in GitHub's REST description.
  expect(api.requests.flatMap(checkRequest)).toEqual([]);
});

const gateCommentsOn = (issue: number, m = marker) =>
  api.commentsOn(issue).filter((c) => c.body.startsWith(`${m}\n`));

describe("pull_request: the gate's own comment", () => {
  it('creates the comment, updates it in place past 30+ other bot comments, and fails on a regression', async () => {
    for (let i = 0; i < 130; i += 1) api.addComment(7, `deploy preview ${i} ready`);
    api.addComment(7, `someone quoting the marker: ${marker}\n`);
    api.addComment(7, `${commentMarker('other gate')}\nanother gate's comment`);

    const first = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'pull_request',
      event: pullRequestEvent(7),
      apiUrl: api.origin,
    });
    expect(first.stderr).toBe('');
    expect(first.code).toBe(0);
    expect(first.outputs.verdict).toBe('pass');
    expect(gateCommentsOn(7)).toHaveLength(1);
    const created = gateCommentsOn(7)[0]!;
    expect(first.outputs['comment-url']).toBe(
      `https://github.example/acme/models/pull/7#issuecomment-${created.id}`,
    );
    expect(created.body).toContain('### skillgate: PASS');
    expect(created.body).toContain('https://github.example/acme/models/actions/runs/4242');
    expect(first.stdout).toMatch(/^::notice title=skillgate::PASS: /m);
    expect(first.summary).toContain('### skillgate: PASS');
    const report = JSON.parse(readFileSync(first.outputs.report!, 'utf8'));
    expect(report.verdict).toBe('pass');
    expect(path.dirname(first.outputs.report!)).toBe(first.dir);

    api.requests.length = 0;
    const second = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'pull_request',
      event: pullRequestEvent(7),
      apiUrl: api.origin,
    });
    expect(second.code).toBe(0);
    expect(gateCommentsOn(7)).toHaveLength(1);
    expect(api.comments).toHaveLength(133);
    const pages = api.requests
      .filter((r) => r.method === 'GET' && r.path.endsWith('/comments'))
      .map((r) => r.query.get('page') ?? '1');
    expect(pages).toEqual(['1', '2']);
    expect(api.writes().map((r) => `${r.method} ${r.path}`)).toEqual([
      `PATCH /repos/acme/models/issues/comments/${created.id}`,
    ]);
    expect(second.outputs['comment-url']).toBe(first.outputs['comment-url']);

    const third = await runBundle({
      inputs: demoInputs('candidate-regressed.csv'),
      eventName: 'pull_request',
      event: pullRequestEvent(7),
      apiUrl: api.origin,
    });
    expect(third.code).toBe(1);
    expect(third.outputs.verdict).toBe('fail');
    expect(third.stdout).toMatch(/^::error title=skillgate::FAIL: /m);
    expect(third.stdout).toMatch(/^::error::skillgate: the gate failed\./m);
    expect(gateCommentsOn(7)).toHaveLength(1);
    expect(gateCommentsOn(7)[0]!.id).toBe(created.id);
    expect(gateCommentsOn(7)[0]!.body).toContain('### skillgate: FAIL');
    expect(
      api.comments.find((c) => c.body.startsWith(commentMarker('other gate')))?.body,
    ).toContain("another gate's comment");
  });

  it('keeps two named gates on one pull request apart', async () => {
    const run = (name: string) =>
      runBundle({
        inputs: { ...demoInputs('candidate.csv'), name },
        eventName: 'pull_request',
        event: pullRequestEvent(8),
        apiUrl: api.origin,
      });
    expect((await run('north')).code).toBe(0);
    expect((await run('south')).code).toBe(0);
    expect((await run('north')).code).toBe(0);
    expect(api.commentsOn(8)).toHaveLength(2);
    expect(gateCommentsOn(8, commentMarker('north'))).toHaveLength(1);
    expect(gateCommentsOn(8, commentMarker('south'))).toHaveLength(1);
  });

  it('retries a server error and a rate limit, then succeeds', async () => {
    api.failures.push(
      {
        match: 'GET /repos/acme/models/issues/9/comments',
        status: 502,
        headers: { 'retry-after': '0' },
        times: 1,
      },
      {
        match: 'POST /repos/acme/models/issues/9/comments',
        status: 403,
        headers: { 'x-ratelimit-remaining': '0', 'retry-after': '0' },
        times: 1,
      },
    );
    const result = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'pull_request',
      event: pullRequestEvent(9),
      apiUrl: api.origin,
    });
    expect(result.code).toBe(0);
    expect(result.stdout).toContain('GitHub answered 502; retrying');
    // The create is not retried blindly: the comments are listed again first.
    expect(result.stdout).toContain(
      'creating the comment failed (GitHub answered 403); checking whether it was created',
    );
    expect(gateCommentsOn(9)).toHaveLength(1);
  });

  it('works against a GitHub Enterprise API root (GITHUB_API_URL with a path)', async () => {
    api.prefix = '/api/v3';
    const result = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'pull_request',
      event: pullRequestEvent(10),
      apiUrl: `${api.origin}/api/v3`,
    });
    expect(result.code).toBe(0);
    expect(gateCommentsOn(10)).toHaveLength(1);
    expect(api.requests.every((r) => r.authorization === 'token test-token')).toBe(true);
  });
});

describe('read-only tokens', () => {
  it('a pull request from a fork: warning, summary, no write, exit code from the verdict', async () => {
    const event = pullRequestEvent(11, 'stranger/models');
    const pass = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'pull_request',
      event,
      apiUrl: api.origin,
    });
    expect(pass.code).toBe(0);
    expect(pass.stdout).toMatch(
      /^::warning::skillgate: no comment: pull request #11 comes from a fork/m,
    );
    expect(pass.summary).toContain('### skillgate: PASS');
    expect(api.requests).toHaveLength(0);
    const fail = await runBundle({
      inputs: demoInputs('candidate-regressed.csv'),
      eventName: 'pull_request',
      event,
      apiUrl: api.origin,
    });
    expect(fail.code).toBe(1);
    expect(fail.summary).toContain('### skillgate: FAIL');
  });

  it('a 403 on writing: warning, summary, exit code from the verdict', async () => {
    api.forbidWrites = true;
    const pass = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'pull_request',
      event: pullRequestEvent(12),
      apiUrl: api.origin,
    });
    expect(pass.code).toBe(0);
    expect(pass.stdout).toMatch(
      /^::warning::skillgate: GitHub refused to write the comment \(403\)/m,
    );
    expect(pass.summary).toContain('### skillgate: PASS');
    expect(pass.outputs['comment-url']).toBeUndefined();
    expect(api.writes()).toHaveLength(1); // a plain 403 is not retried
    const fail = await runBundle({
      inputs: demoInputs('candidate-regressed.csv'),
      eventName: 'pull_request',
      event: pullRequestEvent(12),
      apiUrl: api.origin,
    });
    expect(fail.code).toBe(1);
    expect(fail.stdout).toContain('GitHub refused to write the comment (403)');
  });
});

describe('other events', () => {
  it('push: comments on the open pull request of the pushed commit', async () => {
    const sha = 'abc1230000000000000000000000000000000000';
    api.pulls.push(
      { number: 3, state: 'closed', headSha: sha, head: 'acme:old' },
      { number: 21, state: 'open', headSha: sha, head: 'acme:feature' },
    );
    api.commitPulls.set(sha, [3, 21]);
    const result = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'push',
      event: { after: sha, ref: 'refs/heads/feature' },
      apiUrl: api.origin,
    });
    expect(result.code).toBe(0);
    expect(gateCommentsOn(21)).toHaveLength(1);
    expect(api.commentsOn(3)).toHaveLength(0);
  });

  it('push without a pull request, and workflow_dispatch without a number: summary only', async () => {
    const push = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'push',
      event: { after: 'def4560000000000000000000000000000000000' },
      apiUrl: api.origin,
    });
    expect(push.code).toBe(0);
    expect(push.summary).toContain('### skillgate: PASS');
    const manual = await runBundle({
      inputs: demoInputs('candidate-regressed.csv'),
      eventName: 'workflow_dispatch',
      event: { inputs: {} },
      apiUrl: api.origin,
    });
    expect(manual.code).toBe(1);
    expect(manual.summary).toContain('### skillgate: FAIL');
    expect(api.writes()).toHaveLength(0);
  });

  it('workflow_dispatch with pull-request: comments on that pull request', async () => {
    const result = await runBundle({
      inputs: { ...demoInputs('candidate.csv'), 'pull-request': '31' },
      eventName: 'workflow_dispatch',
      event: { inputs: {} },
      apiUrl: api.origin,
    });
    expect(result.code).toBe(0);
    expect(gateCommentsOn(31)).toHaveLength(1);
  });
});

describe('input errors', () => {
  it('a bad input fails the step with a message naming it, no stack trace', async () => {
    const result = await runBundle({
      inputs: { ...demoInputs('candidate.csv'), alpha: 'lots' },
      eventName: 'pull_request',
      event: pullRequestEvent(13),
      apiUrl: api.origin,
    });
    expect(result.code).toBe(1);
    expect(result.stdout).toContain(
      `::error::skillgate: input 'alpha' must be a number between 0 and 0.5`,
    );
    expect(result.stdout + result.stderr).not.toMatch(/\n\s+at /);
    expect(api.requests).toHaveLength(0);
  });

  it('a missing file fails the step naming the file', async () => {
    const result = await runBundle({
      inputs: { ...demoInputs('candidate.csv'), candidate: 'examples/data/nope.csv' },
      eventName: 'pull_request',
      event: pullRequestEvent(13),
      apiUrl: api.origin,
    });
    expect(result.code).toBe(1);
    expect(result.stdout).toMatch(/^::error::skillgate: .*examples\/data\/nope\.csv/m);
  });
});

/** A report written by the CLI-equivalent first run, reused to build large and hostile reports. */
async function demoReport(): Promise<Record<string, unknown>> {
  const result = await runBundle({
    inputs: { ...demoInputs('candidate.csv'), comment: 'false' },
    eventName: 'workflow_dispatch',
    event: {},
    apiUrl: api.origin,
  });
  expect(result.code).toBe(0);
  return JSON.parse(readFileSync(result.outputs.report!, 'utf8'));
}

describe('report-file (fork-safe posting from workflow_run)', () => {
  const workflowRun = (headSha: string) => ({
    action: 'completed',
    workflow_run: {
      id: 777,
      head_sha: headSha,
      head_branch: 'tweak',
      head_repository: { full_name: 'stranger/models', owner: { login: 'stranger' } },
      pull_requests: [],
    },
  });

  it('posts a stored report on the pull request whose head is the tested commit', async () => {
    // The gating job: a fork's pull request, no comment, the report kept for the poster.
    const gating = await runBundle({
      inputs: { ...demoInputs('candidate-regressed.csv'), comment: 'false' },
      eventName: 'pull_request',
      event: pullRequestEvent(40, 'stranger/models'),
      apiUrl: api.origin,
    });
    expect(gating.code).toBe(1);
    const reportPath = gating.outputs.report!;
    const sha = 'feed000000000000000000000000000000000001';
    api.pulls.push({ number: 40, state: 'open', headSha: sha, head: 'stranger:tweak' });
    const result = await runBundle({
      inputs: { 'report-file': reportPath },
      eventName: 'workflow_run',
      event: workflowRun(sha),
      apiUrl: api.origin,
    });
    expect(result.outputs.verdict).toBe('fail');
    expect(result.code).toBe(1);
    expect(gateCommentsOn(40)).toHaveLength(1);
    expect(gateCommentsOn(40)[0]!.body).toContain(
      'https://github.example/acme/models/actions/runs/777',
    );
  });

  it('refuses a number that does not match the tested commit, and malformed reports', async () => {
    const report = await demoReport();
    const file = path.join(scratch, 'report.json');
    writeFileSync(file, JSON.stringify(report));
    api.pulls.push({
      number: 41,
      state: 'open',
      headSha: 'aaaa000000000000000000000000000000000000',
      head: 'acme:main-ish',
    });
    const wrong = await runBundle({
      inputs: { 'report-file': file, 'pull-request': '41' },
      eventName: 'workflow_run',
      event: workflowRun('bbbb000000000000000000000000000000000000'),
      apiUrl: api.origin,
    });
    expect(wrong.code).toBe(0);
    expect(wrong.stdout).toContain('::warning::skillgate: no comment: pull request #41 is at aaaa');
    expect(api.writes()).toHaveLength(0);

    writeFileSync(file, JSON.stringify({ ...report, verdict: 'pass<!-- x -->' }));
    const bad = await runBundle({
      inputs: { 'report-file': file },
      eventName: 'workflow_run',
      event: workflowRun('bbbb000000000000000000000000000000000000'),
      apiUrl: api.origin,
    });
    expect(bad.code).toBe(1);
    expect(bad.stdout).toContain('field $.verdict must be one of pass, warn, fail');
  });

  it('shortens an oversized report under the comment and summary limits', async () => {
    const report = await demoReport();
    const overall = (report.comparisons as Record<string, unknown>[])[0]!;
    const many = Array.from({ length: 4000 }, (_, i) => ({ ...overall, horizon: i + 1 }));
    const file = path.join(scratch, 'big.json');
    writeFileSync(file, JSON.stringify({ ...report, comparisons: [overall, ...many] }));
    const result = await runBundle({
      inputs: { 'report-file': file, 'pull-request': '50' },
      eventName: 'workflow_dispatch',
      event: {},
      apiUrl: api.origin,
    });
    expect(result.code).toBe(0);
    const body = gateCommentsOn(50)[0]!.body;
    expect(body.length).toBeLessThanOrEqual(65_536);
    expect(body.length).toBeGreaterThan(50_000);
    expect(body).toMatch(
      /This report was shortened to fit GitHub's size limit\. It shows \d+ of 4001 comparisons\./,
    );
    expect(body).toContain('[this run](https://github.example/acme/models/actions/runs/4242)');
    expect((body.match(/<details>/g) ?? []).length).toBe((body.match(/<\/details>/g) ?? []).length);
    expect(Buffer.byteLength(result.summary)).toBeLessThanOrEqual(1024 * 1024);
  });
});

describe('hostile names', () => {
  const hostile = [
    'a|b',
    '<!-- skillgate:gate= -->',
    '@acme/team',
    '<img src=x onerror=alert(1)>',
    '**bold** [x](http://evil)',
  ];

  function writeCsvs(): { baseline: string; candidate: string } {
    const header = 'series,timestamp,actual,prediction';
    const base: string[] = [header];
    const cand: string[] = [header];
    for (const [s, name] of hostile.entries()) {
      for (let t = 1; t <= 40; t += 1) {
        const actual = 10 + Math.sin(t + s);
        const quoted = `"${name.replace(/"/g, '""')}"`;
        base.push(
          `${quoted},${t},${actual.toFixed(3)},${(actual + 0.5 * Math.cos(3 * t + s)).toFixed(3)}`,
        );
        // The candidate skips a few rows of every series, so the keys show up in the report.
        if (t % 13 !== 0)
          cand.push(
            `${quoted},${t},${actual.toFixed(3)},${(actual + 0.4 * Math.cos(5 * t + s)).toFixed(3)}`,
          );
      }
    }
    const baseline = path.join(scratch, 'hostile-baseline.csv');
    const candidate = path.join(scratch, 'hostile-candidate.csv');
    writeFileSync(baseline, `${base.join('\n')}\n`);
    writeFileSync(candidate, `${cand.join('\n')}\n`);
    return { baseline, candidate };
  }

  it('cannot break the table, fake the marker or mention anyone', async () => {
    const files = writeCsvs();
    const name = '--> @acme/team <b>|x|</b>';
    const inputs = { ...files, name, 'allow-missing': 'true', resamples: '999' };
    const first = await runBundle({
      inputs,
      eventName: 'pull_request',
      event: pullRequestEvent(60),
      apiUrl: api.origin,
    });
    expect(first.stderr).toBe('');
    expect(first.code).toBe(0);
    const ours = commentMarker(name);
    expect(gateCommentsOn(60, ours)).toHaveLength(1);
    const body = gateCommentsOn(60, ours)[0]!.body;

    const [firstLine, ...rest] = body.split('\n');
    expect(firstLine).toBe(ours);
    const text = rest.join('\n');
    expect(text).not.toContain('<!--');
    expect(text).not.toMatch(/<img|<b>/i);
    expect(text).not.toMatch(/@acme/); // a zero-width space follows every @
    expect(text).not.toMatch(/\[x\]\(http/);
    // Every row of every table has as many unescaped cell separators as its header.
    const tables = text.split(/\n\n+/).filter((block) => block.startsWith('|'));
    expect(tables.length).toBeGreaterThan(0);
    for (const table of tables) {
      const cells = table.split('\n').map((row) => row.replace(/\\\|/g, '').split('|').length);
      expect(new Set(cells).size).toBe(1);
    }
    // The hostile names are shown, escaped.
    expect(text).toContain('series=&lt;\\!-- skillgate:gate= --&gt; timestamp=13');
    expect(text).toContain('\\*\\*bold\\*\\*');
    expect(text).toContain(
      '### skillgate · --&gt; @\u200Bacme/team &lt;b&gt;\\|x\\|&lt;/b&gt;: PASS',
    );

    // A second run still finds exactly its own comment.
    const second = await runBundle({
      inputs,
      eventName: 'pull_request',
      event: pullRequestEvent(60),
      apiUrl: api.origin,
    });
    expect(second.code).toBe(0);
    expect(api.commentsOn(60)).toHaveLength(1);
    expect(second.outputs['comment-url']).toBe(first.outputs['comment-url']);
  });
});
