#!/usr/bin/env node
// The installed command: runs the compiled command line (npm run build makes dist/).
import { main } from '../dist/cli/main.js';
import { outputFault } from '../dist/cli/io.js';

// Output that cannot be written (a reader that closed the pipe, a full disk) is said in
// one line on stderr, exit status 1: the output is not whole.
process.stdout.on('error', (e) => {
  process.stderr.write(outputFault(e));
  process.exit(1);
});
// exitCode, not exit(): let a long table drain to a pipe before the process ends.
process.exitCode = await main(process.argv.slice(2));
