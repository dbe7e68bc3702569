import { ENGINE_OPTIONS, type OptionSpec } from '../settings/options.js';

/**
 * The action's input and output names, in one place; `action.yml` mirrors this module (a test
 * checks that). The engine's own options come from ENGINE_OPTIONS under the same names the CLI
 * uses without `--`; the inputs below exist only in the action.
 */
export const INPUT = {
  githubToken: 'github-token',
  commentAuthor: 'comment-author',
  comment: 'comment',
  pullRequest: 'pull-request',
  reportFile: 'report-file',
} as const;

export const ACTION_INPUTS: readonly OptionSpec[] = [
  {
    name: INPUT.githubToken,
    // biome-ignore lint/suspicious/noTemplateCurlyInString: a GitHub expression, kept verbatim
    defaultValue: '${{ github.token }}',
    help: 'token for the pull-request comment (needs pull-requests: write); empty to skip commenting',
  },
  {
    name: INPUT.commentAuthor,
    defaultValue: '',
    help: "the login the action's comments are written as, for a GitHub App token, e.g. my-app[bot] (default: the workflow token's github-actions[bot], or the user GET /user reports for a personal access token)",
  },
  {
    name: INPUT.comment,
    defaultValue: 'true',
    flag: true,
    help: "post the gate's own pull-request comment, or edit it in place",
  },
  {
    name: INPUT.pullRequest,
    defaultValue: '',
    help: 'pull-request number to comment on (workflow_dispatch, workflow_run); the event decides when empty',
  },
  {
    name: INPUT.reportFile,
    defaultValue: '',
    help: 'post a JSON report written by an earlier run instead of comparing (fork-safe pattern); treated as untrusted and re-rendered, and named by the name input, never by the report',
  },
];

/** Every input of action.yml: the engine's options, then the action's own. */
export const ALL_INPUTS: readonly OptionSpec[] = [...ENGINE_OPTIONS, ...ACTION_INPUTS];

export const OUTPUT = {
  verdict: 'verdict',
  report: 'report',
  commentUrl: 'comment-url',
  htmlReport: 'html-report',
} as const;
