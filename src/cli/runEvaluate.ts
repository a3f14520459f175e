import { evaluate } from '../engine';
import { matFiguresCsv } from '../io/matCsv';
import { MAX_DESIGN_TEXT_LENGTH, restoreDesign } from '../io/restore';
import { reportTable } from '../io/reportTable';
import { reportSummary } from '../io/summary';

/** What the CLI needs from the outside world, so that tests can run it without files or a process. */
export interface EvaluateCliIo {
  /** Whole file as UTF-8 text; throws when the file cannot be read. */
  readonly readFile: (path: string) => string;
  /** Size of the file in bytes, checked before reading so a huge file is refused without loading it. */
  readonly fileSize?: (path: string) => number;
  /** Writes text to standard output (the caller adds nothing; lines end with "\n" here). */
  readonly stdout: (text: string) => void;
  readonly stderr: (text: string) => void;
}

/** Exit codes, documented in the usage text. */
export const EXIT = {
  ok: 0,
  findingErrors: 1,
  usage: 2,
  unreadable: 3,
  invalidDesign: 4,
} as const;

export const EVALUATE_USAGE = [
  'usage: npm run evaluate -- <design.json> [--json | --csv]',
  '',
  'Evaluates a Matloom design file and prints a table of mats, totals and findings,',
  'or with --json one JSON object (format "matloom-report", SI units named in each key),',
  'or with --csv one row of figures per mat (SI units named in each header).',
  '',
  'exit codes: 0 ok; 1 the design has error findings; 2 usage error;',
  '            3 the file cannot be read; 4 the file is not a valid design',
].join('\n');

type Output = 'table' | 'json' | 'csv';
type ParsedArgs = { ok: true; path: string; output: Output; help: boolean } | { ok: false; error: string };

function parseArgs(args: readonly string[]): ParsedArgs {
  let path: string | null = null;
  let output: Output = 'table';
  let help = false;
  for (const arg of args) {
    if (arg === '--json' || arg === '--csv') {
      const wanted: Output = arg === '--json' ? 'json' : 'csv';
      if (output !== 'table' && output !== wanted)
        return { ok: false, error: 'choose one of --json and --csv' };
      output = wanted;
    } else if (arg === '--help' || arg === '-h') help = true;
    else if (arg.startsWith('-')) return { ok: false, error: `unknown option "${arg}"` };
    else if (path !== null)
      return { ok: false, error: `one design file at a time (got "${path}" and "${arg}")` };
    else path = arg;
  }
  if (help) return { ok: true, path: path ?? '', output, help };
  if (path === null) return { ok: false, error: 'no design file given' };
  return { ok: true, path, output, help };
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/**
 * Runs `evaluate <design.json> [--json | --csv]`: reads the file, restores it through io/restore (the only
 * load path), evaluates it and prints a table or one JSON object.
 *
 * @returns the process exit code (see {@link EXIT}).
 */
export function runEvaluateCli(args: readonly string[], io: EvaluateCliIo): number {
  const parsed = parseArgs(args);
  if (!parsed.ok) {
    io.stderr(`evaluate: ${parsed.error}\n\n${EVALUATE_USAGE}\n`);
    return EXIT.usage;
  }
  if (parsed.help) {
    io.stdout(`${EVALUATE_USAGE}\n`);
    return EXIT.ok;
  }
  const { path } = parsed;

  let text: string;
  try {
    // Bytes ≥ UTF-16 characters for any UTF-8 file, so a file within the byte limit is within restore's.
    const size = io.fileSize?.(path);
    if (size !== undefined && size > MAX_DESIGN_TEXT_LENGTH) {
      io.stderr(
        `evaluate: ${path} is ${size.toLocaleString('en-US')} bytes; the limit for a design file is ` +
          `${MAX_DESIGN_TEXT_LENGTH.toLocaleString('en-US')}\n`,
      );
      return EXIT.unreadable;
    }
    text = io.readFile(path);
  } catch (error) {
    io.stderr(`evaluate: cannot read ${path}: ${messageOf(error)}\n`);
    return EXIT.unreadable;
  }
  if (text.length > MAX_DESIGN_TEXT_LENGTH) {
    io.stderr(
      `evaluate: ${path} is ${text.length.toLocaleString('en-US')} characters; the limit for a design file is ` +
        `${MAX_DESIGN_TEXT_LENGTH.toLocaleString('en-US')}\n`,
    );
    return EXIT.unreadable;
  }

  const restored = restoreDesign(text);
  if (!restored.ok) {
    io.stderr(`evaluate: ${path} is not a valid Matloom design:\n`);
    for (const message of restored.errors) io.stderr(`  ${message}\n`);
    return EXIT.invalidDesign;
  }
  const { design } = restored;
  const report = evaluate(design);
  if (parsed.output === 'json') io.stdout(`${JSON.stringify(reportSummary(design, report), null, 2)}\n`);
  else if (parsed.output === 'csv') io.stdout(matFiguresCsv(report));
  else io.stdout(`${reportTable(design, report)}\n`);
  return report.findings.some((f) => f.severity === 'error') ? EXIT.findingErrors : EXIT.ok;
}
