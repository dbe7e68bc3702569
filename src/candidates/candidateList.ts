import { InputError } from '../core/inputError.js';

/** One candidate given as a file: its name in the report and the file it is read from. */
export interface CandidateFile {
  readonly name: string;
  readonly path: string;
}

/** More candidates than this are refused: the model confidence set costs O(k³·B). */
export const MAX_CANDIDATES = 50;
/** Longest candidate name accepted (names come from pull requests and end up in comments). */
export const MAX_NAME_LENGTH = 64;
/** Letters, digits and . _ + - (starting with a letter or digit); no spaces, slashes or markup. */
const NAME = /^[A-Za-z0-9][A-Za-z0-9._+-]*$/;

/**
 * The candidate option's text → candidate files. One candidate per line (the action's multi-line
 * input) — the CLI joins repeated `--candidate` flags with newlines. A line is `name=path` when the
 * text before its first "=" is a valid name (see `checkCandidateName`), else it is a path and the
 * name is the file's stem (base name without .csv/.tsv and .gz: `out/ets.csv.gz` → `ets`).
 * Blank lines are skipped. Names must be distinct. Errors name the option and the line.
 */
export function parseCandidateList(text: string, label: string): CandidateFile[] {
  const out: CandidateFile[] = [];
  const lines = text.split(/\r?\n/);
  lines.forEach((raw, index) => {
    const line = raw.trim();
    if (line === '') return;
    const eq = line.indexOf('=');
    const head = eq > 0 ? line.slice(0, eq).trim() : '';
    const named = head !== '' && NAME.test(head);
    const path = named ? line.slice(eq + 1).trim() : line;
    if (path === '') {
      throw new InputError(`${label}: line ${index + 1} names candidate "${head}" but no file`, {
        value: line,
      });
    }
    const name = named ? head : fileStem(path);
    checkCandidateName(name, `${label} (line ${index + 1})`);
    if (out.some((c) => c.name === name)) {
      throw new InputError(`${label}: two candidates are named "${name}"; give each a name=path`, {
        value: line,
      });
    }
    out.push({ name, path });
  });
  if (out.length > MAX_CANDIDATES) {
    throw new InputError(`${label}: at most ${MAX_CANDIDATES} candidates, got ${out.length}`);
  }
  return out;
}

/** Refuses a name that is not 1–64 characters of letters, digits and . _ + - (first alphanumeric). */
export function checkCandidateName(name: string, where: string): void {
  if (name.length > MAX_NAME_LENGTH || !NAME.test(name)) {
    throw new InputError(
      `${where}: a model name must be 1 to ${MAX_NAME_LENGTH} letters, digits or . _ + - (starting with a letter or digit)`,
      { value: name },
    );
  }
}

/** Base name without directories and without .gz, then .csv, .tsv or .parquet (any case). */
export function fileStem(path: string): string {
  const base = path.split(/[\\/]/).pop() ?? path;
  return base.replace(/\.gz$/i, '').replace(/\.(csv|tsv|parquet)$/i, '');
}
