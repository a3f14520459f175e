import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { chainTo, SRC } from '../support/importChain';

const WORKERS = ['explore/sweepWorker.ts', 'explore/repairWorker.ts'];

describe('the Web Workers stay lean', () => {
  // The schema library is for loading files; a worker that computes never validates one.
  it.each(WORKERS.filter((w) => existsSync(join(SRC, w))))('%s does not import zod', (worker) => {
    expect(chainTo(worker, 'zod')).toBeNull();
  });
});
