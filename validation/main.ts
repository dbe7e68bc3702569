/**
 * `npm run validate`: the full size, power and coverage study behind docs/validation.md. Runs the
 * designs of docs/design.md ("Why ewc is the default") through the gate's own code on both cores
 * (worker threads, replications split by index, so the numbers do not depend on the split) and
 * writes the table. Options: --replications N (default 2000), --resamples B (default 9999),
 * --out FILE (default docs/validation.md), --quick (200 replications, 999 resamples),
 * --stability-replications N (default 4000) and --stability-only (the stability study of
 * validation/stabilityStudy.ts alone, replacing its section of the existing document),
 * --candidates-only (the several-candidates study of validation/candidatesStudy.ts alone, with
 * 999 shared resamples and --replications N, default 1000, replacing its section),
 * --section main (the size, power and coverage tables alone, replacing the top of FILE up to the
 * stability section), --section cosine-terms (run only that study and replace its section in FILE),
 * --coverage (the coverage study of every interval the report shows, validation/coverageStudy.ts,
 * alone, replacing its section), --coverage-replications N (default 1000), --coverage-resamples B
 * (default 999), --candidates (print the measurement of the studentised-bootstrap candidate).
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { isMainThread, parentPort, Worker, workerData } from 'node:worker_threads';
import { candidateStudy } from './candidateStudy.js';
import {
  type CandidatesDesign,
  type CandidatesResult,
  mergeCandidatesResults,
  renderCandidatesSection,
  runCandidatesStudy,
} from './candidatesStudy.js';
import {
  COSINE_TERMS_SECTION_END,
  COSINE_TERMS_SECTION_START,
  cosineTermsDesigns,
  renderCosineTermsSection,
} from './cosineTermsSection.js';
import { type CosineTermsStudyResult, runCosineTermsStudy } from './cosineTermsStudy.js';
import { type CoverageDesign, coverageDesigns } from './coverageDesigns.js';
import { COVERAGE_HEADING, renderCoverageSection } from './coverageSection.js';
import { type CoverageResult, runCoverage } from './coverageStudy.js';
import type { SimulationDesign } from './simulateLossSeries.js';
import { runStudy, STUDY_PROCEDURES, type StudyResult } from './sizeAndPowerStudy.js';
import {
  renderStabilityValidation,
  runStabilityJobs,
  runStabilityValidation,
  type StabilityJob,
  withStabilitySection,
} from './stabilityValidation.js';

/** Seed of the simulated errors (the bootstrap keeps the gate's default seed). */
const SEED = 20261201;

interface Job {
  study?: 'size-power' | 'cosine-terms';
  design: SimulationDesign;
  firstReplication: number;
  replications: number;
  resamples: number;
  seed: number;
}

interface CoverageJob extends Omit<Job, 'design'> {
  coverage: CoverageDesign;
}

interface CandidatesJob {
  candidates: CandidatesDesign;
  options: Parameters<typeof runCandidatesStudy>[1];
}

if (!isMainThread && 'candidates' in (workerData as object)) {
  const job = workerData as CandidatesJob;
  parentPort!.postMessage(runCandidatesStudy(job.candidates, job.options));
} else if (!isMainThread) {
  const jobs = workerData as (Job | StabilityJob | CoverageJob)[];
  parentPort!.postMessage(
    jobs[0] !== undefined && 'kind' in jobs[0]
      ? runStabilityJobs(jobs as StabilityJob[])
      : (jobs as (Job | CoverageJob)[]).map((j) =>
          'coverage' in j
            ? runCoverage(j.coverage, j)
            : j.study === 'cosine-terms'
              ? runCosineTermsStudy(j.design, j)
              : runStudy(j.design, j),
        ),
  );
} else {
  await main();
}

