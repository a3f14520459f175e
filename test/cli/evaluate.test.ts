import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { EXIT, runEvaluateCli } from '../../src/cli/runEvaluate';
import { MAX_DESIGN_FILE_BYTES } from '../../src/io/designText';
import { DEMO_FILE_NAME, demoDesign } from '../../src/designs/demoDesign';
import { designWith, mat } from '../support/designs';

const DEMO_PATH = fileURLToPath(new URL(`../../public/${DEMO_FILE_NAME}`, import.meta.url));

interface Run {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

/** Runs the CLI with files from `files` (by path) and, for any other path, the real file system. */
function run(args: string[], files: Record<string, string> = {}, sizes: Record<string, number> = {}): Run {
  let stdout = '';
  let stderr = '';
  const code = runEvaluateCli(args, {
    readFile: (path) => files[path] ?? readFileSync(path, 'utf8'),
    fileSize: (path) => sizes[path] ?? (files[path] ?? readFileSync(path, 'utf8')).length,
    stdout: (text) => (stdout += text),
    stderr: (text) => (stderr += text),
  });
  return { code, stdout, stderr };
}

// Source for every expectation here: common practice (no source) for command-line tools: usage errors
// exit 2, output goes to stdout, diagnostics to stderr; the codes themselves are Matloom's own contract.

describe('npm run evaluate', () => {
  it('the demo file: exit 0, a table with the mats, totals, findings and the caution', () => {
    const r = run([DEMO_PATH]);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(EXIT.ok);
    expect(r.stdout).toMatch(/^Wren bank section \(invented demo\)\n/);
    // Mats by name, ids beside.
    expect(r.stdout).toMatch(/\n {2}Mat 4\.4 +mat-r3c3 +512 +512 +524,288 /);
    expect(r.stdout).toMatch(/\nTotals\n/);
    expect(r.stdout).toMatch(/\n {2}bits +8,388,608\n/);
    expect(r.stdout).toMatch(/\n {2}total area \(bounding box\) +[\d.]+ (µm²|mm²)\n/);
    expect(r.stdout).toMatch(/\nFindings: none\n/);
    expect(r.stdout).toMatch(
      /\nCaution: Figures are first-order estimates.*extracted parasitics.*measured silicon/,
    );
  });

  it('--json prints one parseable matloom-report object with units in its keys', () => {
    const r = run([DEMO_PATH, '--json']);
    expect(r.code).toBe(EXIT.ok);
    const parsed = JSON.parse(r.stdout) as Record<string, unknown>;
    expect(parsed.format).toBe('matloom-report');
    expect(parsed.version).toBe(1);
    const totals = parsed.totals as Record<string, unknown>;
    expect(totals.bits).toBe(16 * 512 * 1024);
    expect(totals.area_m2).toBeGreaterThan(0);
    expect(typeof totals.worstSenseSignal_V).toBe('number');
    expect(parsed.caution).toMatch(/first-order estimates/);
    expect((parsed.mats as unknown[]).length).toBe(16);
  });

  it('--csv prints a header and one row per mat', () => {
    const r = run([DEMO_PATH, '--csv']);
    expect(r.code).toBe(EXIT.ok);
    const lines = r.stdout.trimEnd().split('\r\n');
    expect(lines).toHaveLength(17);
    expect(lines[0]).toMatch(/^name,mat_id,cell_id,/);
    expect(lines[1]).toMatch(/^Mat 1\.1,mat-r0c0,dram-folded-8f2,folded,512,512,/);
  });

  it('--json and --csv together are a usage error', () => {
    const r = run([DEMO_PATH, '--json', '--csv']);
    expect(r.code).toBe(EXIT.usage);
    expect(r.stderr).toMatch(/choose one of --json and --csv/);
  });

  it('--json may come before the file', () => {
    expect(JSON.parse(run(['--json', DEMO_PATH]).stdout)).toHaveProperty('format', 'matloom-report');
  });

  it('a path that does not exist: exit 3 naming the path', () => {
    const r = run(['/no/such/dir/design.json']);
    expect(r.code).toBe(EXIT.unreadable);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/cannot read \/no\/such\/dir\/design\.json/);
  });

  it('a file over the size limit: exit 3 before it is read', () => {
    const r = run(['big.json'], { 'big.json': '{}' }, { 'big.json': MAX_DESIGN_FILE_BYTES + 1 });
    expect(r.code).toBe(EXIT.unreadable);
    expect(r.stderr).toMatch(/big\.json is 201,326,593 bytes; the limit for a design file is 201,326,592/);
  });

  it('an invalid design: exit 4, every message on stderr with the field path', () => {
    const broken = JSON.parse(JSON.stringify(demoDesign())) as { blocks: Record<string, unknown>[] };
    const first = broken.blocks[0];
    if (first) first.cellsPerBitline = -1;
    const r = run(['broken.json'], { 'broken.json': JSON.stringify(broken) });
    expect(r.code).toBe(EXIT.invalidDesign);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/broken\.json is not a valid Matloom design/);
    expect(r.stderr).toMatch(
      /\n {2}blocks\[0\]\.cellsPerBitline: cells per bit line must lie between 1 and 16384\n/,
    );
  });

  it('text that is not JSON: exit 4', () => {
    const r = run(['notes.txt'], { 'notes.txt': 'hello' });
    expect(r.code).toBe(EXIT.invalidDesign);
    expect(r.stderr).toMatch(/not valid JSON/);
  });

  it('a design with an unsensed mat: the report is printed and the exit code is 1', () => {
    const lonely = JSON.stringify(designWith([mat()]));
    const r = run(['lonely.json'], { 'lonely.json': lonely });
    expect(r.code).toBe(EXIT.findingErrors);
    expect(r.stdout).toMatch(
      /error {4}unsensedBitlines: M1: 1024 of 1024 bit lines reach no sense-amplifier strip/,
    );
    const json = JSON.parse(run(['lonely.json', '--json'], { 'lonely.json': lonely }).stdout) as {
      totals: { errors: number };
    };
    expect(json.totals.errors).toBeGreaterThan(0);
  });

  it('a design with no mats: exit 0, and the JSON writes the missing worst signal as null', () => {
    const empty = JSON.stringify(designWith([]));
    const r = run(['empty.json'], { 'empty.json': empty });
    expect(r.code).toBe(EXIT.ok);
    expect(r.stdout).toMatch(/worst sense signal +— \(no mats\)/);
    const json = JSON.parse(run(['empty.json', '--json'], { 'empty.json': empty }).stdout) as {
      totals: { worstSenseSignal_V: unknown };
    };
    expect(json.totals.worstSenseSignal_V).toBeNull();
  });

  it.each([
    [[], /no design file given/],
    [['--jsn', 'a.json'], /unknown option "--jsn"/],
    [['a.json', 'b.json'], /one design file at a time/],
  ])('usage errors exit 2: %j', (args, message) => {
    const r = run(args);
    expect(r.code).toBe(EXIT.usage);
    expect(r.stderr).toMatch(message);
    expect(r.stderr).toMatch(/usage: npm run evaluate -- <design\.json> \[--json \| --csv\]/);
  });

  it('--help prints the usage and exits 0', () => {
    const r = run(['--help']);
    expect(r.code).toBe(EXIT.ok);
    expect(r.stdout).toMatch(/exit codes: 0 ok; 1 a reported design has error findings/);
    expect(r.stdout).toMatch(/--variant NAME/);
  });
});
