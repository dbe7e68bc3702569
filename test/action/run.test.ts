import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { ActionDependencies } from '../../src/action/dependencies.js';
import { commentMarker } from '../../src/action/gateComment.js';
import { run } from '../../src/action/run.js';
import { InputError } from '../../src/core/inputError.js';
import type { Report } from '../../src/report/reportModel.js';
import { fakeClient } from './fakeClient.js';
import { sampleReport } from './sampleReport.js';

function harness(
  report: Report | Error,
  inputs: Record<string, string> = {},
  failWith?: { status: number },
) {
  const dir = mkdtempSync(path.join(tmpdir(), 'skillgate-run-'));
  const eventPath = path.join(dir, 'event.json');
  writeFileSync(
    eventPath,
    JSON.stringify({
      pull_request: {
        number: 3,
        head: { repo: { full_name: 'acme/m' } },
        base: { repo: { full_name: 'acme/m' } },
      },
    }),
  );
  writeFileSync(path.join(dir, 'summary.md'), '');
  const state = { comments: [] as { id: number; body: string; user: string }[] };
  const { client } = fakeClient(state, failWith === undefined ? {} : { failWith });
  const log: string[] = [];
  const outputs: Record<string, string> = {};
  const values: Record<string, string> = {
    baseline: 'b.csv',
    candidate: 'c.csv',
    'github-token': 'tok',
    comment: 'true',
    ...inputs,
  };
  const deps: ActionDependencies = {
    getInput: (name) => values[name] ?? '',
    env: {
      GITHUB_EVENT_NAME: 'pull_request',
      GITHUB_EVENT_PATH: eventPath,
      GITHUB_REPOSITORY: 'acme/m',
      GITHUB_RUN_ID: '9',
      GITHUB_STEP_SUMMARY: path.join(dir, 'summary.md'),
      RUNNER_TEMP: dir,
    },
    compare: async () => {
      if (report instanceof Error) throw report;
      return { report };
    },
    createClient: () => client,
    sleep: async () => undefined,
    now: () => 0,
    log: {
      info: (m: string) => void log.push(`info ${m}`),
      warning: (m: string | Error) => void log.push(`warning ${String(m)}`),
      error: (m: string | Error) => void log.push(`error ${String(m)}`),
      notice: (m: string | Error) => void log.push(`notice ${String(m)}`),
      setOutput: (name: string, value: unknown) => {
        outputs[name] = String(value);
      },
      setFailed: (m: string | Error) => void log.push(`failed ${String(m)}`),
    },
  };
  return { deps, log, outputs, state, dir };
}

describe('run', () => {
  it('passes: outputs, summary, notice and a new comment; no failure', async () => {
    const h = harness(sampleReport());
    await run(h.deps);
    expect(h.log.filter((l) => l.startsWith('failed'))).toEqual([]);
    expect(h.log).toContainEqual(expect.stringMatching(/^notice PASS: /));
    expect(h.outputs.verdict).toBe('pass');
    expect(JSON.parse(readFileSync(h.outputs.report!, 'utf8')).verdict).toBe('pass');
    expect(readFileSync(path.join(h.dir, 'summary.md'), 'utf8')).toContain('### skillgate: PASS');
    expect(h.state.comments[0]?.body.startsWith(`${commentMarker('')}\n### skillgate: PASS`)).toBe(
      true,
    );
    expect(h.outputs['comment-url']).toBe('https://example.test/c/1000');
  });

  it('fails the step exactly when the verdict is fail', async () => {
    for (const verdict of ['pass', 'warn', 'fail'] as const) {
      const h = harness(sampleReport({ verdict }));
      await run(h.deps);
      expect(h.log.some((l) => l.startsWith('failed skillgate: the gate failed.'))).toBe(
        verdict === 'fail',
      );
      const annotation = { pass: 'notice', warn: 'warning', fail: 'error' }[verdict];
      expect(h.log).toContainEqual(
        expect.stringMatching(new RegExp(`^${annotation} ${verdict.toUpperCase()}: `)),
      );
    }
  });

  it('an input error fails with its description and writes nothing', async () => {
    const h = harness(new InputError('expected a number', { file: 'c.csv', line: 4, value: 'x' }));
    await run(h.deps);
    expect(h.log).toEqual(['failed skillgate: c.csv:4: expected a number (value "x")']);
    const bad = harness(sampleReport(), { alpha: '2' });
    await run(bad.deps);
    expect(bad.log).toEqual([expect.stringMatching(/^failed skillgate: input 'alpha' must be/)]);
  });

  it('a comment that cannot be written is a warning; the exit code stays the verdict', async () => {
    const h = harness(sampleReport(), {}, { status: 403 });
    await run(h.deps);
    expect(h.log).toContainEqual(
      expect.stringMatching(/^warning skillgate: GitHub refused to write the comment \(403\)/),
    );
    expect(h.log.some((l) => l.startsWith('failed'))).toBe(false);
    const other = harness(sampleReport({ verdict: 'fail' }), {}, { status: 404 });
    await run(other.deps);
    expect(other.log).toContainEqual(
      expect.stringMatching(/^warning skillgate: could not post the comment/),
    );
    expect(other.log.filter((l) => l.startsWith('failed'))).toHaveLength(1);
  });

  it('an unexpected error is reported as a bug, without a stack trace', async () => {
    const h = harness(new TypeError('boom'));
    await run(h.deps);
    expect(h.log).toEqual([
      'failed skillgate: internal error: boom. This is a bug in skillgate; set SKILLGATE_DEBUG=1 for details.',
    ]);
  });
});
