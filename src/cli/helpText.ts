import { VERSION } from '../core/version.js';
import { ENGINE_OPTIONS } from '../settings/options.js';

/** The `--help` text, generated from the option table so it cannot go stale. */
export function helpText(): string {
  const lines = [
    `skillgate ${VERSION}: is the candidate forecasting model worse than the baseline?`,
    '',
    'Usage:',
    '  skillgate compare --baseline FILE --candidate FILE [options]',
    '  skillgate --help | --version',
    '',
    'Options:',
  ];
  for (const o of ENGINE_OPTIONS) {
    const flag = o.flag
      ? `--${o.name}`
      : `--${o.name} ${o.choices ? o.choices.join('|') : (o.valueName ?? 'VALUE')}`;
    const dflt =
      o.defaultValue === null || o.defaultValue === '' || o.flag
        ? ''
        : ` (default ${o.defaultValue})`;
    lines.push(`  ${flag}`, `      ${o.help}${dflt}`);
  }
  lines.push(
    '  --quiet',
    '      print nothing but errors on the terminal (the exit code still carries the verdict)',
    '',
    'Exit codes: 0 the gate passes (warnings allowed), 1 the gate fails, 2 usage or input error.',
    '',
  );
  return lines.join('\n');
}
