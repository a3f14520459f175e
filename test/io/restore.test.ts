import { describe, expect, it } from 'vitest';
import { MAX_DESIGN_TEXT_LENGTH, restoreDesign, type RestoreResult } from '../../src/io/restore';
import { demoDesign } from '../../src/designs/demoDesign';
import { DESIGN_VERSION } from '../../src/model/design';

/** The demo design as a mutable JSON tree, for breaking one field at a time. */
type Json = Record<string, unknown>;
function demoJson(): Json {
  return JSON.parse(JSON.stringify(demoDesign())) as Json;
}
function firstBlock(design: Json): Json {
  return (design.blocks as Json[])[0] as Json;
}
function errorsOf(result: RestoreResult): string[] {
  if (result.ok) throw new Error('expected the restore to fail, but it accepted the design');
  return [...result.errors];
}

// Source for every expectation here: common practice (no source): a loader refuses bad input with a
// message that names the field, instead of throwing or loading garbage.

describe('restoreDesign accepts good designs', () => {
  it('the demo design round-trips through JSON text unchanged', () => {
    const result = restoreDesign(JSON.stringify(demoDesign()));
    expect(result.ok).toBe(true);
    if (result.ok) {
      expect(result.design).toEqual(demoDesign());
      expect(result.migratedFrom).toBeNull();
    }
  });

  it('takes an already parsed object as well as text', () => {
    const result = restoreDesign(demoJson());
    expect(result.ok && result.design).toEqual(demoDesign());
  });
});

describe('restoreDesign refuses bad input with a message naming where', () => {
  it('invalid JSON', () => {
    expect(errorsOf(restoreDesign('{"format": "matloom-design",'))[0]).toMatch(/^not valid JSON: /);
  });

  it('JSON that is not an object', () => {
    for (const text of ['[]', '42', 'null', '"matloom-design"']) {
      expect(errorsOf(restoreDesign(text))).toEqual(['not a Matloom design: expected a JSON object']);
    }
  });

  it('a wrong or missing format name', () => {
    const wrong = { ...demoJson(), format: 'matloom-report' };
    expect(errorsOf(restoreDesign(wrong))[0]).toMatch(
      /"format" must be "matloom-design", found "matloom-report"/,
    );
    const missing = demoJson();
    delete missing.format;
    expect(errorsOf(restoreDesign(missing))[0]).toMatch(/"format" must be "matloom-design", found nothing/);
  });

  it('a format value that JSON.stringify would choke on (BigInt) still gives a message', () => {
    expect(errorsOf(restoreDesign({ format: 10n }))[0]).toMatch(/found a value of type bigint/);
  });

  it('a missing version', () => {
    const missing = demoJson();
    delete missing.version;
    expect(errorsOf(restoreDesign(missing))[0]).toMatch(/"version" must be a whole number from 1 to/);
  });

  it('a newer version', () => {
    const newer = { ...demoJson(), version: DESIGN_VERSION + 1 };
    expect(errorsOf(restoreDesign(newer))[0]).toMatch(
      new RegExp(`version ${DESIGN_VERSION + 1} is newer than this Matloom understands`),
    );
  });

  it('a negative cell count names blocks[0].cellsPerBitline', () => {
    const design = demoJson();
    firstBlock(design).cellsPerBitline = -512;
    expect(errorsOf(restoreDesign(design))).toContain(
      'blocks[0].cellsPerBitline: cells per bit line must lie between 1 and 16384',
    );
  });

  it('a non-integer cell count', () => {
    const design = demoJson();
    firstBlock(design).cellsPerWordline = 511.5;
    expect(errorsOf(restoreDesign(design))).toContain(
      'blocks[0].cellsPerWordline: cells per word line must be a whole number',
    );
  });

  it('NaN and Infinity handed over inside an object (JSON text cannot carry them)', () => {
    const nan = demoJson();
    (nan.process as Json).featureSize = Number.NaN;
    expect(errorsOf(restoreDesign(nan)).join('\n')).toMatch(/^process\.featureSize: feature size must be/m);
    const inf = demoJson();
    firstBlock(inf).x = Number.POSITIVE_INFINITY;
    expect(errorsOf(restoreDesign(inf)).join('\n')).toMatch(/^blocks\[0\]\.x: x must be/m);
  });

  it('a huge coordinate', () => {
    const design = demoJson();
    firstBlock(design).y = 1e6;
    expect(errorsOf(restoreDesign(design))).toContain('blocks[0].y: y must lie between -0.1 and 0.1');
  });

  it('a duplicate block id', () => {
    const design = demoJson();
    const blocks = design.blocks as Json[];
    (blocks[1] as Json).id = (blocks[0] as Json).id;
    expect(errorsOf(restoreDesign(design))).toContain('blocks[1].id: duplicate block id "mat-r0c0"');
  });

  it('a mat whose cells would make it longer than the 0.1 m bound', () => {
    const design = demoJson();
    const cells = design.cells as Json[];
    (cells[0] as Json).wordlinePitchInF = 100;
    (cells[0] as Json).bitlinePitchInF = 100;
    firstBlock(design).cellsPerBitline = 16384;
    (design.process as Json).featureSize = 1e-6;
    expect(
      errorsOf(restoreDesign(design)).some((e) => /blocks\[0\]: mat "mat-r0c0" would be .* mm long/.test(e)),
    ).toBe(true);
  });

  it('a mat using a cell the design does not define', () => {
    const design = demoJson();
    firstBlock(design).cellId = 'no-such-cell';
    expect(errorsOf(restoreDesign(design))).toContain(
      'blocks[0].cellId: mat "mat-r0c0" uses cell "no-such-cell", which the design does not define',
    );
  });

  it('a precharge level above the array voltage', () => {
    const design = demoJson();
    (design.process as Json).prechargeVoltage = 1.2;
    expect(errorsOf(restoreDesign(design))).toContain(
      'process.prechargeVoltage: precharge voltage must not exceed the array voltage',
    );
  });

  it('text over the size limit is refused before parsing', () => {
    const text = ' '.repeat(MAX_DESIGN_TEXT_LENGTH + 1);
    expect(errorsOf(restoreDesign(text))[0]).toMatch(
      /^file is 67,108,865 characters; the limit is 67,108,864$/,
    );
  });

  it('text at the size limit is parsed (and here fails as JSON, not as too long)', () => {
    const text = ' '.repeat(MAX_DESIGN_TEXT_LENGTH);
    expect(errorsOf(restoreDesign(text))[0]).toMatch(/^not valid JSON/);
  });

  it('many problems are all listed, up to 20', () => {
    const design = demoJson();
    for (const block of design.blocks as Json[]) block.x = 'left';
    const errors = errorsOf(restoreDesign(design));
    expect(errors).toHaveLength(20);
    expect(errors[0]).toBe('blocks[0].x: x must be a number');
  });
});
