import { describe, expect, it } from 'vitest';
import { renderMarkdown } from '../../src/report/renderMarkdown.js';
import { resolveSettings } from '../../src/settings/resolveSettings.js';
import { asCommandLine, settingsAsOptions } from '../../src/settings/settingsAsOptions.js';
import { sampleReport } from '../action/sampleReport.js';

describe('settings as a user types them', () => {
  it('round-trips through resolveSettings: the options typed give back the same settings', () => {
    const typed = {
      baseline: 'b.csv',
      candidate: 'c.csv',
      alpha: '0.1',
      'block-length': '7.5',
      lag: 'h-1',
      columns: 'series=zone,actual=observed',
      'allow-missing': 'true',
      interval: '0.1,0.9',
      loss: 'interval',
      name: "two words 'quoted'",
    };
    const settings = resolveSettings(typed, (n) => `--${n}`);
    const options = settingsAsOptions(settings);
    const again = resolveSettings(
      Object.fromEntries(options.map((o) => [o.name, o.value])),
      (n) => `--${n}`,
    );
    expect(again).toEqual(settings);
    const changed = options.filter((o) => !o.isDefault).map((o) => o.name);
    expect(changed).toEqual([
      'baseline',
      'candidate',
      'columns',
      'loss',
      'alpha',
      'lag',
      'block-length',
      'allow-missing',
      'interval',
      'name',
    ]);
    expect(asCommandLine(options.filter((o) => !o.isDefault && !o.file))).toBe(
      "--columns series=zone,actual=observed --loss interval --alpha 0.1 --lag h-1 --block-length 7.5 --allow-missing --interval 0.1,0.9 --name 'two words '\\''quoted'\\'''",
    );
  });

  it.each(['15%', '36', '12.5%'])('round-trips a recent window of %s as typed', (recent) => {
    const settings = resolveSettings(
      { baseline: 'b.csv', candidate: 'c.csv', recent },
      (n) => `--${n}`,
    );
    const option = settingsAsOptions(settings).find((o) => o.name === 'recent')!;
    expect(option.value).toBe(recent);
    const again = resolveSettings(
      Object.fromEntries(settingsAsOptions(settings).map((o) => [o.name, o.value])),
      (n) => `--${n}`,
    );
    expect(again).toEqual(settings);
  });

  it('shows only the changed options in the comment, all of them folded, paths relative', () => {
    const report = sampleReport();
    const md = renderMarkdown(
      {
        ...report,
        settings: {
          ...report.settings,
          baseline: '/home/runner/work/repo/examples/data/baseline.csv',
          alpha: 0.1,
        },
      },
      { workingDirectory: '/home/runner/work/repo' },
    );
    const main = md.slice(0, md.indexOf('<details>'));
    expect(main).toContain(
      'Settings that differ from the defaults: `--columns series=zone,timestamp=target_date,origin=issued,actual=observed,prediction=forecast --alpha 0.1 --variance ewc --confidence 0.9`',
    );
    // With α = 0.1 the default level is 1 − 2α = 0.8, so the report's 0.9 is a changed option;
    // the sample report was made with --variance ewc (the default is ewc-ar1).
    expect(md).not.toContain('/home/runner');
    expect(md).toContain('| --baseline | examples/data/baseline.csv | no |');
    expect(md).toContain('| --seed | 1729 | yes |');
    expect(md).not.toMatch(/\{"kind"|camelCase|blockLength/);
  });
});
