import { mkdirSync, mkdtempSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { commentMarker } from '../../src/action/gateComment.js';
import { FakeGitHub } from './fakeGitHubServer.js';
import { checkRequest } from './restDescription.js';
import { BUNDLE, demoInputs, pullRequestEvent, runBundle } from './runBundle.js';

// The action run as the runner runs it (dist/index.js; `npm run build` after changing src/)
// against a loopback stand-in for the REST API that misbehaves as an attacker or an outage would.
const marker = commentMarker('');

let api: FakeGitHub;
let scratch: string;
beforeAll(() => {
  if (!existsBundle()) throw new Error('dist/index.js is missing: run npm run build');
});
beforeEach(async () => {
  api = new FakeGitHub();
  await api.start();
  scratch = mkdtempSync(path.join(tmpdir(), 'skillgate-hostile-'));
});
afterEach(async () => {
  await api.stop();
  expect(api.requests.flatMap(checkRequest)).toEqual([]);
});

function existsBundle(): boolean {
  try {
    readFileSync(BUNDLE);
    return true;
  } catch {
    return false;
  }
}

const gate = (issue: number, extra: Record<string, string> = {}, env = {}) =>
  runBundle({
    inputs: { ...demoInputs('candidate.csv'), ...extra },
    eventName: 'pull_request',
    event: pullRequestEvent(issue),
    apiUrl: api.origin,
    env,
  });
const withMarker = (issue: number, m = marker) =>
  api.commentsOn(issue).filter((c) => c.body.startsWith(m));

describe('1. only comments written by the identity the action posts as are edited', () => {
  it('a marker posted first by someone else is neither edited nor able to block the gate', async () => {
    const forged = api.addComment(70, `${marker}\n### skillgate: PASS (forged)`, 'mallory');
    const first = await gate(70);
    expect(first.code).toBe(0);
    expect(api.writes().map((r) => r.method)).toEqual(['POST']);
    expect(forged.body).toBe(`${marker}\n### skillgate: PASS (forged)`);
    const own = withMarker(70).filter((c) => c.user === 'github-actions[bot]');
    expect(own).toHaveLength(1);
    expect(first.outputs['comment-url']).toContain(`issuecomment-${own[0]!.id}`);
    expect(first.stdout).toContain(
      "ignored 1 comment carrying this gate's marker but not written by github-actions[bot]",
    );
    expect(first.stdout).not.toContain('::warning::');

    // The squatter edits its comment back to PASS; the gate's next run edits only its own.
    const regressed = await gate(70, demoInputs('candidate-regressed.csv'));
    expect(regressed.code).toBe(1);
    expect(api.writes().map((r) => `${r.method} ${r.path}`)).toEqual([
      'POST /repos/acme/models/issues/70/comments',
      `PATCH /repos/acme/models/issues/comments/${own[0]!.id}`,
    ]);
    expect(own[0]!.body).toContain('### skillgate: FAIL');
    expect(forged.body).toContain('PASS (forged)');
  });

  it('with a personal access token, the identity GitHub reports for it (GET /user)', async () => {
    api.userLogin = 'release-robot';
    const botsComment = api.addComment(71, `${marker}\nwritten with another token`);
    expect((await gate(71)).code).toBe(0);
    expect((await gate(71)).code).toBe(0);
    const own = withMarker(71).filter((c) => c.user === 'release-robot');
    expect(own).toHaveLength(1);
    expect(botsComment.body).toBe(`${marker}\nwritten with another token`);
    expect(api.requests.filter((r) => r.path === '/user')).toHaveLength(2);
    expect(api.writes().map((r) => r.method)).toEqual(['POST', 'PATCH']);
  });
});

describe('1. a GitHub App token, named by the comment-author input', () => {
  // An App's own installation token: GET /user is refused, and comments are written as APP[bot].
  const asApp = { 'comment-author': 'my-app[bot]' };

  it('two runs leave one comment, and a squatter with the marker is not edited', async () => {
    api.botUser = 'my-app[bot]';
    const squatter = api.addComment(80, `${marker}\n### skillgate: PASS (squatted)`, 'mallory');
    const first = await gate(80, asApp);
    expect(first.code).toBe(0);
    const second = await gate(80, { ...asApp, ...demoInputs('candidate-regressed.csv') });
    expect(second.code).toBe(1);
    const own = withMarker(80).filter((c) => c.user === 'my-app[bot]');
    expect(own).toHaveLength(1);
    expect(own[0]!.body).toContain('### skillgate: FAIL');
    expect(api.writes().map((r) => `${r.method} ${r.path}`)).toEqual([
      'POST /repos/acme/models/issues/80/comments',
      `PATCH /repos/acme/models/issues/comments/${own[0]!.id}`,
    ]);
    expect(squatter.body).toBe(`${marker}\n### skillgate: PASS (squatted)`);
    // The input is the identity: GitHub is not asked, and nothing warns.
    expect(api.requests.filter((r) => r.path === '/user')).toHaveLength(0);
    for (const run of [first, second]) {
      expect(run.stdout).toContain('(as my-app[bot])');
      expect(run.stdout).toContain(
        "ignored 1 comment carrying this gate's marker but not written by my-app[bot]",
      );
      expect(run.stdout).not.toContain('::warning::');
    }
  });

  it('without the input, the warning after the first post names it as the fix', async () => {
    api.botUser = 'my-app[bot]';
    const first = await gate(81);
    expect(first.code).toBe(0);
    expect(first.stdout).toContain(
      "::warning::skillgate: the comment was written as my-app[bot], not as github-actions[bot]; later runs will not recognise it and will post again. With a GitHub App's installation token as github-token, set input 'comment-author' to the login its comments are written as (here: my-app[bot]).",
    );
  });

  it('refuses a value that is not a GitHub login, before any request', async () => {
    for (const value of ['my app[bot]', '-bot', 'app[bot]x', `${'a'.repeat(40)}[bot]`]) {
      // An input error fails the step (exit 1, as the runner's setFailed does) before any request.
      const result = await gate(82, { 'comment-author': value });
      expect(result.code).toBe(1);
      expect(result.stdout).toContain(
        `::error::skillgate: input 'comment-author' must be a GitHub login such as my-app[bot] (letters, digits and single inner hyphens, at most 39 characters, optionally followed by [bot]) (value ${JSON.stringify(value)})`,
      );
    }
    expect(api.requests).toEqual([]);
  });
});

describe('2. no duplicate comments', () => {
  it('a create that GitHub carried out but answered with 502 is not repeated', async () => {
    api.failures.push({
      match: 'POST /repos/acme/models/issues/72/comments',
      status: 502,
      when: 'after',
      times: 1,
    });
    const result = await gate(72);
    expect(result.code).toBe(0);
    expect(api.commentsOn(72)).toHaveLength(1);
    expect(api.writes().filter((r) => r.method === 'POST')).toHaveLength(1);
    expect(result.stdout).toContain('checking whether it was created before trying again');
    expect(result.outputs['comment-url']).toContain(`issuecomment-${api.commentsOn(72)[0]!.id}`);
  });

  it('a create whose connection dropped after GitHub carried it out is not repeated', async () => {
    api.failures.push({
      match: 'POST /repos/acme/models/issues/73/comments',
      kind: 'reset',
      when: 'after',
      times: 1,
    });
    const result = await gate(73);
    expect(result.code).toBe(0);
    expect(api.commentsOn(73)).toHaveLength(1);
    expect(api.writes().filter((r) => r.method === 'POST')).toHaveLength(1);
  });

  it('a create that failed before reaching GitHub is repeated once the listing shows none', async () => {
    api.failures.push({
      match: 'POST /repos/acme/models/issues/74/comments',
      status: 503,
      times: 1,
    });
    const result = await gate(74);
    expect(result.code).toBe(0);
    expect(api.commentsOn(74)).toHaveLength(1);
    expect(api.writes().filter((r) => r.method === 'POST')).toHaveLength(2);
  });

  it('of several own comments, the newest is kept up to date and the others removed', async () => {
    const stale = api.addComment(75, `${marker}\n### skillgate: PASS (stale)`);
    const newer = api.addComment(75, `${marker}\n### skillgate: PASS (newer)`);
    const result = await gate(75, demoInputs('candidate-regressed.csv'));
    expect(result.code).toBe(1);
    expect(api.commentsOn(75).map((c) => c.id)).toEqual([newer.id]);
    expect(newer.body).toContain('### skillgate: FAIL');
    expect(api.comments.some((c) => c.id === stale.id)).toBe(false);
  });

  it('two runs of one pull request at the same time end with one comment', async () => {
    // No create is answered before both have arrived, so both runs listed none and created one.
    api.barrier = {
      match: 'POST /repos/acme/models/issues/76/comments',
      count: 2,
      timeoutMs: 30_000,
    };
    const [a, b] = await Promise.all([gate(76), gate(76, demoInputs('candidate-regressed.csv'))]);
    expect(a.code).toBe(0);
    expect(b.code).toBe(1);
    expect(api.writes().filter((r) => r.method === 'POST')).toHaveLength(2);
    expect(api.commentsOn(76)).toHaveLength(1);
    expect(api.writes().filter((r) => r.method === 'DELETE').length).toBeGreaterThanOrEqual(1);
  });
});

describe('3. an uploaded report does not choose the marker', () => {
  const workflowRun = (headSha: string) => ({
    action: 'completed',
    workflow_run: {
      id: 778,
      head_sha: headSha,
      head_branch: 'tweak',
      head_repository: { full_name: 'stranger/models', owner: { login: 'stranger' } },
      pull_requests: [],
    },
  });

  it("a report named like another gate cannot overwrite that gate's comment", async () => {
    // A trusted gate named "nightly" has commented on pull request 77.
    const trusted = await gate(77, { name: 'nightly' });
    expect(trusted.code).toBe(0);
    const nightly = withMarker(77, commentMarker('nightly'));
    expect(nightly).toHaveLength(1);
    const before = nightly[0]!.body;

    // A fork's artifact claims the name "nightly" (and a regression, to be visible).
    const forked = await runBundle({
      inputs: { ...demoInputs('candidate-regressed.csv'), comment: 'false', name: 'nightly' },
      eventName: 'workflow_dispatch',
      event: {},
      apiUrl: api.origin,
    });
    const report = JSON.parse(readFileSync(forked.outputs.report!, 'utf8'));
    expect(report.name).toBe('nightly');
    const file = path.join(scratch, 'report.json');
    writeFileSync(file, JSON.stringify(report));
    const sha = 'feed000000000000000000000000000000000077';
    api.pulls.push({ number: 77, state: 'open', headSha: sha, head: 'stranger:tweak' });

    const posted = await runBundle({
      inputs: { 'report-file': file },
      eventName: 'workflow_run',
      event: workflowRun(sha),
      apiUrl: api.origin,
    });
    expect(posted.code).toBe(1);
    expect(withMarker(77, commentMarker('nightly'))[0]!.body).toBe(before);
    const unnamed = withMarker(77, `${marker}\n`);
    expect(unnamed).toHaveLength(1);
    expect(unnamed[0]!.body).toContain('### skillgate: FAIL');
    expect(unnamed[0]!.body).not.toContain('skillgate · nightly');

    // With the trusted `name` input, the posted report gets that name's comment and title.
    const named = await runBundle({
      inputs: { 'report-file': file, name: 'fork gate' },
      eventName: 'workflow_run',
      event: workflowRun(sha),
      apiUrl: api.origin,
    });
    expect(named.code).toBe(1);
    const own = withMarker(77, commentMarker('fork gate'));
    expect(own).toHaveLength(1);
    expect(own[0]!.body).toContain('### skillgate · fork gate: FAIL');
  });
});

describe('4. timeouts', () => {
  it('an API that never answers does not hang the step', async () => {
    api.failures.push({
      match: 'GET /repos/acme/models/issues/78/comments',
      kind: 'hang',
      times: 100,
    });
    const started = Date.now();
    const result = await gate(78, {}, { SKILLGATE_API_TIMEOUT_MS: '300' });
    const seconds = (Date.now() - started) / 1000;
    expect(result.code).toBe(0);
    expect(result.outputs.verdict).toBe('pass');
    expect(result.stdout).toMatch(
      /^::warning::skillgate: could not post the comment: (GitHub did not answer GET .* within 300 ms|the API calls took longer than their budget of 1 s)/m,
    );
    expect(result.summary).toContain('### skillgate: PASS');
    // 300 ms per request, 1.2 s in all: far below the runBundle kill after 60 s.
    expect(seconds).toBeLessThan(30);
    expect(api.writes()).toHaveLength(0);
  });
});

describe('5. push events', () => {
  it('a commit that is not the head of an open pull request comments nowhere', async () => {
    const sha = 'abc4560000000000000000000000000000000000';
    api.pulls.push({ number: 79, state: 'open', headSha: 'f'.repeat(40), head: 'acme:feature' });
    api.commitPulls.set(sha, [79]);
    const result = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'push',
      event: { after: sha, ref: 'refs/heads/main' },
      apiUrl: api.origin,
    });
    expect(result.code).toBe(0);
    expect(result.stdout).toContain('is the head of no open pull request');
    expect(api.writes()).toHaveLength(0);
  });

  it('a tag push posts nothing and asks nothing', async () => {
    const sha = 'abc7890000000000000000000000000000000000';
    api.pulls.push({ number: 80, state: 'open', headSha: sha, head: 'acme:release' });
    api.commitPulls.set(sha, [80]);
    const result = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'push',
      event: { after: sha, ref: 'refs/tags/v1.2.3' },
      apiUrl: api.origin,
    });
    expect(result.code).toBe(0);
    expect(result.stdout).toContain('a tag push (refs/tags/v1.2.3) belongs to no pull request');
    expect(api.requests).toHaveLength(0);
  });
});

