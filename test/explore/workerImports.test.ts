import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { chainTo, SRC } from '../support/importChain';

const WORKERS = ['workers/sweepWorker.ts', 'explore/repairWorker.ts'];

describe('the Web Workers stay lean', () => {
  // The schema library is for loading files; a worker that computes never validates one.
  it.each(WORKERS.filter((w) => existsSync(join(SRC, w))))('%s does not import zod', (worker) => {
    expect(chainTo(worker, 'zod')).toBeNull();
  });
  // A worker has no document: the chart code it shares with the page must not bring React along.
  it.each(WORKERS.filter((w) => existsSync(join(SRC, w))))('%s does not import React', (worker) => {
    expect(chainTo(worker, 'react')).toBeNull();
  });
});
