/**
 * CPU profiles through the DevTools protocol for the measuring scripts: take one around some work on a
 * page's main thread and print the functions with the most time of their own and including callees.
 */
import type { CDPSession } from '@playwright/test';

/** How many functions each list prints. */
const TOP = Number(process.env.TOP ?? 30);

interface CallFrame {
  readonly functionName: string;
  readonly url: string;
  readonly lineNumber: number;
  readonly columnNumber: number;
}

interface ProfileNode {
  readonly id: number;
  readonly callFrame: CallFrame;
  readonly children?: readonly number[];
}

export interface Profile {
  readonly nodes: readonly ProfileNode[];
  readonly samples: readonly number[];
  readonly timeDeltas: readonly number[];
  readonly startTime: number;
  readonly endTime: number;
}

function nameOf(frame: CallFrame): string {
  const file = frame.url.split('/').pop() ?? '';
  return `${frame.functionName || '(anonymous)'} ${file}:${frame.lineNumber + 1}`;
}

/** Self and total time (ms) per function; total counts a function once per sample however deep it recurses. */
export function summarise(profile: Profile): void {
  const parent = new Map<number, number>();
  const byId = new Map<number, ProfileNode>();
  for (const node of profile.nodes) {
    byId.set(node.id, node);
    for (const child of node.children ?? []) parent.set(child, node.id);
  }
  const self = new Map<string, number>();
  const total = new Map<string, number>();
  let all = 0;
  profile.samples.forEach((id, s) => {
    const ms = (profile.timeDeltas[s + 1] ?? 0) / 1000;
    all += ms;
    const leaf = byId.get(id);
    if (!leaf) return;
    const leafName = nameOf(leaf.callFrame);
    self.set(leafName, (self.get(leafName) ?? 0) + ms);
    const seen = new Set<string>();
    for (let n: number | undefined = id; n !== undefined; n = parent.get(n)) {
      const node = byId.get(n);
      if (!node) break;
      const name = nameOf(node.callFrame);
      if (seen.has(name)) continue;
      seen.add(name);
      total.set(name, (total.get(name) ?? 0) + ms);
    }
  });
  const print = (title: string, map: Map<string, number>) => {
    console.log(`\n${title}`);
    for (const [name, ms] of [...map].sort((a, b) => b[1] - a[1]).slice(0, TOP))
      console.log(`${ms.toFixed(1).padStart(9)} ms ${((100 * ms) / all).toFixed(1).padStart(5)} %  ${name}`);
  };
  console.log(`sampled ${all.toFixed(0)} ms`);
  print('self time', self);
  print('total time (including callees)', total);
}

export async function profiled(cdp: CDPSession, work: () => Promise<void>): Promise<Profile> {
  await cdp.send('Profiler.enable');
  await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
  await cdp.send('Profiler.start');
  await work();
  const { profile } = (await cdp.send('Profiler.stop')) as unknown as { profile: Profile };
  return profile;
}