async function main(): Promise<void> {
  const args = process.argv.slice(2);
  const option = (name: string, fallback: number) => {
    const i = args.indexOf(`--${name}`);
    return i >= 0 ? Number(args[i + 1]) : fallback;
  };
  const quick = args.includes('--quick');
  const replications = option('replications', quick ? 200 : 2000);
  const resamples = option('resamples', quick ? 999 : 9999);
  const outIndex = args.indexOf('--out');
  const out = outIndex >= 0 ? args[outIndex + 1]! : 'docs/validation.md';
  const threads = Math.max(1, Math.min(2, availableParallelism()));
  const coverageReplications = option('coverage-replications', quick ? 200 : 1000);
  const coverageResamples = option('coverage-resamples', 999);
  if (args.includes('--candidates')) {
    process.stdout.write(candidateStudy(option('replications', 300)));
    return;
  }
  if (args.includes('--coverage')) {
    const section = await coverageStudy(coverageReplications, coverageResamples);
    writeFileSync(out, withCoverageSection(readFileSync(out, 'utf8'), section));
    process.stderr.write(`wrote the coverage section of ${out}\n`);
    return;
  }
  const sectionIndex = args.indexOf('--section');
  if (sectionIndex >= 0 && args[sectionIndex + 1] === 'main') {
    // The opening tables alone, replacing everything before the stability section.
    const { results, seconds } = await mainTables(replications, resamples, threads);
    const document = readFileSync(out, 'utf8');
    const at = document.indexOf('<!-- stability study: start -->');
    if (at < 0) throw new Error(`${out} has no stability section to keep after the main tables`);
    const table = renderTable(results, { replications, resamples, seconds, threads });
    writeFileSync(out, `${table}\n${document.slice(at)}`);
    process.stderr.write(`replaced the main tables of ${out} (${seconds.toFixed(0)} s)\n`);
    return;
  }
  if (sectionIndex >= 0) {
    if (args[sectionIndex + 1] !== 'cosine-terms') {
      throw new Error(`unknown section ${args[sectionIndex + 1]}; known: main, cosine-terms`);
    }
    const section = await cosineTermsStudy(replications, resamples, threads);
    writeFileSync(out, spliceSection(readFileSync(out, 'utf8'), section));
    process.stderr.write(`replaced the cosine-terms section of ${out}\n`);
    return;
  }
  // --stability-only: regenerate the stability section of an existing document alone.
  const stabilityReplications = option('stability-replications', quick ? 400 : 4000);
  const stability = async (document: string) => {
    const run = { replications: stabilityReplications, resamples, seed: SEED };
    const { results, seconds } = await runStabilityValidation(
      new URL(import.meta.url),
      threads,
      run,
    );
    const section = renderStabilityValidation(results, { ...run, seconds, threads });
    writeFileSync(out, withStabilitySection(document, section));
    process.stderr.write(`wrote the stability section of ${out} in ${seconds.toFixed(0)} s\n`);
  };
  if (args.includes('--stability-only')) return stability(readFileSync(out, 'utf8'));
  const candidateReplications = option('replications', quick ? 200 : 1000);
  if (args.includes('--candidates-only')) {
    return candidatesStudy(candidateReplications, quick ? 499 : 999, out);
  }
  const { results, seconds } = await mainTables(replications, resamples, threads);
  const section = await cosineTermsStudy(replications, resamples, threads);
  const coverage = await coverageStudy(coverageReplications, coverageResamples);
  writeFileSync(
    out,
    withCoverageSection(
      `${renderTable(results, { replications, resamples, seconds, threads })}${section}`,
      coverage,
    ),
  );
  process.stderr.write(`wrote ${out} in ${seconds.toFixed(0)} s\n`);
  await stability(readFileSync(out, 'utf8'));
  await candidatesStudy(candidateReplications, quick ? 499 : 999, out);
}

