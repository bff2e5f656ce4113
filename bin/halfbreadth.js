#!/usr/bin/env node
// The installed command: runs the compiled command line (npm run build makes dist/).
import { main } from '../dist/cli/main.js';

// A reader that stops early (`| head`) closes the pipe; that is not a fault.
process.stdout.on('error', (e) => {
  if (e.code === 'EPIPE') process.exit(0);
  throw e;
});
// exitCode, not exit(): let a long table drain to a pipe before the process ends.
process.exitCode = await main(process.argv.slice(2));
