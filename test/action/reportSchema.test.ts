import { describe, expect, it } from 'vitest';
import { parseUntrustedReport } from '../../src/action/untrustedReport.js';
import { InputError } from '../../src/core/inputError.js';
import {
  has,
  pathPattern,
  pathText,
  readReportSchema,
  walkSchema,
  without,
} from './reportSchemaWalk.js';
import { fullSampleReport } from './sampleReport.js';

// The action's report reader (src/action/untrustedReport.ts) is written by hand; these tests walk
// docs/report.schema.json beside a report that has every field the schema allows, and hold the
// reader to the schema: each required field refused when absent (its path named), each optional
// one accepted when absent, each closed list of words the same list in the reader, and every
// field the reader keeps named by the schema.

const schema = readReportSchema();
const sample = fullSampleReport();
const walk = walkSchema(schema, sample);

const parse = (value: unknown) => parseUntrustedReport(JSON.stringify(value), 'report.json');
const refusal = (value: unknown): string => {
  try {
    parse(value);
  } catch (error) {
    if (error instanceof InputError) return error.message;
    throw error;
  }
  return 'accepted';
};

/**
 * Fields the schema requires of a report this version writes, which the reader still accepts
 * absent: reports written before they existed. Each reads as what those versions meant.
 */
const FILLED_IN_WHEN_ABSENT: Readonly<Record<string, string>> = {
  '$.integrity': 'no checks, outside the verdict',
  '$.stability': 'null',
  '$.stability.levels': 'each check that ran at the policy α',
  '$.seriesSummary': 'null',
  '$.pathSummary': 'null',
  '$.inputs.intervalCoverage': 'null',
  '$.inputs.timestamps.format': 'auto',
  '$.inputs.timestamps.order': 'empty',
  '$.comparisons[*].relativeChange': 'null',
  '$.candidates[*].comparison.relativeChange': 'null',
  '$.stability.recent.relativeChange': 'null',
};

describe('the report reader against docs/report.schema.json', () => {
  it('the full sample is a report the schema describes, and reads back unchanged', () => {
    expect(walk.required.length).toBeGreaterThan(100);
    expect(parse(sample)).toEqual(sample);
  });

  it('the full sample has every field the schema names, optional ones included', () => {
    const present = new Set<string>();
    const named = new Set<string>();
    for (const f of [...walk.required, ...walk.optional]) {
      named.add(pathPattern(f.at));
      if (has(sample, f.at)) present.add(pathPattern(f.at));
    }
    // A recent window is a number of points or a share of them; the sample's is a share.
    const eitherOr = ['$.settings.recent.points'];
    expect([...named].filter((p) => !present.has(p) && !eitherOr.includes(p))).toEqual([]);
  });

  it('refuses a report without a required field, naming its path', () => {
    const wrong: string[] = [];
    for (const field of walk.required) {
      if (Object.hasOwn(FILLED_IN_WHEN_ABSENT, pathPattern(field.at))) continue;
      const message = refusal(without(sample, field.at));
      if (!message.startsWith(`field ${pathText(field.at)} must be `)) {
        wrong.push(`${pathText(field.at)}: ${message}`);
      }
    }
    expect(wrong).toEqual([]);
  });

  it('reads a report without a field that only older reports lack', () => {
    const seen = new Set<string>();
    for (const field of walk.required) {
      const pattern = pathPattern(field.at);
      if (!Object.hasOwn(FILLED_IN_WHEN_ABSENT, pattern)) continue;
      seen.add(pattern);
      expect(refusal(without(sample, field.at)), pathText(field.at)).toBe('accepted');
    }
    expect([...seen].sort()).toEqual(Object.keys(FILLED_IN_WHEN_ABSENT).sort());
  });

  it('reads a report without any one optional field', () => {
    const refused = walk.optional
      .map((f) => [pathText(f.at), refusal(without(sample, f.at))])
      .filter(([, message]) => message !== 'accepted');
    expect(refused).toEqual([]);
  });

  it('refuses a word outside each closed list, listing exactly the schema values', () => {
    expect(walk.closed.length).toBeGreaterThan(40);
    const wrong: string[] = [];
    for (const field of walk.closed) {
      const expected = `field ${pathText(field.at)} must be one of ${field.values.join(', ')}`;
      const message = refusal(without(sample, field.at, 'not-a-listed-word'));
      if (message !== expected) wrong.push(`${expected} ← ${message}`);
    }
    expect(wrong).toEqual([]);
  });

  it('keeps no field the schema does not name', () => {
    const parsed = parse(sample);
    expect(walkSchema(schema, parsed).unnamed.map((f) => pathText(f.at))).toEqual([]);
    expect(walk.unnamed.map((f) => pathText(f.at))).toEqual([]);
  });
});