/** The size, power and coverage tables at the top of the document: every design, all replications. */
async function mainTables(
  replications: number,
  resamples: number,
  threads: number,
): Promise<{ results: StudyResult[]; seconds: number }> {
  const designs: SimulationDesign[] = [];
  for (const innovationCorrelation of [0.5, 0.8]) {
    for (const n of [100, 200]) {
      for (const candidateScale of [1, 1.2]) {
        designs.push({ n, phi: 0.6, innovationCorrelation, candidateScale });
      }
    }
  }
  const started = Date.now();
  const results: StudyResult[] = [];
  for (const design of designs) {
    const per = Math.ceil(replications / threads);
    const parts = await Promise.all(
      Array.from({ length: threads }, (_, k) => {
        const first = k * per;
        const count = Math.max(0, Math.min(per, replications - first));
        return runInWorker([
          { design, firstReplication: first, replications: count, resamples, seed: SEED },
        ]);
      }),
    );
    results.push(merge(parts.flat()));
    process.stderr.write(
      `validated n=${design.n} ρ=${design.innovationCorrelation} scale=${design.candidateScale}\n`,
    );
  }
  return { results, seconds: (Date.now() - started) / 1000 };
}

/**
 * `document` with its several-candidates section (from its heading to the next top-level
 * heading or section marker, or the end) replaced by `section`, or with `section` appended.
 */
function withCandidatesSection(document: string, section: string): string {
  // Local: module-level constants below the top-level `await main()` are not initialised yet.
  const CANDIDATES_HEADING = '## Several candidates';
  const at = document.indexOf(CANDIDATES_HEADING);
  if (at < 0) return `${document.trimEnd()}\n\n${section}`;
  const rest = document.slice(at + CANDIDATES_HEADING.length);
  const next = [rest.indexOf('\n## '), rest.indexOf('\n<!--')].filter((i) => i >= 0);
  const end =
    next.length === 0 ? document.length : at + CANDIDATES_HEADING.length + Math.min(...next) + 1;
  return `${document.slice(0, at)}${section}${end < document.length ? `\n${document.slice(end)}` : ''}`;
}

/** Runs validation/candidatesStudy.ts and puts its section at the end of `out`, replacing an older one. */
async function candidatesStudy(
  replications: number,
  resamples: number,
  out: string,
): Promise<void> {
  const design = (n: number, betterScale: number): CandidatesDesign => ({
    n,
    candidates: 5,
    phi: 0.6,
    correlation: 0.5,
    betterScale,
  });
  const designs = [design(200, 1), design(200, 0.9), design(200, 0.8), design(500, 1)];
  const threads = Math.max(1, Math.min(2, availableParallelism()));
  const started = Date.now();
  const alpha = 0.05;
  const setAlpha = 0.1;
  const results: CandidatesResult[] = [];
  for (const design of designs) {
    const per = Math.ceil(replications / threads);
    const parts = await Promise.all(
      Array.from({ length: threads }, (_, k) => {
        const first = k * per;
        const count = Math.max(0, Math.min(per, replications - first));
        const job: CandidatesJob = {
          candidates: design,
          options: {
            replications: count,
            firstReplication: first,
            resamples,
            seed: SEED,
            alpha,
            setAlpha,
          },
        };
        return new Promise<CandidatesResult>((resolve, reject) => {
          const worker = new Worker(new URL(import.meta.url), { workerData: job });
          worker.once('message', resolve);
          worker.once('error', reject);
        });
      }),
    );
    results.push(mergeCandidatesResults(parts.filter((p) => p.replications > 0)));
    process.stderr.write(`validated candidates σ1=${design.betterScale}\n`);
  }
  const seconds = (Date.now() - started) / 1000;
  const section = renderCandidatesSection(results, {
    replications,
    resamples,
    seconds,
    threads,
    seed: SEED,
    alpha,
    setAlpha,
  });
  const text = existsSync(out) ? readFileSync(out, 'utf8') : '';
  writeFileSync(out, withCandidatesSection(text, section));
  process.stderr.write(`wrote the candidates section of ${out} in ${seconds.toFixed(0)} s\n`);
}

