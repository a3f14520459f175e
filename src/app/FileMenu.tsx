import { useState } from 'react';
import type { ImageOptions } from '../canvas/floorplanImage';
import { useAppStore } from '../store/useAppStore';
import { ModalDialog } from './a11y/ModalDialog';
import { downloadBlob, fileBaseName } from './download';
import type { ExportKind } from './exportFiles';

/** Size of the live canvas, for exporting the current view. */
function liveView() {
  const element = document.querySelector('[data-testid="floorplan"]');
  const box = element?.getBoundingClientRect();
  return {
    viewport: useAppStore.getState().viewport,
    width: Math.round(box?.width ?? 800),
    height: Math.round(box?.height ?? 600),
  };
}

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
  const [png, setPng] = useState<ImageOptions>({ region: 'all', scale: 2, legend: true, titleBlock: true });

  const current = () => useAppStore.getState();
  const base = () => fileBaseName(current().history.present.name);

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
      {pngOpen && (
        <ModalDialog
          className="png-options"
          titleId="png-dialog-title"
          testId="png-dialog"
          onClose={() => setPngOpen(false)}
        >
          <h2 id="png-dialog-title">Export a PNG picture</h2>
          <fieldset>
            <legend>Region</legend>
            <label>
              <input
                type="radio"
                name="png-region"
                checked={png.region === 'all'}
                onChange={() => setPng({ ...png, region: 'all' })}
              />{' '}
              whole floorplan
            </label>
            <label>
              <input
                type="radio"
                name="png-region"
                data-testid="png-region-view"
                checked={png.region === 'view'}
                onChange={() => setPng({ ...png, region: 'view' })}
              />{' '}
              current view
            </label>
          </fieldset>
          <label>
            resolution{' '}
            <select
              data-testid="png-scale"
              value={png.scale}
              onChange={(e) => setPng({ ...png, scale: Number(e.target.value) })}
            >
              {[1, 2, 3, 4].map((n) => (
                <option key={n} value={n}>
                  {n}×
                </option>
              ))}
            </select>
          </label>
          <label>
            <input
              type="checkbox"
              checked={png.legend}
              onChange={(e) => setPng({ ...png, legend: e.target.checked })}
            />{' '}
            legend
          </label>
          <label>
            <input
              type="checkbox"
              data-testid="png-title"
              checked={png.titleBlock}
              onChange={(e) => setPng({ ...png, titleBlock: e.target.checked })}
            />{' '}
            title block
          </label>
          <div className="dialog-buttons">
            <button type="button" title="Close without exporting (Esc)" onClick={() => setPngOpen(false)}>
              Cancel
            </button>
            <button
              type="button"
              data-testid="export-png"
              title="Render the picture and download it"
              onClick={async () => {
                const s = current();
                const { canvasToPngBlob, renderFloorplanImage } = await import('../canvas/floorplanImage');
                const canvas = renderFloorplanImage(s.history.present, s.report, png, liveView());
                downloadBlob(await canvasToPngBlob(canvas), `${base()}.png`);
                setPngOpen(false);
              }}
            >
              Export PNG
            </button>
          </div>
        </ModalDialog>
      )}
    </div>
  );
}
