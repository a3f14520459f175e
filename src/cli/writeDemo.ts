/**
 * Writes the built-in demo design to public/ (`npx tsx src/cli/writeDemo.ts`), where the app serves it
 * and the CLI example reads it. Run it again whenever demoDesign() changes; test/model/demoFile.test.ts
 * fails until the file matches.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { DEMO_FILE_NAME, demoDesign } from '../designs/demoDesign';

const target = fileURLToPath(new URL(`../../public/${DEMO_FILE_NAME}`, import.meta.url));
writeFileSync(target, `${JSON.stringify(demoDesign(), null, 2)}\n`, 'utf8');
process.stdout.write(`wrote ${target}\n`);
