import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { commentMarker } from '../../src/action/gateComment.js';
import { FakeGitHub } from './fakeGitHubServer.js';
import { checkRequest } from './restDescription.js';
import { demoInputs, runBundle } from './runBundle.js';

// The action on real example event payloads as GitHub sends them (the npm package
// `@octokit/webhooks-examples`), run as the runner runs dist/index.js against the loopback API.
// biome-ignore lint/suspicious/noExplicitAny: the example payloads are untyped JSON
type Payload = Record<string, any>;
interface Examples {
  readonly name: string;
  readonly examples: readonly Record<string, unknown>[];
}
const all = createRequire(import.meta.url)('@octokit/webhooks-examples') as Examples[];
function example(event: string, pick: (p: Record<string, unknown>) => boolean) {
  const found = all.find((e) => e.name === event)?.examples.find(pick);
  if (found === undefined) throw new Error(`no ${event} example`);
  return structuredClone(found) as Payload;
}

const marker = commentMarker('');
let api: FakeGitHub;
beforeEach(async () => {
  api = new FakeGitHub();
  await api.start();
});
afterEach(async () => {
  await api.stop();
  expect(api.requests.flatMap(checkRequest)).toEqual([]);
});
const gateComments = (issue: number) =>
  api.commentsOn(issue).filter((c) => c.body.startsWith(`${marker}\n`));

describe('pull_request', () => {
  const synchronize = () => example('pull_request', (p) => p.action === 'synchronize');

  it('from a branch: comments on the pull request the payload names', async () => {
    const event = synchronize();
    const number = event.pull_request.number as number;
    const result = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'pull_request',
      event,
      apiUrl: api.origin,
    });
    expect(result.code).toBe(0);
    expect(gateComments(number)).toHaveLength(1);
  });

  it('from a fork (the example with its head in another repository): summary and a warning only', async () => {
    const event = synchronize();
    event.pull_request.head.repo.full_name = 'stranger/Hello-World';
    const result = await runBundle({
      inputs: demoInputs('candidate-regressed.csv'),
      eventName: 'pull_request',
      event,
      apiUrl: api.origin,
    });
    expect(result.code).toBe(1);
    expect(result.stdout).toMatch(
      /^::warning::skillgate: no comment: pull request #\d+ comes from a fork/m,
    );
    expect(result.summary).toContain('### skillgate: FAIL');
    expect(api.requests).toHaveLength(0);
  });
});

describe('workflow_dispatch', () => {
  it('comments only on the pull-request input', async () => {
    const event = example('workflow_dispatch', () => true);
    const without = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'workflow_dispatch',
      event,
      apiUrl: api.origin,
    });
    expect(without.code).toBe(0);
    expect(api.requests).toHaveLength(0);
    const withNumber = await runBundle({
      inputs: { ...demoInputs('candidate.csv'), 'pull-request': '12' },
      eventName: 'workflow_dispatch',
      event,
      apiUrl: api.origin,
    });
    expect(withNumber.code).toBe(0);
    expect(gateComments(12)).toHaveLength(1);
  });
});

describe('workflow_run', () => {
  it('posts a stored report on the listed pull request once its head is the run commit', async () => {
    const event = example(
      'workflow_run',
      (p) => p.action === 'completed' && (p.workflow_run as Payload).pull_requests.length > 0,
    );
    const run = event.workflow_run;
    const number = run.pull_requests[0].number as number;
    const stored = await runBundle({
      inputs: { ...demoInputs('candidate.csv'), comment: 'false' },
      eventName: 'workflow_dispatch',
      event: {},
      apiUrl: api.origin,
    });
    const dir = mkdtempSync(path.join(tmpdir(), 'skillgate-payload-'));
    const file = path.join(dir, 'report.json');
    writeFileSync(file, readFileSync(stored.outputs.report!));
    api.pulls.push({ number, state: 'open', headSha: 'e'.repeat(40), head: 'x:y' });

    // The listed pull request has moved on: nothing is posted.
    const moved = await runBundle({
      inputs: { 'report-file': file },
      eventName: 'workflow_run',
      event,
      apiUrl: api.origin,
    });
    expect(moved.code).toBe(0);
    expect(moved.stdout).toContain(`no comment: pull request #${number} is at eeeeeeeeeeee`);
    expect(api.writes()).toHaveLength(0);

    api.pulls[0]!.headSha = run.head_sha as string;
    const posted = await runBundle({
      inputs: { 'report-file': file },
      eventName: 'workflow_run',
      event,
      apiUrl: api.origin,
    });
    expect(posted.code).toBe(0);
    expect(gateComments(number)).toHaveLength(1);
    expect(gateComments(number)[0]!.body).toContain(`/actions/runs/${run.id}`);
  });
});

describe('push', () => {
  it('a branch push comments on the open pull request whose head is the pushed commit', async () => {
    const event = example('push', (p) => String(p.ref).startsWith('refs/heads/'));
    const sha = event.after as string;
    api.pulls.push({ number: 14, state: 'open', headSha: sha, head: 'Codertocat:master' });
    api.commitPulls.set(sha, [14]);
    const result = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'push',
      event,
      apiUrl: api.origin,
    });
    expect(result.code).toBe(0);
    expect(gateComments(14)).toHaveLength(1);
  });

  it('a tag push posts nothing', async () => {
    const event = example(
      'push',
      (p) => String(p.ref).startsWith('refs/tags/') && !/^0+$/.test(String(p.after)),
    );
    api.pulls.push({ number: 15, state: 'open', headSha: event.after, head: 'Codertocat:x' });
    api.commitPulls.set(event.after as string, [15]);
    const result = await runBundle({
      inputs: demoInputs('candidate.csv'),
      eventName: 'push',
      event,
      apiUrl: api.origin,
    });
    expect(result.code).toBe(0);
    expect(api.requests).toHaveLength(0);
  });
});
