import { createHash } from 'node:crypto';
import { appendFile, mkdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { InputError } from '../core/inputError.js';
import { renderHtml } from '../report/renderHtml.js';
import { renderMarkdown } from '../report/renderMarkdown.js';
import type { Report } from '../report/reportModel.js';
import { reportSections } from '../report/reportSections.js';
import { type CommentPlan, planComment } from './commentTarget.js';
import { type ActionDependencies, runnerDependencies } from './dependencies.js';
import {
  COMMENT_LIMIT_CHARS,
  fitReport,
  measureBytes,
  measureChars,
  SUMMARY_LIMIT_BYTES,
} from './fitReport.js';
import { commentMarker, encodeName, publishGateComment } from './gateComment.js';
import {
  type GitHubClient,
  getPullRequest,
  openPullRequestsFromHead,
  pullRequestsOfCommit,
} from './githubApi.js';
import { INPUT, OUTPUT } from './names.js';
import { type PostingIdentity, postingIdentity } from './postingIdentity.js';
import { type ActionSettings, inputLabel, readActionSettings } from './readInputs.js';
import { readRegularFile } from './readRegularFile.js';
import {
  ApiBudgetError,
  ApiTimeoutError,
  type ApiTimeouts,
  createRetryWait,
  DEFAULT_API_TIMEOUTS,
  defaultRetryPolicy,
  installRetries,
  isRateLimited,
} from './retry.js';
import { type RunnerEnvironment, readRunnerEnvironment, runUrl } from './runnerEnvironment.js';
import { MAX_REPORT_BYTES, parseUntrustedReport } from './untrustedReport.js';

/**
 * The action's one place where outcomes become the step's result: the step fails exactly when
 * the verdict is `fail`, or when the inputs are wrong (a message naming the input, no stack
 * trace). Problems with the comment (a read-only token, an API error) are warnings only, so the
 * exit code stays tied to the verdict.
 */
export async function run(deps: ActionDependencies = runnerDependencies()): Promise<void> {
  try {
    const report = await gate(deps);
    if (report.verdict === 'fail') deps.log.setFailed(`skillgate: ${summaryLine(report)}`);
  } catch (error) {
    if (error instanceof InputError) {
      deps.log.setFailed(`skillgate: ${error.describe()}`);
      return;
    }
    const message = error instanceof Error ? error.message : String(error);
    deps.log.setFailed(
      `skillgate: internal error: ${message}. This is a bug in skillgate; set SKILLGATE_DEBUG=1 for details.`,
    );
    if (deps.env.SKILLGATE_DEBUG && error instanceof Error) deps.log.info(error.stack ?? '');
  }
}

/** Compares (or loads a report), writes outputs, summary and annotations, then comments. */
async function gate(deps: ActionDependencies): Promise<Report> {
  const env = readRunnerEnvironment(deps.env);
  const action = readActionSettings(deps.getInput);
  const payload = await readEventPayload(env.eventPath);
  const plan = planComment(env.eventName, payload, action.pullRequest, env.sha);

  // A posted report is untrusted: its name must not pick the comment (the marker) nor the
  // title, so the trusted `name` input replaces it.
  const obtained = await obtainReport(deps, action);
  const report =
    action.source.kind === 'compare' ? obtained : { ...obtained, name: action.source.name };
  const name = report.name;
  // A report posted from an earlier run links to that run, where its summary is.
  const link = runUrl(env, plan.kind === 'workflow-run' ? plan.runId : env.runId);
  const workingDirectory = deps.env.GITHUB_WORKSPACE ?? process.cwd();
  const render = (r: Report): string =>
    renderMarkdown(r, { workingDirectory, ...(link === undefined ? {} : { runUrl: link }) });

  const jsonTarget = jsonPath(action, env, name);
  await writeText(jsonTarget, `${JSON.stringify(report, null, 2)}\n`);
  const markdownTarget =
    action.source.kind === 'compare' ? action.source.settings.markdown : action.source.markdown;
  if (markdownTarget !== null) await writeText(markdownTarget, render(report));
  const htmlTarget = reportPath(
    action.source.kind === 'compare' ? action.source.settings.html : action.source.html,
    env,
    name,
    'html',
  );
  await writeText(htmlTarget, renderHtml(report, { workingDirectory }));
  deps.log.setOutput(OUTPUT.verdict, report.verdict);
  deps.log.setOutput(OUTPUT.report, jsonTarget);
  deps.log.setOutput(OUTPUT.htmlReport, htmlTarget);

  if (env.stepSummary !== null) {
    const summary = fitReport(report, {
      render,
      measure: measureBytes,
      limit: SUMMARY_LIMIT_BYTES - 1024,
      ...(link === undefined ? {} : { fullReportUrl: link }),
    });
    await appendFile(env.stepSummary, summary.text);
  } else {
    deps.log.info('skillgate: GITHUB_STEP_SUMMARY is not set; no job summary written');
  }
  annotate(deps, report, name);

  if (action.comment) {
    const marker = commentMarker(name);
    const body = fitReport(report, {
      render,
      measure: measureChars,
      limit: COMMENT_LIMIT_CHARS,
      prefix: `${marker}\n`,
      ...(link === undefined ? {} : { fullReportUrl: link }),
    });
    if (body.shortened) deps.log.info('skillgate: the report was shortened to fit in a comment');
    const url = await comment(deps, env, action, plan, marker, body.text);
    if (url !== null) deps.log.setOutput(OUTPUT.commentUrl, url);
  }
  return report;
}

/** The comment's first paragraph as one line: the verdict, what decided it, the change. */
function summaryLine(report: Report): string {
  const s = reportSections(report);
  return `${s.lead} ${s.change}`;
}

async function obtainReport(deps: ActionDependencies, action: ActionSettings): Promise<Report> {
  const source = action.source;
  if (source.kind === 'compare') {
    let stage = '';
    const { report } = await deps.compare(source.settings, {
      onProgress: (progress) => {
        if (progress.stage !== stage) deps.log.info(`skillgate: ${progress.stage}`);
        stage = progress.stage;
      },
    });
    return report;
  }
  const text = await readRegularFile(source.path, MAX_REPORT_BYTES, inputLabel('report-file'));
  return parseUntrustedReport(text, source.path);
}

async function readEventPayload(eventPath: string | null): Promise<unknown> {
  if (eventPath === null) return {};
  try {
    return JSON.parse(await readFile(eventPath, 'utf8'));
  } catch {
    return {};
  }
}

function jsonPath(action: ActionSettings, env: RunnerEnvironment, name: string): string {
  const given = action.source.kind === 'compare' ? action.source.settings.json : action.source.json;
  return reportPath(given, env, name, 'json');
}

/** The given path, else a file under RUNNER_TEMP named after the comparison. */
function reportPath(
  given: string | null,
  env: RunnerEnvironment,
  name: string,
  extension: 'json' | 'html',
): string {
  if (given !== null) return given;
  if (name === '') return path.join(env.tempDir, `skillgate-report.${extension}`);
  const encoded = encodeName(name);
  const slug =
    encoded.length <= 80 ? encoded : createHash('sha256').update(name).digest('hex').slice(0, 16);
  return path.join(env.tempDir, `skillgate-report-${slug}.${extension}`);
}

async function writeText(file: string, text: string): Promise<void> {
  await mkdir(path.dirname(path.resolve(file)), { recursive: true });
  await writeFile(file, text);
}

function annotate(deps: ActionDependencies, report: Report, name: string): void {
  const title = name === '' ? 'skillgate' : `skillgate · ${name}`;
  const message = `${report.verdict.toUpperCase()}: ${summaryLine(report)}`;
  if (report.verdict === 'fail') deps.log.error(message, { title });
  else if (report.verdict === 'warn') deps.log.warning(message, { title });
  else deps.log.notice(message, { title });
}

const READ_ONLY_HINT =
  'The report is in the job summary. To comment on pull requests from forks, use the workflow_run pattern in the README (Pull requests from forks).';

/**
 * Posts the gate's own comment, or edits it in place; returns its URL, or null (with a warning
 * or a note).
 */
async function comment(
  deps: ActionDependencies,
  env: RunnerEnvironment,
  action: ActionSettings,
  plan: CommentPlan,
  marker: string,
  body: string,
): Promise<string | null> {
  if (plan.kind === 'none') {
    deps.log.info(`skillgate: no comment: ${plan.reason}`);
    return null;
  }
  if (plan.kind === 'read-only') {
    deps.log.warning(`skillgate: no comment: ${plan.reason}. ${READ_ONLY_HINT}`);
    return null;
  }
  if (env.repository === null) {
    deps.log.warning('skillgate: no comment: GITHUB_REPOSITORY is not set');
    return null;
  }
  if (action.token === '') {
    deps.log.warning(`skillgate: no comment: ${inputLabel('github-token')} is empty`);
    return null;
  }
  const repository = env.repository;
  try {
    const policy = {
      ...defaultRetryPolicy((m) => deps.log.info(`skillgate: ${m}`)),
      sleep: deps.sleep,
      now: deps.now,
    };
    const timeouts = apiTimeouts(deps.env);
    const start = deps.now();
    const client = installRetries(deps.createClient(action.token, env.apiUrl), policy, timeouts);
    const number = await resolvePullRequest(deps, client, repository, plan);
    if (number === null) return null;
    const identity = await postingIdentity(client, action.commentAuthor);
    const author = identity.login;
    const result = await publishGateComment(client, repository, number, marker, body, {
      author,
      authorFix: authorMismatchFix(identity),
      retryWait: createRetryWait(policy, timeouts, start),
      sleep: deps.sleep,
      info: (m) => deps.log.info(m),
      warning: (m) => deps.log.warning(m),
    });
    deps.log.info(
      `skillgate: ${result.action} the comment on pull request #${number} (as ${author}): ${result.url}`,
    );
    return result.url;
  } catch (error) {
    const status = (error as { status?: unknown }).status;
    if (isRateLimited(error)) {
      deps.log.warning(
        `skillgate: GitHub's rate limit stopped the comment (${status}); it was not retried past the wait limits. The report is in the job summary.`,
      );
    } else if (error instanceof ApiTimeoutError || error instanceof ApiBudgetError) {
      deps.log.warning(
        `skillgate: could not post the comment: ${error.message}. The report is in the job summary.`,
      );
    } else if (status === 403) {
      deps.log.warning(
        'skillgate: GitHub refused to write the comment (403): this token is read-only here (a pull request from a fork or from Dependabot) or the job lacks `permissions: pull-requests: write`. ' +
          READ_ONLY_HINT,
      );
    } else {
      const message = error instanceof Error ? error.message : String(error);
      deps.log.warning(`skillgate: could not post the comment: ${message}`);
    }
    return null;
  }
}

/**
 * What the warning says to do when a created comment's author is not the identity the action
 * assumed (`written` is the author GitHub reports for the new comment).
 */
function authorMismatchFix(identity: PostingIdentity): (written: string) => string {
  const input = inputLabel(INPUT.commentAuthor);
  switch (identity.source) {
    case 'input':
      return (written) => `Correct ${input}: GitHub wrote it as ${written}.`;
    case 'assumed':
      return (written) =>
        `With a GitHub App's installation token as github-token, set ${input} to the login its comments are written as (here: ${written}).`;
    case 'token':
      return () => `Set ${input} to the login the comments are written as.`;
  }
}

/**
 * The time limits of API calls: DEFAULT_API_TIMEOUTS, or SKILLGATE_API_TIMEOUT_MS for each
 * request with four times that for all of them (for slow GitHub Enterprise servers, and tests).
 */
function apiTimeouts(env: Readonly<Record<string, string | undefined>>): ApiTimeouts {
  const text = env.SKILLGATE_API_TIMEOUT_MS?.trim() ?? '';
  const ms = Number(text);
  if (!/^\d+$/.test(text) || ms < 1) return DEFAULT_API_TIMEOUTS;
  return { requestMs: ms, budgetMs: 4 * ms };
}

async function resolvePullRequest(
  deps: ActionDependencies,
  client: GitHubClient,
  repository: { owner: string; repo: string },
  plan: Exclude<CommentPlan, { kind: 'none' } | { kind: 'read-only' }>,
): Promise<number | null> {
  switch (plan.kind) {
    case 'pull-request':
      return plan.number;
    case 'commit': {
      const open = (await pullRequestsOfCommit(client, repository, plan.sha)).filter(
        (p) => p.state === 'open',
      );
      // Only a pull request whose head IS the pushed commit: a commit that merely appears in
      // some pull request's history says nothing about that pull request's model.
      const chosen = open.find((p) => p.headSha === plan.sha);
      if (chosen === undefined) {
        deps.log.info(
          `skillgate: no comment: commit ${plan.sha.slice(0, 12)} is the head of no open pull request`,
        );
        return null;
      }
      return chosen.number;
    }
    case 'workflow-run': {
      // The pull request must be the one whose head is the commit the earlier run tested;
      // a number coming with an untrusted artifact is checked, never taken on faith.
      if (plan.number !== null) {
        const pr = await getPullRequest(client, repository, plan.number);
        if (pr.headSha === plan.headSha) return pr.number;
        deps.log.warning(
          `skillgate: no comment: pull request #${plan.number} is at ${pr.headSha.slice(0, 12)}, not at the tested commit ${plan.headSha.slice(0, 12)}`,
        );
        return null;
      }
      if (plan.head !== null) {
        const match = (await openPullRequestsFromHead(client, repository, plan.head)).find(
          (p) => p.headSha === plan.headSha,
        );
        if (match !== undefined) return match.number;
      }
      deps.log.info(
        `skillgate: no comment: no open pull request has head ${plan.headSha.slice(0, 12)}`,
      );
      return null;
    }
  }
}
