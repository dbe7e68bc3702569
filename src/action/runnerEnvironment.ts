import { tmpdir } from 'node:os';

export interface RepositoryRef {
  readonly owner: string;
  readonly repo: string;
}

/** What the runner tells the step through its environment, read once at the edge. */
export interface RunnerEnvironment {
  readonly eventName: string;
  readonly eventPath: string | null;
  readonly repository: RepositoryRef | null;
  /** REST API root: https://api.github.com, or https://HOST/api/v3 on GitHub Enterprise Server. */
  readonly apiUrl: string;
  readonly serverUrl: string;
  readonly runId: string | null;
  readonly sha: string | null;
  readonly stepSummary: string | null;
  readonly tempDir: string;
}

export function readRunnerEnvironment(
  env: Readonly<Record<string, string | undefined>>,
): RunnerEnvironment {
  const text = (name: string): string | null => {
    const value = env[name]?.trim();
    return value === undefined || value === '' ? null : value;
  };
  return {
    eventName: text('GITHUB_EVENT_NAME') ?? '',
    eventPath: text('GITHUB_EVENT_PATH'),
    repository: parseRepository(text('GITHUB_REPOSITORY')),
    apiUrl: (text('GITHUB_API_URL') ?? 'https://api.github.com').replace(/\/+$/, ''),
    serverUrl: (text('GITHUB_SERVER_URL') ?? 'https://github.com').replace(/\/+$/, ''),
    runId: text('GITHUB_RUN_ID'),
    sha: text('GITHUB_SHA'),
    stepSummary: text('GITHUB_STEP_SUMMARY'),
    tempDir: text('RUNNER_TEMP') ?? tmpdir(),
  };
}

export function parseRepository(text: string | null): RepositoryRef | null {
  if (text === null) return null;
  const [owner, repo, ...rest] = text.split('/');
  if (owner === undefined || repo === undefined || owner === '' || repo === '' || rest.length > 0) {
    return null;
  }
  return { owner, repo };
}

/** The link to a workflow run's page, or undefined when the environment lacks the parts. */
export function runUrl(
  env: RunnerEnvironment,
  runId: string | null = env.runId,
): string | undefined {
  if (env.repository === null || runId === null) return undefined;
  return `${env.serverUrl}/${env.repository.owner}/${env.repository.repo}/actions/runs/${runId}`;
}
