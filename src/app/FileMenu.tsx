import { useEffect, useState } from 'react';
import { afterFirstPaint } from '../panels/afterFirstPaint';
import { useAppStore } from '../store/useAppStore';
import type { ExportKind } from './exportFiles';

// The PNG options dialog comes after the first paint (asked for then, long before anyone can click).
const pngDialog = afterFirstPaint(() => import('./PngDialog').then((m) => m.PngDialog));

/** Makes and saves a summary or CSV; exportFiles.ts loads on the first export, not with the page. */
function exportOnDemand(kind: ExportKind): void {
  import('./exportFiles').then(
    ({ exportFile }) => exportFile(kind),
    () =>
      useAppStore.getState().setNotice({
        kind: 'error',
        text: 'The export code could not be loaded (is the connection down?). Nothing was written; try again.',
      }),
  );
}

/** Exports: PNG pictures, JSON summaries and CSV tables. */
export function FileMenu() {
  const [pngOpen, setPngOpen] = useState(false);
  useEffect(() => pngDialog.preload(), []);

  return (
    <div className="file-menu">
      <button
        type="button"
        data-testid="export-summary"
        title="Design, figures and checks as JSON, units in every key"
        onClick={() => exportOnDemand('summary')}
      >
        Summary JSON
      </button>
      <button
        type="button"
        data-testid="export-csv"
        title="Per-mat figures as CSV"
        onClick={() => exportOnDemand('csv')}
      >
        CSV
      </button>
      <button
        type="button"
        data-testid="export-png-menu"
        aria-haspopup="dialog"
        title="Export the floorplan as a PNG picture…"
        onClick={() => setPngOpen(true)}
      >
        PNG…
      </button>
      {pngOpen && <pngDialog.Render props={{ onClose: () => setPngOpen(false) }} fallback={null} />}
    </div>
  );
}
