import { evaluate } from '../engine';
import { decodeDesignBytes } from '../io/decodeText';
import { matFiguresCsvPieces } from '../io/matCsv';
import { MAX_DESIGN_FILE_BYTES } from '../io/designText';
import { restoreDesign } from '../io/restore';
import { reportTable } from '../io/reportTable';
import { summaryJsonPieces } from '../io/summaryText';
import type { Design } from '../model/design';
import { clipForMessage, escapeControlCharacters } from '../model/messageText';
import { variantEntries, type VariantEntry } from '../model/variants';
import { formatWholeNumber } from '../model/units';

/** What the CLI needs from the outside world, so that tests can run it without files or a process. */
export interface EvaluateCliIo {
  /**
   * The file's bytes (or, in tests, its text), read with at most `limit` bytes; throws with a message
   * when the file cannot be read, is not a regular file or is larger than the limit.
   */
  readonly readFile: (path: string, limit: number) => Uint8Array | string;
  /** Size of the file in bytes, checked before reading when known. */
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
  'usage: npm run evaluate -- <design.json> [--json | --csv] [--variant NAME | --all]',
  '',
  'Evaluates a Matloom design file and prints a table of mats, totals and findings,',
  'or with --json one JSON object (format "matloom-report", SI units named in each key),',
  'or with --csv one row of figures per mat (SI units named in each header).',
  '',
  'A file may hold several variants of its design. Without options the active one is reported',
  'and a note on stderr says how many others were not. --variant NAME reports the variant of that',
  'name (or id); --all reports every variant in turn: tables one after another, --json an array,',
  '--csv one table with a first column naming the variant.',
  '',
  'Files are read as UTF-8 (with or without a byte-order mark) or UTF-16 with a byte-order mark.',
  '',
  'exit codes: 0 ok; 1 a reported design has error findings; 2 usage error;',
  '            3 the file cannot be read; 4 the file is not a valid design (or has no such variant)',
].join('\n');

type Output = 'table' | 'json' | 'csv';
type Which = { kind: 'active' } | { kind: 'named'; name: string } | { kind: 'all' };
type ParsedArgs =
  { ok: true; path: string; output: Output; which: Which; help: boolean } | { ok: false; error: string };

function parseArgs(args: readonly string[]): ParsedArgs {
  let path: string | null = null;
  let output: Output = 'table';
  let which: Which = { kind: 'active' };
  let help = false;
  for (let i = 0; i < args.length; i++) {
    const arg = args[i] as string;
    if (arg === '--json' || arg === '--csv') {
      const wanted: Output = arg === '--json' ? 'json' : 'csv';
      if (output !== 'table' && output !== wanted)
        return { ok: false, error: 'choose one of --json and --csv' };
      output = wanted;
    } else if (arg === '--all' || arg === '--variant' || arg.startsWith('--variant=')) {
      if (which.kind !== 'active') return { ok: false, error: 'choose one of --variant NAME and --all' };
      if (arg === '--all') which = { kind: 'all' };
      else {
        const name = arg === '--variant' ? args[++i] : arg.slice('--variant='.length);
        if (!name) return { ok: false, error: '--variant needs the name of a variant' };
        which = { kind: 'named', name };
      }
    } else if (arg === '--help' || arg === '-h') help = true;
    else if (arg.startsWith('-')) return { ok: false, error: `unknown option "${clipForMessage(arg)}"` };
    else if (path !== null)
      return {
        ok: false,
        error: `one design file at a time (got "${clipForMessage(path)}" and "${clipForMessage(arg)}")`,
      };
    else path = arg;
  }
  if (help) return { ok: true, path: path ?? '', output, which, help };
  if (path === null) return { ok: false, error: 'no design file given' };
  return { ok: true, path, output, which, help };
}

function messageOf(error: unknown): string {
  return clipForMessage(error instanceof Error ? error.message : String(error), 200);
}

