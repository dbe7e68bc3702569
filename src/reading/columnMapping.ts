import { InputError } from '../core/inputError.js';

/**
 * Which header column plays which role. Every role has a default name (docs/design.md, "Input
 * contract"); a mapping renames some of them. `quantile` is the prefix of quantile columns: with
 * the default "q", a column "q0.1" holds the 0.1 quantile.
 */
export interface ColumnMapping {
  readonly series?: string;
  readonly timestamp?: string;
  readonly horizon?: string;
  readonly origin?: string;
  /** Backtest path (e.g. the fold of a combinatorial cross-validation); optional key column. */
  readonly path?: string;
  readonly actual?: string;
  readonly prediction?: string;
  readonly weight?: string;
  readonly quantile?: string;
}

export type ColumnRole = keyof ColumnMapping;

export const COLUMN_ROLES: readonly ColumnRole[] = [
  'series',
  'timestamp',
  'horizon',
  'origin',
  'path',
  'actual',
  'prediction',
  'weight',
  'quantile',
];

export const DEFAULT_COLUMNS: Readonly<Required<ColumnMapping>> = {
  series: 'series',
  timestamp: 'timestamp',
  horizon: 'horizon',
  origin: 'origin',
  path: 'path',
  actual: 'actual',
  prediction: 'prediction',
  weight: 'weight',
  quantile: 'q',
};

/** The defaults with the given renames applied. */
export function resolveColumns(mapping: ColumnMapping = {}): Record<ColumnRole, string> {
  const resolved: Record<ColumnRole, string> = { ...DEFAULT_COLUMNS };
  for (const role of COLUMN_ROLES) {
    const name = mapping[role];
    if (name !== undefined) resolved[role] = name;
  }
  return resolved;
}

/**
 * Parses the text form of a mapping, as the CLI's `--columns` takes it:
 * `actual=observed,prediction=point,quantile=p`. Pairs are separated by commas, the role and the
 * column name by the first "="; whitespace around roles and names is trimmed. An empty text is
 * the empty mapping. Unknown roles, pairs without "=", empty names and a role given twice are
 * InputErrors naming `source` (the option's name) and the offending pair.
 */
export function parseColumnMapping(text: string, source = '--columns'): ColumnMapping {
  const mapping: Partial<Record<ColumnRole, string>> = {};
  if (text.trim() === '') return mapping;
  for (const rawPair of text.split(',')) {
    const pair = rawPair.trim();
    const eq = pair.indexOf('=');
    if (eq < 0) {
      throw new InputError(
        `expected role=column pairs separated by commas, e.g. "actual=observed,prediction=point"`,
        { file: source, value: pair },
      );
    }
    const role = pair.slice(0, eq).trim();
    const name = pair.slice(eq + 1).trim();
    if (!isRole(role)) {
      throw new InputError(`unknown column role "${role}"; roles are ${COLUMN_ROLES.join(', ')}`, {
        file: source,
        value: pair,
      });
    }
    if (name === '') {
      throw new InputError(`the column name for role "${role}" is empty`, {
        file: source,
        value: pair,
      });
    }
    if (mapping[role] !== undefined) {
      throw new InputError(`role "${role}" is mapped twice`, { file: source, value: pair });
    }
    mapping[role] = name;
  }
  checkDistinctNames(mapping, source);
  return mapping;
}

/** Two roles may not name the same column (the quantile prefix is not a column name). */
export function checkDistinctNames(mapping: ColumnMapping, source = '--columns'): void {
  const resolved = resolveColumns(mapping);
  const seen = new Map<string, ColumnRole>();
  for (const role of COLUMN_ROLES) {
    if (role === 'quantile') continue;
    const name = resolved[role];
    const other = seen.get(name);
    if (other !== undefined) {
      throw new InputError(`roles "${other}" and "${role}" both use the column "${name}"`, {
        file: source,
        value: name,
      });
    }
    seen.set(name, role);
  }
}

function isRole(text: string): text is ColumnRole {
  return (COLUMN_ROLES as readonly string[]).includes(text);
}
