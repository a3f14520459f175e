import { clipForMessage } from '../model/messageText';
import { useAppStore } from '../store/useAppStore';
import { downloadBlob, fileBaseName } from './download';

/**
 * The summary JSON and the per-mat CSV as downloads, made in pieces (io/summaryText.ts, io/matCsv.ts)
 * and handed to a Blob, so that a whole die of 300,000 mats needs no single giant string. Loaded on
 * first use; a failure (out of memory, say) is reported, never thrown at the page.
 */
export async function exportFile(kind: 'summary' | 'csv'): Promise<void> {
  const { history, report, setNotice } = useAppStore.getState();
  const design = history.present;
  const base = fileBaseName(design.name);
  try {
    if (kind === 'summary') {
      const [{ summaryJsonPieces }, { designTextPieces }] = await Promise.all([
        import('../io/summaryText'),
        import('../io/designText'),
      ]);
      const pieces = [
        '{"design": ',
        ...designTextPieces(design),
        ',\n"report": ',
        ...summaryJsonPieces(design, report),
        '}\n',
      ];
      downloadBlob(new Blob(pieces, { type: 'application/json' }), `${base}.summary.json`);
    } else {
      const { matFiguresCsvPieces } = await import('../io/matCsv');
      downloadBlob(
        new Blob(Array.from(matFiguresCsvPieces(report)), { type: 'text/csv' }),
        `${base}.mats.csv`,
      );
    }
  } catch (error) {
    setNotice({
      kind: 'error',
      text: `The ${kind === 'summary' ? 'summary JSON' : 'CSV'} could not be made (${clipForMessage(error instanceof Error ? `${error.name}: ${error.message}` : String(error), 120)}). The design is unchanged.`,
    });
  }
}
