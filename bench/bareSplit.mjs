// The reference for reading: a bare Node script that reads the given files and only splits their
// lines and fields (no validation, no numbers, no keys). Usage: node bench/bareSplit.mjs FILE...

import { createReadStream } from 'node:fs';

let fields = 0;
for (const path of process.argv.slice(2)) {
  let carry = '';
  for await (const chunk of createReadStream(path, { encoding: 'utf8', highWaterMark: 1 << 20 })) {
    const lines = (carry + chunk).split('\n');
    carry = lines.pop() ?? '';
    for (const line of lines) fields += line.split(',').length;
  }
  if (carry.length > 0) fields += carry.split(',').length;
}
if (fields === 0) throw new Error('nothing read');
process.stdout.write(`${fields}\n`);
