/**
 * Node entry of `npm run evaluate -- <design.json> [options]`. The logic lives in runEvaluate.ts so that
 * tests run it without a process; this file only connects it to the file system and the terminal.
 */
import { readDesignFileBytes } from './readDesignFile';
import { runEvaluateCli } from './runEvaluate';

process.exitCode = runEvaluateCli(process.argv.slice(2), {
  readFile: readDesignFileBytes,
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
});