describe('6. rate limits and comments edited in the browser', () => {
  it('an exhausted primary rate limit is reported as such, not as a read-only token', async () => {
    const reset = String(Math.floor(Date.now() / 1000) + 3600);
    api.failures.push({
      match: 'POST /repos/acme/models/issues/81/comments',
      status: 403,
      headers: { 'x-ratelimit-remaining': '0', 'x-ratelimit-reset': reset },
      message: 'API rate limit exceeded for installation ID 1.',
      times: 5,
    });
    const result = await gate(81);
    expect(result.code).toBe(0);
    expect(result.stdout).toMatch(
      /^::warning::skillgate: GitHub's rate limit stopped the comment/m,
    );
    expect(result.stdout).not.toContain('read-only');
  });

  it('a secondary rate limit (403 naming it) is reported as such', async () => {
    api.failures.push({
      match: 'POST /repos/acme/models/issues/82/comments',
      status: 403,
      headers: { 'retry-after': '3600' },
      message: 'You have exceeded a secondary rate limit. Please wait a few minutes.',
      times: 5,
    });
    const result = await gate(82);
    expect(result.code).toBe(0);
    expect(result.stdout).toMatch(
      /^::warning::skillgate: GitHub's rate limit stopped the comment/m,
    );
    expect(result.stdout).not.toContain('read-only');
  });

  it('a comment whose line endings became CRLF in the browser is still found', async () => {
    const edited = api.addComment(83, `${marker}\r\n### skillgate: PASS\r\n\r\nedited by hand`);
    const result = await gate(83);
    expect(result.code).toBe(0);
    expect(api.commentsOn(83).map((c) => c.id)).toEqual([edited.id]);
    expect(api.writes().map((r) => r.method)).toEqual(['PATCH']);
  });
});

