import { readFileSync } from 'node:fs';

export interface ActionYmlEntry {
  readonly description?: string;
  readonly required?: string;
  readonly default?: string;
}

export interface ActionYml {
  readonly top: Readonly<Record<string, string>>;
  readonly inputs: ReadonlyMap<string, ActionYmlEntry>;
  readonly outputs: ReadonlyMap<string, ActionYmlEntry>;
  readonly runs: Readonly<Record<string, string>>;
}

/**
 * Reads the small YAML subset action.yml is written in (maps nested by two spaces, scalars
 * plain, single- or double-quoted): enough to compare it with the names module without a YAML library.
 */
export function readActionYml(file: string): ActionYml {
  const top: Record<string, string> = {};
  const sections: Record<string, Map<string, Record<string, string>>> = {
    inputs: new Map(),
    outputs: new Map(),
  };
  const runs: Record<string, string> = {};
  let section = '';
  let entry: Record<string, string> | null = null;
  for (const line of readFileSync(file, 'utf8').split('\n')) {
    if (line.trim() === '' || line.trimStart().startsWith('#')) continue;
    const match = /^( *)([A-Za-z0-9_-]+):(?: (.*))?$/.exec(line);
    if (match === null) throw new Error(`action.yml: cannot read line ${JSON.stringify(line)}`);
    const [, indent = '', key = '', raw] = match;
    const value = raw === undefined ? undefined : scalar(raw);
    if (indent.length === 0) {
      section = key;
      if (value !== undefined) top[key] = value;
    } else if (indent.length === 2 && (section === 'inputs' || section === 'outputs')) {
      entry = {};
      sections[section]?.set(key, entry);
    } else if (indent.length === 2 && section === 'runs' && value !== undefined) {
      runs[key] = value;
    } else if (indent.length === 4 && entry !== null && value !== undefined) {
      entry[key] = value;
    }
  }
  return {
    top,
    inputs: sections.inputs ?? new Map(),
    outputs: sections.outputs ?? new Map(),
    runs,
  };
}

function scalar(raw: string): string {
  const text = raw.trim();
  if (text.startsWith("'") && text.endsWith("'")) return text.slice(1, -1).replace(/''/g, "'");
  // Double-quoted YAML scalars (biome writes them) use JSON's escapes for what action.yml needs.
  if (text.startsWith('"') && text.endsWith('"')) return JSON.parse(text) as string;
  return text;
}
