import * as core from '@actions/core';
import { getOctokit } from '@actions/github';
import type { Progress } from '../app/progress.js';
import { runComparison } from '../app/runComparison.js';
import { createResamplePool } from '../parallel/resamplePool.js';
import type { Report } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import type { GitHubClient } from './githubApi.js';
import { realSleep } from './retry.js';

/**
 * Everything the action touches outside itself, handed to run() as one object: the runner's
 * inputs and environment, the engine, the GitHub client factory, the log/annotation/output
 * commands, the clock and sleep. Tests replace any of them.
 */
export interface ActionDependencies {
  readonly getInput: (name: string) => string;
  readonly env: Readonly<Record<string, string | undefined>>;
  readonly compare: (
    settings: Settings,
    options: { onProgress: (progress: Progress) => void },
  ) => Promise<{ report: Report }>;
  /** A REST client for the API root `apiUrl` (GITHUB_API_URL, so GitHub Enterprise works). */
  readonly createClient: (token: string, apiUrl: string) => GitHubClient;
  readonly sleep: (ms: number) => Promise<void>;
  readonly now: () => number;
  readonly log: ActionLog;
}

export type ActionLog = Pick<
  typeof core,
  'info' | 'warning' | 'error' | 'notice' | 'setOutput' | 'setFailed'
>;

export function runnerDependencies(): ActionDependencies {
  return {
    getInput: (name) => core.getInput(name),
    env: process.env,
    compare: async (settings, options) => {
      // Bootstrap resamples on every core of the runner (worker bundle beside dist/index.js).
      const pool = createResamplePool();
      try {
        return await runComparison(settings, { ...options, resampleRunner: pool.runner });
      } finally {
        await pool.close();
      }
    },
    createClient: (token, apiUrl) => getOctokit(token, { baseUrl: apiUrl }),
    sleep: realSleep,
    now: Date.now,
    log: core,
  };
}
