import { clipForMessage } from '../model/messageText';
import type { Notice } from '../store/appStore';
import { useAppStore } from '../store/useAppStore';
import { downloadBlob, fileBaseName } from './download';
import { chooseSaveTarget, sizeText, writePieces, type FileKind, type WriteOutcome } from './saveToFile';

/**
 * The summary JSON and the per-mat CSV, made in pieces (io/summaryText.ts, io/matCsv.ts) and written
 * through saveToFile.ts: streamed into a picked file where the browser has a save picker, else
 * downloaded from Blobs made a few megabytes at a time, refused with a message above the download limit
 * (offering the much smaller CSV instead of the summary). Loaded on first use; every failure becomes a
 * notice, never an exception thrown at the page.
 */

export type ExportKind = 'summary' | 'csv';

const KINDS: Record<ExportKind, FileKind & { readonly label: string; readonly suffix: string }> = {
  summary: {
    label: 'summary JSON',
    suffix: '.summary.json',
    description: 'Matloom report (JSON)',
    mime: 'application/json',
    extension: '.json',
  },
  csv: {
    label: 'CSV',
    suffix: '.mats.csv',
    description: 'Per-mat figures (CSV)',
    mime: 'text/csv',
    extension: '.csv',
  },
};

/** Mats per summary piece in the browser: ~40 ms of work each, so the page keeps painting between them. */
const SUMMARY_MATS_PER_PIECE = 200;

/** Shortest time between two progress notices (ms). */
const PROGRESS_EVERY_MS = 500;

/** The pieces of an export and, for the big one, an estimate of its length made before writing it. */
async function exportPieces(kind: ExportKind): Promise<{ pieces: Iterable<string>; estimate: number }> {
  const { history, report } = useAppStore.getState();
  const design = history.present;
  if (kind === 'csv') {
    const { matFiguresCsvPieces } = await import('../io/matCsv');
    return { pieces: matFiguresCsvPieces(report), estimate: 0 };
  }
  const { summaryFilePieces, summaryFileLengthEstimate } = await import('../io/summaryText');
  return {
    pieces: summaryFilePieces(design, report, SUMMARY_MATS_PER_PIECE),
    estimate: summaryFileLengthEstimate(design, report),
  };
}

/** Writes the summary JSON or the CSV of the open design; says how it went in the notice. */
export async function exportFile(kind: ExportKind): Promise<void> {
  const { history, setNotice } = useAppStore.getState();
  const file = KINDS[kind];
  const fileName = `${fileBaseName(history.present.name)}${file.suffix}`;
  // The picker first, while the click's user activation lasts.
  const target = await chooseSaveTarget(fileName, file);
  if (target.kind === 'cancelled') return;
  let outcome: WriteOutcome;
  try {
    const { pieces, estimate } = await exportPieces(kind);
    let shown = 0;
    outcome = await writePieces(target, pieces, {
      fileName,
      kind: file,
      lengthEstimate: estimate,
      download: downloadBlob,
      onProgress: (characters) => {
        if (Date.now() - shown < PROGRESS_EVERY_MS) return;
        shown = Date.now();
        setNotice({ kind: 'info', text: `Writing the ${file.label}: ${sizeText(characters)} so far…` });
      },
    });
  } catch (error) {
    outcome = { kind: 'failed', error };
  }
  setNotice(outcomeNotice(kind, outcome));
}

/** What the person is told when an export ends (null: the browser's own download bar says it). */
function outcomeNotice(kind: ExportKind, outcome: WriteOutcome): Notice | null {
  const { label } = KINDS[kind];
  switch (outcome.kind) {
    case 'written':
      return {
        kind: 'info',
        text: `Wrote the ${label} to ${clipForMessage(outcome.name)} (${sizeText(outcome.characters)}).`,
      };
    case 'downloaded':
      // The browser shows the download itself; a notice would only repeat it.
      return null;
    case 'tooLarge':
      return {
        kind: 'error',
        text:
          `The ${label} of this design would be about ${sizeText(outcome.characters)}, more than a download ` +
          `may hold here (${sizeText(outcome.limit)}); nothing was written. In a browser with a save ` +
          `picker it is written straight to a file.` +
          (kind === 'summary' ? ' The per-mat CSV holds the same figures in far fewer bytes.' : ''),
        ...(kind === 'summary'
          ? {
              action: {
                label: 'Export the CSV',
                title: 'Export the per-mat figures as CSV instead',
                run: () => void exportFile('csv'),
              },
            }
          : {}),
      };
    case 'failed': {
      const error = outcome.error;
      return {
        kind: 'error',
        text: `The ${label} could not be made (${clipForMessage(error instanceof Error ? `${error.name}: ${error.message}` : String(error), 120)}). The design is unchanged.`,
      };
    }
  }
}