/** Reads and decodes the file; the text, or the exit code after saying why on stderr. */
function readText(path: string, io: EvaluateCliIo): string | number {
  const shown = clipForMessage(path, 120);
  try {
    const size = io.fileSize?.(path);
    if (size !== undefined && size > MAX_DESIGN_FILE_BYTES) {
      io.stderr(
        `evaluate: ${shown} is ${formatWholeNumber(size)} bytes; the limit for a design file is ` +
          `${formatWholeNumber(MAX_DESIGN_FILE_BYTES)}\n`,
      );
      return EXIT.unreadable;
    }
    const read = io.readFile(path, MAX_DESIGN_FILE_BYTES);
    if (typeof read === 'string') return read;
    const decoded = decodeDesignBytes(read);
    if (!decoded.ok) {
      io.stderr(`evaluate: cannot read ${shown}: ${decoded.error}\n`);
      return EXIT.unreadable;
    }
    return decoded.text;
  } catch (error) {
    io.stderr(`evaluate: cannot read ${shown}: ${messageOf(error)}\n`);
    return EXIT.unreadable;
  }
}

/** The variants to report, or a message when the asked-for one does not exist. */
function chosenVariants(design: Design, which: Which): VariantEntry[] | string {
  const entries = variantEntries(design);
  if (which.kind === 'all') return entries;
  if (which.kind === 'active') return entries.filter((e) => e.active);
  const named = entries.filter((e) => e.name === which.name || e.id === which.name);
  if (named.length > 0) return named.slice(0, 1);
  const names = entries.map((e) => `"${clipForMessage(e.name)}"`).join(', ');
  return `no variant named "${clipForMessage(which.name)}"; the file has ${names}`;
}

/**
 * Runs `evaluate <design.json> [--json | --csv] [--variant NAME | --all]`: reads the file, restores it
 * through io/restore (the only load path), evaluates the chosen variants and prints them.
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
  const text = readText(path, io);
  if (typeof text === 'number') return text;

  const restored = restoreDesign(text);
  if (!restored.ok) {
    io.stderr(`evaluate: ${clipForMessage(path, 120)} is not a valid Matloom design:\n`);
    for (const message of restored.errors) io.stderr(`  ${escapeControlCharacters(message)}\n`);
    return EXIT.invalidDesign;
  }
  const chosen = chosenVariants(restored.design, parsed.which);
  if (typeof chosen === 'string') {
    io.stderr(`evaluate: ${chosen}\n`);
    return EXIT.invalidDesign;
  }
  const total = variantEntries(restored.design).length;
  if (parsed.which.kind === 'active' && total > 1) {
    io.stderr(
      `evaluate: reported the active variant "${clipForMessage(chosen[0]?.name ?? '')}"; ${total - 1} other variant${total - 1 === 1 ? ' was' : 's were'} not reported (use --variant NAME or --all)\n`,
    );
  }
  const several = parsed.which.kind === 'all';
  let errors = false;
  if (parsed.output === 'json' && several) io.stdout('[\n');
  chosen.forEach((entry, index) => {
    const design = entry.design;
    const report = evaluate(design);
    errors ||= report.findings.some((f) => f.severity === 'error');
    if (parsed.output === 'json') {
      if (several && index > 0) io.stdout(',\n');
      if (several)
        io.stdout(`{"variant": ${JSON.stringify({ id: entry.id, name: entry.name })},\n"report": `);
      for (const piece of summaryJsonPieces(design, report)) io.stdout(piece);
      io.stdout(several ? '}' : '\n');
    } else if (parsed.output === 'csv') {
      const pieces = matFiguresCsvPieces(report, several ? entry.name : undefined);
      let first = true;
      for (const piece of pieces) {
        // One header row for the whole table.
        if (!(first && index > 0)) io.stdout(piece);
        first = false;
      }
    } else {
      if (several)
        io.stdout(
          `${index > 0 ? '\n' : ''}=== Variant ${index + 1} of ${chosen.length}: ${escapeControlCharacters(entry.name)} ===\n`,
        );
      io.stdout(`${reportTable(design, report)}\n`);
    }
  });
  if (parsed.output === 'json' && several) io.stdout('\n]\n');
  return errors ? EXIT.findingErrors : EXIT.ok;
}
