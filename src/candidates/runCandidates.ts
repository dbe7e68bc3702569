import { columnsFor, type RunHooks, readDialect } from '../app/runComparison.js';
import { InputError } from '../core/inputError.js';
import type { ForecastTable } from '../reading/forecastTable.js';
import { readFoldLayout } from '../reading/readFoldLayout.js';
import { type FileRole, readForecastFile } from '../reading/readForecastFile.js';
import type { Report } from '../report/reportModel.js';
import type { Settings } from '../settings/settings.js';
import { fileStem } from './candidateList.js';
import { type CandidateTable, evaluateCandidates } from './evaluateCandidates.js';
import { splitByModel } from './splitByModel.js';

/**
 * The file edge of the several-candidates run: reads the baseline, each candidate file (or the one
 * long file split by its model column) and the actuals, then hands the tables to the pure
 * `evaluateCandidates`. The baseline is named by `baseline-model`, else by its file's stem.
 */
export async function runCandidates(settings: Settings, hooks: RunHooks = {}): Promise<Report> {
  if (settings.history !== null && settings.scale === 'seasonal-naive') {
    throw new InputError('several candidates do not support --scale seasonal-naive yet', {
      file: 'scale',
    });
  }
  const read = (path: string, role: FileRole, columns = columnsFor(settings, role)) =>
    readForecastFile(path, {
      role,
      columns,
      ...readDialect(settings),
      requireActual: role === 'actuals' || settings.actuals === null,
      onProgress: (done, total) =>
        hooks.onProgress?.({ stage: `reading ${role}`, fraction: total > 0 ? done / total : 1 }),
    });

  let baseline: ForecastTable | undefined;
  let baselineName = settings.baselineModel ?? fileStem(settings.baseline);
  let candidates: CandidateTable[];
  if (settings.modelColumn !== null) {
    const file = settings.candidates[0]!.path;
    const own = columnsFor(settings, 'candidate');
    if (own.path !== undefined) {
      throw new InputError('--model-column cannot be combined with a path column yet', {
        file,
        column: own.path,
      });
    }
    const table = await read(file, 'candidate', {
      ...own,
      path: settings.modelColumn,
    });
    if (table.summary.ignoredColumns.includes('path')) {
      throw new InputError('--model-column cannot be combined with a path column yet', {
        file,
        column: 'path',
      });
    }
    if (table.path === null) {
      throw new InputError('the model column is missing from the candidate file', {
        file,
        line: 1,
        column: settings.modelColumn,
      });
    }
    const parts = splitByModel(table);
    if (settings.baselineModel !== null) {
      baseline = parts.get(settings.baselineModel);
      if (baseline === undefined) {
        throw new InputError(
          `the baseline model is not in the model column (models: ${[...parts.keys()].join(', ')})`,
          { file, column: settings.modelColumn, value: settings.baselineModel },
        );
      }
      parts.delete(settings.baselineModel);
      baselineName = settings.baselineModel;
    }
    candidates = [...parts].map(([name, t]) => ({ name, file: `${file}#${name}`, table: t }));
  } else {
    candidates = [];
    for (const c of settings.candidates) {
      candidates.push({ name: c.name, file: c.path, table: await read(c.path, 'candidate') });
    }
  }
  if (candidates.length === 0) {
    throw new InputError('no candidate left to compare with the baseline', {
      file: settings.candidates[0]?.path ?? 'candidate',
    });
  }
  baseline ??= await read(settings.baseline, 'baseline');
  const actuals = settings.actuals === null ? undefined : await read(settings.actuals, 'actuals');
  const folds = settings.folds === null ? undefined : await readFoldLayout(settings.folds);
  hooks.onProgress?.({ stage: 'testing', fraction: 0 });
  const report = evaluateCandidates(
    {
      baselineName,
      baseline,
      candidates,
      ...(actuals === undefined ? {} : { actuals }),
      ...(folds === undefined ? {} : { folds }),
    },
    settings,
    hooks.resampleRunner === undefined ? {} : { resampleRunner: hooks.resampleRunner },
  );
  hooks.onProgress?.({ stage: 'testing', fraction: 1 });
  return report;
}
