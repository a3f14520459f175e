import type { Report } from '../engine';
import type { Design } from '../model/design';
import { matSummaries, summaryHead, summaryTail } from './summary';

/** Mats written per piece: a few hundred kilobytes of JSON. */
const MATS_PER_PIECE = 1000;

/**
 * The summary JSON (`JSON.stringify(reportSummary(design, report), null, 2)`, byte for byte) in pieces,
 * the mats a thousand at a time, so that a whole die of 300,000 mats is written without one string of
 * several hundred megabytes and without making every mat's summary object at once.
 */
export function* summaryJsonPieces(
  design: Design,
  report: Report,
  matsPerPiece = MATS_PER_PIECE,
): Generator<string> {
  const marker = `mats-${Math.random().toString(36).slice(2)}`;
  const head = JSON.stringify(
    { ...summaryHead(design, report), mats: marker, ...summaryTail(design, report) },
    null,
    2,
  );
  const at = head.indexOf(`"${marker}"`);
  yield head.slice(0, at);
  const count = report.mats.count;
  if (count === 0) yield '[]';
  else {
    yield '[';
    for (let start = 0; start < count; start += matsPerPiece) {
      let piece = '';
      for (const [i, mat] of matSummaries(report, start, start + matsPerPiece).entries()) {
        piece += `${start + i === 0 ? '' : ','}\n    ${JSON.stringify(mat, null, 2).replace(/\n/g, '\n    ')}`;
      }
      yield piece;
    }
    yield '\n  ]';
  }
  yield head.slice(at + marker.length + 2);
}
