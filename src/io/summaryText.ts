import type { Report } from '../engine';
import type { Design } from '../model/design';
import { designTextLengthEstimate, designTextPieces } from './designText';
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
    for (let start = 0; start < count; start += matsPerPiece)
      yield matsText(report, start, start + matsPerPiece);
    yield '\n  ]';
  }
  yield head.slice(at + marker.length + 2);
}

/** Mats start … end − 1 of the summary's mat list, as they appear in the file. */
function matsText(report: Report, start: number, end: number): string {
  let piece = '';
  for (const [i, mat] of matSummaries(report, start, end).entries()) {
    piece += `${start + i === 0 ? '' : ','}\n    ${JSON.stringify(mat, null, 2).replace(/\n/g, '\n    ')}`;
  }
  return piece;
}

/**
 * About how many characters summaryJsonPieces() writes, from the first thousand mats' text scaled to all
 * mats (exact for the mats when there are no more); the head and findings are not counted, so a
 * whole die is not written just to learn that it is too big. A cheap look before a long export.
 */
export function summaryJsonLengthEstimate(report: Report, sample = MATS_PER_PIECE): number {
  const count = report.mats.count;
  if (count === 0) return 0;
  const n = Math.min(count, sample);
  return Math.round((matsText(report, 0, n).length / n) * count);
}

/**
 * The summary file the app exports, in pieces: the design (so the file can be opened again) and its
 * report, `{"design": …, "report": …}`.
 */
export function* summaryFilePieces(
  design: Design,
  report: Report,
  matsPerPiece = MATS_PER_PIECE,
): Generator<string> {
  yield '{"design": ';
  yield* designTextPieces(design);
  yield ',\n"report": ';
  yield* summaryJsonPieces(design, report, matsPerPiece);
  yield '}\n';
}

/** About how many characters summaryFilePieces() writes (see the two estimates it adds). */
export function summaryFileLengthEstimate(design: Design, report: Report): number {
  return designTextLengthEstimate(design) + summaryJsonLengthEstimate(report);
}
