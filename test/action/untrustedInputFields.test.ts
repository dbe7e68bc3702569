import { describe, expect, it } from 'vitest';
import { parseUntrustedReport } from '../../src/action/untrustedReport.js';
import { sampleReport } from './sampleReport.js';

describe('an uploaded report and the reading fields', () => {
  it('keeps the time order and the reading settings it carries', () => {
    const parsed = parseUntrustedReport(JSON.stringify(sampleReport()), 'report.json');
    expect(parsed.inputs.timestamps.format).toBe('auto');
    expect(parsed.inputs.timestamps.order).toContain('chronological order');
    expect(parsed.settings).toMatchObject({ delimiter: 'auto', decimal: '.', timeFormat: 'auto' });
  });

  it('reads a report written before those fields existed, with their defaults', () => {
    const report = JSON.parse(JSON.stringify(sampleReport()));
    delete report.inputs.timestamps.format;
    delete report.inputs.timestamps.order;
    for (const key of [
      'baselineColumns',
      'candidateColumns',
      'delimiter',
      'decimal',
      'timeFormat',
      'lineLimit',
    ]) {
      delete report.settings[key];
    }
    const parsed = parseUntrustedReport(JSON.stringify(report), 'report.json');
    expect(parsed.inputs.timestamps).toMatchObject({ format: 'auto', order: '' });
    expect(parsed.settings).toMatchObject({
      baselineColumns: {},
      candidateColumns: {},
      delimiter: 'auto',
      decimal: '.',
      timeFormat: 'auto',
      lineLimit: 1 << 20,
    });
  });

  it('refuses a time format it does not know', () => {
    const report = JSON.parse(JSON.stringify(sampleReport()));
    report.inputs.timestamps.format = 'guess';
    expect(() => parseUntrustedReport(JSON.stringify(report), 'report.json')).toThrow(/format/);
  });
});
