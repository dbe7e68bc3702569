// Summarises V8 CPU profiles (`node --cpu-prof`): self time per function (mean per profile when
// several profiles of the same program are given), its share of the sampled total, and the
// total, for docs/performance.md's "Where the time goes".
// Usage: node bench/profileTop.mjs [--top N] PROFILE.cpuprofile...

import { readFileSync } from 'node:fs';
import path from 'node:path';

const args = process.argv.slice(2);
const option = (name) => {
  const at = args.indexOf(name);
  return at >= 0 ? [at, args[at + 1]] : [-1, undefined];
};
const [topAt, topArg] = option('--top');
const [inclusiveAt, inclusiveArg] = option('--inclusive');
const top = topAt >= 0 ? Number(topArg) : 15;
// Functions whose total time (with what they call) is listed too, e.g. --inclusive alignPanel.
const inclusiveNames = inclusiveAt >= 0 ? inclusiveArg.split(',') : [];
const files = args.filter(
  (_, i) => i !== topAt && i !== topAt + 1 && i !== inclusiveAt && i !== inclusiveAt + 1,
);
if (files.length === 0) {
  process.stderr.write('usage: node bench/profileTop.mjs [--top N] PROFILE.cpuprofile...\n');
  process.exit(2);
}
// esbuild marks each bundled module with a line "// src/…/file.ts": name a function by its module.
const modules = new Map();
function moduleOf(url, line) {
  if (!url.startsWith('file://')) return null;
  if (!modules.has(url)) {
    const marks = [];
    let text = '';
    try {
      text = readFileSync(new URL(url), 'utf8');
    } catch {}
    text.split('\n').forEach((l, i) => {
      const m = /^\/\/ ((?:src|node_modules)\/\S+)$/.exec(l);
      if (m !== null) marks.push([i, m[1]]);
    });
    modules.set(url, marks);
  }
  let found = null;
  for (const [at, name] of modules.get(url)) {
    if (at > line) break;
    found = name;
  }
  return found;
}
const self = new Map();
const inclusive = new Map(inclusiveNames.map((name) => [name, 0]));
let total = 0;
for (const file of files) {
  const profile = JSON.parse(readFileSync(file, 'utf8'));
  const byId = new Map(profile.nodes.map((node) => [node.id, node]));
  const parent = new Map();
  for (const node of profile.nodes)
    for (const child of node.children ?? []) parent.set(child, node.id);
  // Sample i lasted timeDeltas[i + 1] microseconds (the last one: the mean).
  const deltas = profile.timeDeltas;
  const mean = (profile.endTime - profile.startTime) / deltas.length;
  for (let i = 0; i < profile.samples.length; i++) {
    const dt = i + 1 < deltas.length ? deltas[i + 1] : mean;
    const { callFrame } = byId.get(profile.samples[i]);
    const module = moduleOf(callFrame.url, callFrame.lineNumber);
    const where =
      callFrame.url === ''
        ? ''
        : ` (${module ?? `${path.basename(callFrame.url)}:${callFrame.lineNumber + 1}`})`;
    const name = `${callFrame.functionName || '(anonymous)'}${where}`;
    self.set(name, (self.get(name) ?? 0) + dt);
    total += dt;
    if (inclusive.size > 0) {
      const onStack = new Set();
      for (let id = profile.samples[i]; id !== undefined; id = parent.get(id)) {
        onStack.add(byId.get(id).callFrame.functionName);
      }
      for (const name of inclusiveNames)
        if (onStack.has(name)) inclusive.set(name, inclusive.get(name) + dt);
    }
  }
}
const runs = files.length;
const rows = [...self].sort((a, b) => b[1] - a[1]).slice(0, top);
const ms = (us) => (us / 1000 / runs).toFixed(0);
process.stdout.write(
  `sampled: ${ms(total)} ms${runs > 1 ? ` (mean of ${runs} profiles)` : ''}\n| self ms | share | function |\n|---:|---:|---|\n`,
);
for (const [name, us] of rows) {
  process.stdout.write(`| ${ms(us)} | ${((100 * us) / total).toFixed(1)} % | ${name} |\n`);
}
for (const [name, us] of inclusive) {
  process.stdout.write(
    `${name} with what it calls: ${ms(us)} ms (${((100 * us) / total).toFixed(1)} %)\n`,
  );
}
