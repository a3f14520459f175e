/**
 * Node entry of `npm run evaluate -- <design.json> [--json]`. The logic lives in runEvaluate.ts so that
 * tests run it without a process; this file only connects it to the file system and the terminal.
 */
import { readFileSync, statSync } from 'node:fs';
import { runEvaluateCli } from './runEvaluate';

process.exitCode = runEvaluateCli(process.argv.slice(2), {
  readFile: (path) => readFileSync(path, 'utf8'),
  fileSize: (path) => statSync(path).size,
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
});