/** The cosine-terms study on `threads` worker threads, rendered as its section. */
async function cosineTermsStudy(
  replications: number,
  resamples: number,
  threads: number,
): Promise<string> {
  const started = Date.now();
  const results: CosineTermsStudyResult[] = [];
  for (const design of cosineTermsDesigns()) {
    const per = Math.ceil(replications / threads);
    const parts = (await Promise.all(
      Array.from({ length: threads }, (_, k) => {
        const first = k * per;
        const count = Math.max(0, Math.min(per, replications - first));
        return runInWorker([
          {
            study: 'cosine-terms',
            design,
            firstReplication: first,
            replications: count,
            resamples,
            seed: SEED,
          },
        ]);
      }),
    )) as unknown as CosineTermsStudyResult[][];
    const flat = parts.flat();
    const total = flat.reduce((s, p) => s + p.replications, 0);
    const weighted = (pick: (p: CosineTermsStudyResult) => number) =>
      flat.reduce((s, p) => s + pick(p) * p.replications, 0) / total;
    results.push({
      design,
      replications: total,
      rejectionRate: Object.fromEntries(
        Object.keys(flat[0]!.rejectionRate).map((k) => [
          k,
          weighted((p) => p.rejectionRate[k as keyof typeof p.rejectionRate]),
        ]),
      ) as CosineTermsStudyResult['rejectionRate'],
      meanTerms: {
        fixed: weighted((p) => p.meanTerms.fixed),
        ar1: weighted((p) => p.meanTerms.ar1),
      },
    });
    process.stderr.write(
      `cosine terms: n=${design.n} φ=${design.phi} ${JSON.stringify(results.at(-1)!.rejectionRate)}\n`,
    );
  }
  const seconds = (Date.now() - started) / 1000;
  return renderCosineTermsSection(results, {
    replications,
    resamples,
    seed: SEED,
    seconds,
    note: `${threads} worker threads, under nice -n 10 on a machine shared with other work`,
  });
}

/** Replaces the cosine-terms section of a validation document (appends it when absent). */
function spliceSection(document: string, section: string): string {
  const start = document.indexOf(COSINE_TERMS_SECTION_START);
  const end = document.indexOf(COSINE_TERMS_SECTION_END);
  if (start < 0 || end < 0) return `${document.trimEnd()}\n\n${section}`;
  return `${document.slice(0, start)}${section}${document.slice(end + COSINE_TERMS_SECTION_END.length + 1)}`;
}

/**
 * Puts the coverage section into a document: replaces it (from its heading to the next "## "
 * heading, "<!--" marker or the end) when present, else appends it.
 */
function withCoverageSection(document: string, section: string): string {
  const at = document.indexOf(COVERAGE_HEADING);
  if (at < 0) return `${document.trimEnd()}\n\n${section}`;
  const after = at + COVERAGE_HEADING.length;
  const ends = [document.indexOf('\n## ', after), document.indexOf('\n<!--', after)];
  const next = Math.min(...ends.map((i) => (i < 0 ? document.length : i)));
  const rest = document.slice(next).replace(/^\n+/, '');
  return `${document.slice(0, at)}${section}${rest === '' ? '' : `\n${rest}`}`;
}

/** The coverage study (validation/coverageStudy.ts) at n = 50, 100, 200, 500 on both threads. */
async function coverageStudy(replications: number, resamples: number): Promise<string> {
  const threads = Math.max(1, Math.min(2, availableParallelism()));
  const started = Date.now();
  const results: CoverageResult[] = [];
  for (const n of [50, 100, 200, 500]) {
    for (const design of coverageDesigns(n)) {
      const per = Math.ceil(replications / threads);
      const parts = (await Promise.all(
        Array.from({ length: threads }, (_, k) => {
          const first = k * per;
          const count = Math.max(0, Math.min(per, replications - first));
          return runInWorker([
            {
              coverage: design,
              firstReplication: first,
              replications: count,
              resamples,
              seed: SEED,
            },
          ]);
        }),
      )) as unknown as CoverageResult[][];
      results.push(mergeCoverage(parts.flat()));
      process.stderr.write(`coverage n=${n} ${design.label}\n`);
    }
  }
  const seconds = (Date.now() - started) / 1000;
  return renderCoverageSection(results, { replications, resamples, seconds, threads, seed: SEED });
}

