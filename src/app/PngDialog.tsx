import { useState } from 'react';
import type { ImageOptions } from '../canvas/floorplanImage';
import { useAppStore } from '../store/useAppStore';
import { ModalDialog } from './a11y/ModalDialog';
import { downloadBlob, fileBaseName } from './download';

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

/**
 * The PNG export's options (region, resolution, legend, title block); Export PNG renders the floorplan
 * picture (canvas/floorplanImage.ts, loaded then) and downloads it.
 */
export function PngDialog({ onClose }: { readonly onClose: () => void }) {
  const [png, setPng] = useState<ImageOptions>({ region: 'all', scale: 2, legend: true, titleBlock: true });
  const current = () => useAppStore.getState();
  const base = () => fileBaseName(current().history.present.name);
  return (
    <ModalDialog className="png-options" titleId="png-dialog-title" testId="png-dialog" onClose={onClose}>
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
        <button type="button" title="Close without exporting (Esc)" onClick={onClose}>
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
            onClose();
          }}
        >
          Export PNG
        </button>
      </div>
    </ModalDialog>
  );
}
