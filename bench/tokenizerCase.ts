// One tokenizer run for the benchmark: streams the files given on the command line through the
// file edge (read, sha256, gunzip, UTF-8 check) and the byte tokenizer alone (no number parsing,
// no keys, no table) and prints one JSON line: the CSV bytes tokenized (after gunzip), the wall
// time in ms and the CPU time in ms. Bundle it as the other cases are bundled, then
//   node tokenizerCase.mjs FILE...
import { ByteTokenizer } from '../src/reading/byteTokenizer.js';
import { formatFromPath } from '../src/reading/formatDetection.js';
import { delimiterFor } from '../src/reading/inputFormat.js';
import { streamTextFile } from '../src/reading/streamTextFile.js';

const files = process.argv.slice(2);
const t0 = performance.now();
const cpu0 = process.cpuUsage();
let bytes = 0;
let fields = 0;
for (const file of files) {
  const { format, gzip } = formatFromPath(file);
  const tokenizer = new ByteTokenizer(
    delimiterFor('auto', format === 'tsv'),
    (_b, _s, _e, count) => {
      fields += count;
    },
    file,
  );
  const sink = {
    push(chunk: Buffer): void {
      bytes += chunk.length;
      tokenizer.push(chunk);
    },
  };
  await streamTextFile(file, gzip, sink);
  tokenizer.end();
}
if (fields === 0) throw new Error('nothing read');
const ms = performance.now() - t0;
const used = process.cpuUsage(cpu0);
// cpuMs (user + system time of this process) is what MB/s per core is computed from on a
// shared machine, where the wall time also holds the time spent waiting for a core.
const cpuMs = (used.user + used.system) / 1000;
process.stdout.write(`${JSON.stringify({ bytes, ms, cpuMs })}\n`);