function mergeCoverage(parts: CoverageResult[]): CoverageResult {
  const total = parts.reduce((s, p) => s + p.replications, 0);
  const first = parts[0]!;
  const combine = (pick: (p: CoverageResult) => Readonly<Record<string, number>>) =>
    Object.fromEntries(
      Object.keys(pick(first)).map((k) => [
        k,
        parts.reduce((s, p) => s + pick(p)[k]! * p.replications, 0) / total,
      ]),
    ) as CoverageResult['covered'];
  return {
    ...first,
    replications: total,
    covered: combine((p) => p.covered),
    missAbove: combine((p) => p.missAbove),
    missBelow: combine((p) => p.missBelow),
  };
}

function runInWorker(jobs: (Job | CoverageJob)[]): Promise<StudyResult[]> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL(import.meta.url), { workerData: jobs });
    worker.once('message', resolve);
    worker.once('error', reject);
  });
}

function merge(parts: StudyResult[]): StudyResult {
  const total = parts.reduce((s, p) => s + p.replications, 0);
  const weighted = (pick: (p: StudyResult) => number) =>
    parts.reduce((s, p) => s + pick(p) * p.replications, 0) / total;
  const first = parts[0]!;
  return {
    ...first,
    replications: total,
    rejectionRate: Object.fromEntries(
      STUDY_PROCEDURES.map((k) => [k, weighted((p) => p.rejectionRate[k])]),
    ) as StudyResult['rejectionRate'],
    coverage: {
      bootstrap: weighted((p) => p.coverage.bootstrap),
      dieboldMarianoEwc: weighted((p) => p.coverage.dieboldMarianoEwc),
    },
    verdicts: { fail: weighted((p) => p.verdicts.fail), warn: weighted((p) => p.verdicts.warn) },
  };
}

function pct(x: number): string {
  return `${(100 * x).toFixed(1)}%`;
}

function renderTable(
  results: StudyResult[],
  run: { replications: number; resamples: number; seconds: number; threads: number },
): string {
  const lines = [
    '# Validation: size, power and interval coverage',
    '',
    'Generated by `npm run validate` (validation/main.ts); do not edit by hand.',
    '',
    `Design (docs/design.md, "Why ewc is the default"): both models' errors are AR(1) with φ = 0.6,`,
    'innovations correlated ρ between the models, squared loss, one series, one-sided α = 0.05,',
    'H0 "candidate not worse" (margin 0). Size: equal accuracy. Power: candidate error scale 1.2.',
    `${run.replications} replications per design (replication r uses random stream r of seed ${SEED}),`,
    `${run.resamples} bootstrap resamples with the automatic block length, seed 1729 as in the gate.`,
    `Run on ${run.threads} worker threads in ${run.seconds.toFixed(0)} s. Monte Carlo standard error of a`,
    `5% rate: ${pct(Math.sqrt((0.05 * 0.95) / run.replications))}; of a 95% coverage: the same.`,
    '',
    '## Rejection rate ("candidate worse")',
    '',
    `| ρ | n | truth | ${STUDY_PROCEDURES.join(' | ')} |`,
    `|---:|---:|---|${STUDY_PROCEDURES.map(() => '---:').join('|')}|`,
  ];
  for (const r of results) {
    const truth = r.design.candidateScale === 1 ? 'equal (size)' : 'scale 1.2 (power)';
    lines.push(
      `| ${r.design.innovationCorrelation} | ${r.design.n} | ${truth} | ${STUDY_PROCEDURES.map((p) => pct(r.rejectionRate[p])).join(' | ')} |`,
    );
  }
  lines.push(
    '',
    '## Coverage of the 95% intervals for E[d] and the default verdicts',
    '',
    '| ρ | n | truth | bootstrap (basic) | Diebold–Mariano (ewc-ar1, t_ν) | verdict fail | verdict warn |',
    '|---:|---:|---|---:|---:|---:|---:|',
  );
  for (const r of results) {
    const truth = r.design.candidateScale === 1 ? 'equal' : 'scale 1.2';
    lines.push(
      `| ${r.design.innovationCorrelation} | ${r.design.n} | ${truth} | ${pct(r.coverage.bootstrap)} | ${pct(r.coverage.dieboldMarianoEwc)} | ${pct(r.verdicts.fail)} | ${pct(r.verdicts.warn)} |`,
    );
  }
  lines.push('');
  return `${lines.join('\n')}\n`;
}
