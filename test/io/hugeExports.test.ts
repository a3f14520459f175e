import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import { matFiguresCsvPieces } from '../../src/io/matCsv';
import { reportTable } from '../../src/io/reportTable';
import { summaryJsonPieces } from '../../src/io/summaryText';
import { demoDesign } from '../../src/designs/demoDesign';
import { MAX_BLOCKS, type Design } from '../../src/model/design';

// Source: common practice (no source): an export of the largest design the format allows completes, or
// fails with a message; it never overflows the call stack.

/** The largest design the format allows: 300,000 bare demo mats in a grid. */
function wholeDie(): Design {
  const demo = demoDesign();
  const first = demo.blocks.find((b) => b.type === 'mat');
  if (!first) throw new Error('the demo has no mat');
  const blocks = [];
  for (let i = 0; i < MAX_BLOCKS; i++) {
    blocks.push({
      ...first,
      id: `m${i}`,
      x: (i % 600) * 1.5e-4 - 0.05,
      y: Math.floor(i / 600) * 1.2e-4 - 0.05,
    });
  }
  return { ...demo, blocks };
}

describe('exports of a 300,000-mat design', () => {
  it(
    'the CLI table and the CSV complete; the summary JSON is written in pieces',
    { timeout: 180_000 },
    () => {
      const design = wholeDie();
      const report = evaluate(design);
      expect(report.mats.count).toBe(MAX_BLOCKS);
      const table = reportTable(design, report);
      expect(table.split('\n').length).toBeGreaterThan(MAX_BLOCKS);
      let rows = 0;
      for (const piece of matFiguresCsvPieces(report)) rows += piece.split('\r\n').length - 1;
      expect(rows).toBe(MAX_BLOCKS + 1);
      // The whole summary is about 700 MB of text (a minute of work): the first pieces show it streams.
      const pieces = summaryJsonPieces(design, report);
      const head = [pieces.next(), pieces.next(), pieces.next()].map((r) => (r.done ? '' : r.value));
      expect(head[0]).toMatch(/^\{\n {2}"format": "matloom-report"/);
      expect(head[2]).toMatch(/^\n {4}\{\n {6}"name": "Mat 1.1",\n {6}"id": "m0"/);
      expect(head[2]?.length).toBeLessThan(5_000_000);
    },
  );
});
