import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Severity } from '../../src/engine';
import { FindingMarkers, type MarkedFinding } from '../../src/canvas/paint/findingMarkers';

/** The markers from scratch: the worst severity among the findings naming each block. */
function markersOf(findings: readonly MarkedFinding[]): Map<string, Severity> {
  const markers = new Map<string, Severity>();
  for (const f of findings)
    for (const id of f.blockIds) if (markers.get(id) !== 'error') markers.set(id, f.severity);
  return markers;
}

const IDS = Array.from({ length: 12 }, (_, i) => `b${i}`);

/** A finding over distinct ids, as the engine lists them (in design order). */
const findingArb = fc.record({
  kind: fc.constantFrom('overlap', 'retention', 'noRowDecoder'),
  severity: fc.constantFrom<Severity>('error', 'warning'),
  message: fc.constantFrom('a', 'b'),
  blockIds: fc.subarray(IDS),
});

describe('finding markers kept up to date from list to list', () => {
  it('equal the markers built from scratch, and report exactly the ids that changed', () => {
    fc.assert(
      fc.property(
        fc.array(fc.array(findingArb, { maxLength: 6 }), { minLength: 1, maxLength: 12 }),
        (lists) => {
          const markers = new FindingMarkers();
          let before = new Map<string, Severity>();
          for (const list of lists) {
            const version = markers.version;
            const changed = markers.update(list);
            const now = markersOf(list);
            expect(new Map(markers.markers)).toEqual(now);
            const differing = IDS.filter((id) => before.get(id) !== now.get(id));
            expect(changed).toBe(differing.length > 0);
            expect([...(markers.changedSince(version) ?? [])].sort()).toEqual(differing.sort());
            before = now;
          }
        },
      ),
      { numRuns: 500 },
    );
    // Its own limit: a long property run must hold on a busy 2-core CI machine.
  }, 60_000);

  it('keeps a finding that stayed the same, even as a new object, without touching its ids', () => {
    const markers = new FindingMarkers();
    const big = { kind: 'retention', severity: 'error' as const, message: 'm', blockIds: IDS };
    markers.update([big]);
    const version = markers.version;
    expect(markers.update([{ ...big, blockIds: IDS.slice() }])).toBe(false);
    expect(markers.changedSince(version)).toEqual(new Set());
    // One id leaves the group: only it changes.
    expect(markers.update([{ ...big, message: 'm2', blockIds: IDS.filter((id) => id !== 'b5') }])).toBe(true);
    expect(markers.changedSince(version)).toEqual(new Set(['b5']));
  });
});
