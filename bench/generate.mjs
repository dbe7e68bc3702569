// Deterministic inputs for the benchmark: invented sensor forecasts, written once per size under
// bench/.work/ and reused while the file is there (the generator is seeded, so a file's content
// depends on nothing but its name).

import { createWriteStream, existsSync, renameSync } from 'node:fs';

/** Park–Miller style linear congruential generator: enough for invented numbers, and seeded. */
function lcg(seed) {
  let state = seed >>> 0 || 1;
  return () => {
    state = (Math.imul(state, 48271) >>> 0) % 2147483647;
    return state / 2147483647;
  };
}

const DAY = 86_400_000;
const START = Date.UTC(2015, 0, 1);

/**
 * A long-format forecast file of `series` × `times` rows (columns series, timestamp, horizon,
 * actual, prediction). `order` 'series' writes series by series (each in time order), 'time'
 * writes time point by time point, so the two files of a comparison are not in the same order and
 * alignment must sort. `spread` sets the prediction noise, so baseline and candidate differ.
 */
export async function writeForecastFile(path, { series, times, seed, spread, order }) {
  if (existsSync(path)) return path;
  const random = lcg(seed);
  const labels = Array.from({ length: series }, (_, s) => `sensor_${String(s).padStart(5, '0')}`);
  const stamps = Array.from({ length: times }, (_, t) =>
    new Date(START + t * DAY).toISOString().slice(0, 10),
  );
  const actualOf = (s, t) =>
    50 + 10 * Math.sin((t + s) / 7) + ((s * 7919 + t * 104729) % 1000) / 100;
  const partial = `${path}.partial`;
  const out = createWriteStream(partial, { highWaterMark: 1 << 20 });
  const write = async (text) => {
    if (!out.write(text)) await new Promise((resolve) => out.once('drain', resolve));
  };
  await write('series,timestamp,horizon,actual,prediction\n');
  const outer = order === 'series' ? series : times;
  const inner = order === 'series' ? times : series;
  let buffer = '';
  for (let a = 0; a < outer; a++) {
    for (let b = 0; b < inner; b++) {
      const s = order === 'series' ? a : b;
      const t = order === 'series' ? b : a;
      const actual = actualOf(s, t);
      const prediction = actual + (random() - 0.5) * spread;
      buffer += `${labels[s]},${stamps[t]},1,${actual.toFixed(3)},${prediction.toFixed(3)}\n`;
    }
    if (buffer.length > 1 << 20) {
      await write(buffer);
      buffer = '';
    }
  }
  await write(buffer);
  await new Promise((resolve, reject) => out.end((error) => (error ? reject(error) : resolve())));
  renameSync(partial, path);
  return path;
}

/** An AR(1) loss differential with coefficient phi (the dependence the bootstrap must respect). */
export function autoregressiveSeries(n, phi, seed) {
  const random = lcg(seed);
  const d = new Float64Array(n);
  let x = 0;
  for (let t = 0; t < n; t++) {
    // Sum of 4 uniforms: a cheap, roughly normal innovation.
    const e = random() + random() + random() + random() - 2;
    x = phi * x + e;
    d[t] = 0.05 + x;
  }
  return d;
}
