import { expect } from 'vitest';
import type { Report } from '../../src/engine';
import { allMats, senseAmpStripIdsOf, wordlineDriverIdsOf } from '../../src/engine/evaluation/matExports';

/** Findings compared as a set: an incremental report may list them in another order. */
function findingKeys(report: Report): string[] {
  return report.findings.map((f) => `${f.kind}|${f.blockIds.join(',')}|${f.message}`).sort();
}

/** Mat reports with their serving strips, each list sorted. */
function normalisedMats(report: Report) {
  return allMats(report.mats).map((m, k) => ({
    ...m,
    senseAmpStripIds: senseAmpStripIdsOf(report.mats, k).sort(),
    wordlineDriverIds: wordlineDriverIdsOf(report.mats, k).sort(),
  }));
}

/**
 * Two reports say the same: every mat's figures and serving strips, the findings (as a set) and the
 * totals. An incremental report (live preview, an edit's commit) keeps its tables in another internal
 * order than evaluate() does, so reports are compared by what they say, not by their layout.
 */
export function expectSameReport(actual: Report, expected: Report): void {
  expect(normalisedMats(actual)).toEqual(normalisedMats(expected));
  expect(findingKeys(actual)).toEqual(findingKeys(expected));
  for (const [key, value] of Object.entries(expected.totals)) {
    const got = actual.totals[key as keyof typeof expected.totals];
    // A figure that does not exist (no usable bit, nothing sensed) is NaN in both.
    if (typeof value === 'number' && Number.isNaN(value)) expect(got).toBeNaN();
    else if (typeof value === 'number') expect(got as number).toBeCloseTo(value, 20);
    else if (typeof value === 'object' && value !== null) expect(got).toEqual(value);
    else expect(got).toBe(value);
  }
}