describe('8. report-file reads only regular files', () => {
  it('refuses a symbolic link and a directory', async () => {
    const report = await runBundle({
      inputs: { ...demoInputs('candidate.csv'), comment: 'false' },
      eventName: 'workflow_dispatch',
      event: {},
      apiUrl: api.origin,
    });
    const real = path.join(scratch, 'real.json');
    writeFileSync(real, readFileSync(report.outputs.report!));
    const link = path.join(scratch, 'link.json');
    symlinkSync(real, link);
    const viaLink = await runBundle({
      inputs: { 'report-file': link, 'pull-request': '84' },
      eventName: 'workflow_dispatch',
      event: {},
      apiUrl: api.origin,
    });
    expect(viaLink.code).toBe(1);
    expect(viaLink.stdout).toContain(
      "::error::skillgate: input 'report-file': is a symbolic link; only a regular file is read",
    );
    const folder = path.join(scratch, 'folder.json');
    mkdirSync(folder);
    const viaFolder = await runBundle({
      inputs: { 'report-file': folder, 'pull-request': '84' },
      eventName: 'workflow_dispatch',
      event: {},
      apiUrl: api.origin,
    });
    expect(viaFolder.code).toBe(1);
    expect(viaFolder.stdout).toContain("input 'report-file': is not a regular file");
    const direct = await runBundle({
      inputs: { 'report-file': real, 'pull-request': '84' },
      eventName: 'workflow_dispatch',
      event: {},
      apiUrl: api.origin,
    });
    expect(direct.code).toBe(0);
    expect(withMarker(84)).toHaveLength(1);
    expect(api.writes().map((r) => r.method)).toEqual(['POST']);
  });
});

