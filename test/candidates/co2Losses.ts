import { readFileSync } from 'node:fs';
import path from 'node:path';

/** Squared-error loss series per model from the co2 rolling-origin fixture (baseline first). */
export function co2Losses(): { names: string[]; losses: Float64Array[]; timestamps: string[] } {
  const file = path.join(import.meta.dirname, '../reference/fixtures/candidates_co2_rolling.csv');
  const lines = readFileSync(file, 'utf8').trim().split('\n').slice(1);
  const byModel = new Map<string, number[]>();
  const timestamps: string[] = [];
  for (const line of lines) {
    const [timestamp, model, actual, prediction] = line.split(',');
    if (!byModel.has(model!)) byModel.set(model!, []);
    byModel.get(model!)!.push((Number(actual) - Number(prediction)) ** 2);
    if (model === 'naive') timestamps.push(timestamp!);
  }
  const names = [...byModel.keys()];
  return { names, losses: names.map((m) => Float64Array.from(byModel.get(m)!)), timestamps };
}
