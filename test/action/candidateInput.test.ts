import { describe, expect, it } from 'vitest';
import { readActionSettings } from '../../src/action/readInputs.js';

describe("the action's candidate input", () => {
  it('takes several candidates, one NAME=FILE per line', () => {
    const inputs: Record<string, string> = {
      baseline: 'out/baseline.csv',
      candidate: 'gbm=out/gbm.csv\n  ets=out/ets.csv\nout/ensemble.csv\n',
      'selection-rule': 'none-worse',
    };
    const action = readActionSettings((name) => inputs[name] ?? '');
    if (action.source.kind !== 'compare') throw new Error('expected a comparison');
    expect(action.source.settings.candidates).toEqual([
      { name: 'gbm', path: 'out/gbm.csv' },
      { name: 'ets', path: 'out/ets.csv' },
      { name: 'ensemble', path: 'out/ensemble.csv' },
    ]);
    expect(action.source.settings.selectionRule).toBe('none-worse');
  });

  it('names the input when a line is bad', () => {
    const inputs: Record<string, string> = { baseline: 'b.csv', candidate: 'a=x.csv\na=y.csv' };
    expect(() => readActionSettings((name) => inputs[name] ?? '')).toThrow(
      'input \'candidate\': two candidates are named "a"',
    );
  });
});