describe('7. input text cannot link, reference or reorder in the comment and the summary', () => {
  // At most five series per run: the report lists five examples of rows left out.
  const groups = [
    ['see https://evil.example/x', 'www.evil.example', 'fixes #1', 'acme/models#2'],
    ['GH-3', 'ab\u202Ecd', 'ef\u2066gh\u2069', 'line\u2028break\u2029here'],
  ];

  async function gateOn(issue: number, names: readonly string[]) {
    const header = 'series,timestamp,actual,prediction';
    const base: string[] = [header];
    const cand: string[] = [header];
    for (const [s, name] of names.entries()) {
      for (let t = 1; t <= 40; t += 1) {
        const actual = 10 + Math.sin(t + s);
        const row = (noise: number) =>
          `"${name}",${t},${actual.toFixed(3)},${(actual + noise).toFixed(3)}`;
        base.push(row(0.5 * Math.cos(3 * t + s)));
        // A row the candidate lacks puts the series name into the report.
        if (t !== 13) cand.push(row(0.4 * Math.cos(5 * t + s)));
      }
    }
    const baseline = path.join(scratch, `refs-baseline-${issue}.csv`);
    const candidate = path.join(scratch, `refs-candidate-${issue}.csv`);
    writeFileSync(baseline, `${base.join('\n')}\n`);
    writeFileSync(candidate, `${cand.join('\n')}\n`);
    const result = await runBundle({
      inputs: {
        baseline,
        candidate,
        'allow-missing': 'true',
        resamples: '199',
        name: 'GH-9 #5 www.x.example https://x.example',
      },
      eventName: 'pull_request',
      event: pullRequestEvent(issue),
      apiUrl: api.origin,
    });
    expect(result.stderr).toBe('');
    expect(result.code).toBe(0);
    // The hidden marker line (percent-encoded, inside an HTML comment) is not shown.
    const shown = api.commentsOn(issue)[0]!.body.split('\n').slice(1).join('\n');
    return { comment: shown, summary: result.summary };
  }

  const neutral = (text: string, where: string) => {
    expect(text, where).not.toMatch(/https?:\/\/(evil|x)/i);
    expect(text, where).not.toMatch(/www\.(evil|x)/i);
    expect(text, where).not.toMatch(/#\d/);
    expect(text, where).not.toMatch(/\bGH-\d/i);
    expect(text, where).not.toMatch(/[\u202a-\u202e\u2066-\u2069\u2028\u2029]/);
    expect(text, where).toContain(
      'GH-\u200B9 \\#\u200B5 www\u200B.x.example https:\u200B//x.example',
    );
  };

  it('bare URLs, www links, #1 and owner/repo#2 references', async () => {
    const out = await gateOn(85, groups[0]!);
    for (const [where, text] of Object.entries(out)) {
      neutral(text, where);
      expect(text, where).toContain('series=see https:\u200B//evil.example/x');
      expect(text, where).toContain('series=www\u200B.evil.example');
      expect(text, where).toContain('series=fixes \\#\u200B1');
      expect(text, where).toContain('series=acme/models\\#\u200B2');
    }
  });

  it('GH-3 references, bidirectional controls and line separators', async () => {
    const out = await gateOn(86, groups[1]!);
    for (const [where, text] of Object.entries(out)) {
      neutral(text, where);
      expect(text, where).toContain('series=GH-\u200B3');
      expect(text, where).toContain('series=ab\uFFFDcd');
      expect(text, where).toContain('series=ef\uFFFDgh\uFFFD');
      expect(text, where).toContain('series=line break here');
    }
  });
});
