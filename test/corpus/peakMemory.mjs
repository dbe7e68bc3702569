// Preloaded with `node --import` by the resource tests: on exit, writes the process's resource
// usage (process.resourceUsage(), maxRSS in KiB) to the file named by SKILLGATE_RUSAGE_FILE.
import { writeFileSync } from 'node:fs';

const out = process.env.SKILLGATE_RUSAGE_FILE;
if (out) process.on('exit', () => writeFileSync(out, JSON.stringify(process.resourceUsage())));
