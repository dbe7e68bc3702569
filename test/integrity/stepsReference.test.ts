import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { formatFrequency } from '../../src/integrity/frequency.js';
import { inferFrequency } from '../../src/integrity/inferFrequency.js';
import { stepsAhead } from '../../src/integrity/stepCount.js';
import { toTimePoint } from '../../src/integrity/timePoint.js';

// Reference values from pandas and numpy (test/reference/scripts/integrity_steps.py): local
// time zones across DST changes, calendar months, business days. Exact integers.
interface Case {
  name: string;
  timestamps: string[];
  frequency: string;
  steps: { from: string; to: string; steps: number }[];
}
const fixture = JSON.parse(
  readFileSync(
    path.resolve(import.meta.dirname, '..', 'reference', 'fixtures', 'integrity_steps.json'),
    'utf8',
  ),
) as { source: string; cases: Case[] };
const at = (label: string) => {
  const p = toTimePoint(label, 'datetime');
  if (p === null) throw new Error(label);
  return p;
};

describe(`time grid against ${fixture.source}`, () => {
  it.each(fixture.cases)('$name', ({ timestamps, frequency, steps }) => {
    const inferred = inferFrequency('datetime', [timestamps.map(at)]);
    expect(inferred.frequency === null ? null : formatFrequency(inferred.frequency)).toBe(
      frequency,
    );
    for (const s of steps) {
      expect(stepsAhead(at(s.from), at(s.to), inferred.frequency!), `${s.from} → ${s.to}`).toBe(
        s.steps,
      );
    }
  });
});
