import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readDesignFileBytes } from '../../src/cli/readDesignFile';
import { EXIT, runEvaluateCli } from '../../src/cli/runEvaluate';
import { createVariant } from '../../src/commands/createVariant';
import { switchVariant } from '../../src/commands/switchVariant';
import { csvField } from '../../src/io/csvField';
import { demoDesign } from '../../src/designs/demoDesign';
import type { Design } from '../../src/model/design';
import { variantContent } from '../../src/model/variants';

// Source for every expectation here: common practice (no source) for command-line tools and for CSV
// read by spreadsheets (a leading apostrophe keeps formula-like text as text).

function run(args: string[], bytes: Uint8Array | string) {
  let stdout = '';
  let stderr = '';
  const code = runEvaluateCli(args, {
    readFile: () => bytes,
    stdout: (text) => (stdout += text),
    stderr: (text) => (stderr += text),
  });
  return { code, stdout, stderr };
}

/** The demo with a second variant named "Second" (the demo without one mat); the demo is active. */
function twoVariants(): Design {
  const demo = demoDesign();
  const added = createVariant.run(demo, {
    design: {
      ...variantContent(demo),
      name: 'Second',
      blocks: demo.blocks.filter((b) => b.id !== 'mat-r0c0'),
    },
  });
  if (!added.ok) throw new Error(added.error);
  const firstId = added.design.variants?.entries[0]?.id ?? '';
  const back = switchVariant.run(added.design, { variantId: firstId });
  if (!back.ok) throw new Error(back.error);
  return back.design;
}

describe('evaluate: variants', () => {
  const text = JSON.stringify(twoVariants());

  it('by default reports the active variant and says how many were not reported', () => {
    const r = run(['x.json'], text);
    expect(r.code).toBe(EXIT.ok);
    expect(r.stdout).toMatch(/^Wren bank section/);
    expect(r.stderr).toMatch(/1 other variant was not reported \(use --variant NAME or --all\)/);
  });

  it('--variant NAME picks one; an unknown name is refused with the names there are', () => {
    const r = run(['x.json', '--variant', 'Second', '--json'], text);
    expect(r.code).toBe(EXIT.ok);
    const parsed = JSON.parse(r.stdout) as { design: { name: string }; mats: unknown[] };
    expect(parsed.design.name).toBe('Second');
    expect(parsed.mats).toHaveLength(15);
    const missing = run(['x.json', '--variant', 'Third'], text);
    expect(missing.code).toBe(EXIT.invalidDesign);
    expect(missing.stderr).toMatch(/no variant named "Third"; the file has .*"Second"/);
  });

  it('--all: tables in turn, a JSON array, one CSV with a variant column', () => {
    const table = run(['x.json', '--all'], text);
    expect(table.stdout).toMatch(/=== Variant 1 of 2: Wren bank section.*===/);
    expect(table.stdout).toMatch(/=== Variant 2 of 2: Second ===/);
    const json = JSON.parse(run(['x.json', '--all', '--json'], text).stdout) as {
      variant: { name: string };
      report: { mats: unknown[] };
    }[];
    expect(json.map((v) => [v.variant.name, v.report.mats.length])).toEqual([
      [twoVariants().name, 16],
      ['Second', 15],
    ]);
    const csv = run(['x.json', '--all', '--csv'], text).stdout.trimEnd().split('\r\n');
    expect(csv[0]).toMatch(/^variant,name,mat_id,/);
    expect(csv).toHaveLength(1 + 16 + 15);
    expect(csv.filter((l) => l.startsWith('Second,'))).toHaveLength(15);
  });
});

describe('evaluate: encodings, hostile names and files', () => {
  const demoText = JSON.stringify(demoDesign());

  it('reads UTF-8 with and without a byte-order mark and UTF-16 with one, like the browser', () => {
    const utf8 = new TextEncoder().encode(demoText);
    const withMark = new Uint8Array([0xef, 0xbb, 0xbf, ...utf8]);
    const utf16 = new Uint8Array([0xff, 0xfe, ...Buffer.from(demoText, 'utf16le')]);
    for (const bytes of [utf8, withMark, utf16]) expect(run(['x.json'], bytes).code).toBe(EXIT.ok);
    const latin1 = run(['x.json'], new Uint8Array([0x7b, 0xe9, 0x7d]));
    expect(latin1.code).toBe(EXIT.unreadable);
    expect(latin1.stderr).toMatch(/UTF-8/);
  });

  it('neutralises formula-like names in --csv, and shows control characters in the table escaped', () => {
    const demo = demoDesign();
    const hostile = {
      ...demo,
      name: 'Bank \u001b[2J\u0007 ring',
      blocks: demo.blocks.map((b) => (b.id === 'mat-r0c0' ? { ...b, name: '=HYPERLINK("http://x")' } : b)),
    };
    const csv = run(['x.json', '--csv'], JSON.stringify(hostile)).stdout;
    expect(csv).toContain(`"'=HYPERLINK(""http://x"")"`);
    const table = run(['x.json'], JSON.stringify(hostile)).stdout;
    // eslint-disable-next-line no-control-regex
    expect(table).not.toMatch(/[\u0000-\u0008\u000b-\u001f]/);
    expect(table).toContain('Bank \\u001b[2J\\u0007 ring');
  });

  it('csvField: =, +, -, @, tab and carriage return lead to an apostrophe; numbers stay numbers', () => {
    expect(['=1+1', '+1', '-1', '@SUM(A1)', '\tx', '\rx'].map(csvField)).toEqual([
      "'=1+1",
      "'+1",
      "'-1",
      "'@SUM(A1)",
      "'\tx",
      `"'\rx"`,
    ]);
    expect(csvField(-1.5)).toBe('-1.5');
    expect(csvField('mat-1')).toBe('mat-1');
  });

  it('refuses a FIFO and a directory, and caps what it reads while reading', () => {
    const dir = mkdtempSync(join(tmpdir(), 'matloom-cli-'));
    expect(() => readDesignFileBytes(dir, 1000)).toThrow(/directory/);
    const fifo = join(dir, 'pipe');
    execFileSync('mkfifo', [fifo]);
    expect(() => readDesignFileBytes(fifo, 1000)).toThrow(/FIFO/);
    const big = join(dir, 'big.json');
    writeFileSync(big, 'x'.repeat(5000));
    expect(() => readDesignFileBytes(big, 1000)).toThrow(/limit for a design file is 1,000/);
    expect(readDesignFileBytes(big, 5000)).toHaveLength(5000);
  }, 20_000);
});
