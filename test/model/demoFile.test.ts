import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { DEMO_FILE_NAME, demoDesign } from '../../src/designs/demoDesign';

const DEMO_PATH = fileURLToPath(new URL(`../../public/${DEMO_FILE_NAME}`, import.meta.url));
const STALE = `public/${DEMO_FILE_NAME} is out of date with demoDesign(); run \`npx tsx src/cli/writeDemo.ts\``;

describe(`public/${DEMO_FILE_NAME}`, () => {
  it('holds exactly demoDesign(), written with two-space indent and a final newline', () => {
    // Source: common practice (no source): a generated file is checked against its generator.
    const text = readFileSync(DEMO_PATH, 'utf8');
    expect(JSON.parse(text), STALE).toEqual(demoDesign());
    expect(text, STALE).toBe(`${JSON.stringify(demoDesign(), null, 2)}\n`);
  });
});
