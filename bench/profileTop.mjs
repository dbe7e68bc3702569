// Summarises a V8 CPU profile (`node --cpu-prof`): self time per function, its share of the
// profile, and the total, for docs/performance.md's "Where the time goes".
// Usage: node bench/profileTop.mjs PROFILE.cpuprofile [TOP]

import { readFileSync } from 'node:fs';
import path from 'node:path';

const [file, topArg] = process.argv.slice(2);
if (file === undefined) {
  process.stderr.write('usage: node bench/profileTop.mjs PROFILE.cpuprofile [TOP]\n');
  process.exit(2);
}
const top = Number(topArg ?? 15);
const profile = JSON.parse(readFileSync(file, 'utf8'));
const byId = new Map(profile.nodes.map((node) => [node.id, node]));
// Sample i lasted timeDeltas[i + 1] microseconds (the last sample gets the mean).
const self = new Map();
const deltas = profile.timeDeltas;
let total = 0;
for (let i = 0; i < profile.samples.length; i++) {
  const dt =
    i + 1 < deltas.length ? deltas[i + 1] : (profile.endTime - profile.startTime) / deltas.length;
  const { callFrame } = byId.get(profile.samples[i]);
  const where =
    callFrame.url === '' ? '' : ` ${path.basename(callFrame.url)}:${callFrame.lineNumber + 1}`;
  const name = `${callFrame.functionName || '(anonymous)'}${where}`;
  self.set(name, (self.get(name) ?? 0) + dt);
  total += dt;
}
const rows = [...self].sort((a, b) => b[1] - a[1]).slice(0, top);
process.stdout.write(`total sampled: ${(total / 1000).toFixed(0)} ms\n`);
process.stdout.write('| self ms | share | function |\n|---:|---:|---|\n');
for (const [name, us] of rows) {
  process.stdout.write(
    `| ${(us / 1000).toFixed(0)} | ${((100 * us) / total).toFixed(1)} % | ${name} |\n`,
  );
}
