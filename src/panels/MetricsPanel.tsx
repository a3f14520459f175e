import { useMemo, useState } from 'react';
import { explainMatFigure, explainTotal, findMatReport, MAT_FIGURES, TOTAL_FIGURES } from '../engine';
import { useShownReport } from '../store/liveReport';
import { useAppStore } from '../store/useAppStore';
import { FigureRow } from './FigureRow';

/** Figures of the selected mat and of the whole design, recomputed on every edit. */
export function MetricsPanel() {
  const design = useAppStore((s) => s.history.present);
  const report = useShownReport();
  const selectedIds = useAppStore((s) => s.selectedIds);
  const [openKey, setOpenKey] = useState<string | null>(null);
  const toggle = (key: string) => setOpenKey((current) => (current === key ? null : key));

  // The first selected mat; a map keeps this linear when thousands of blocks are selected.
  const mat = useMemo(() => {
    if (selectedIds.length === 1) return findMatReport(report, selectedIds[0] ?? '');
    const byId = new Map(report.mats.map((m) => [m.matId, m]));
    for (const id of selectedIds) {
      const found = byId.get(id);
      if (found) return found;
    }
    return undefined;
  }, [report, selectedIds]);

  return (
    <section className="panel" aria-labelledby="metrics-heading">
      <h2 id="metrics-heading">Figures</h2>
      <h3>{mat ? `Selected: ${mat.name || mat.matId}` : 'Selected mat'}</h3>
      {mat ? (
        <div className="figures" data-testid="mat-figures">
          {MAT_FIGURES.map((key) => (
            <FigureRow
              key={key}
              testId={`metric-${key}`}
              explanation={explainMatFigure(key, mat, design, report)}
              open={openKey === `mat.${key}`}
              onToggle={() => toggle(`mat.${key}`)}
            />
          ))}
        </div>
      ) : (
        <p className="hint">Click a mat on the floorplan to see its figures.</p>
      )}
      <h3>Whole floorplan</h3>
      <div className="figures" data-testid="total-figures">
        {TOTAL_FIGURES.map((key) => (
          <FigureRow
            key={key}
            testId={`total-${key}`}
            explanation={explainTotal(key, report.totals, design)}
            open={openKey === `total.${key}`}
            onToggle={() => toggle(`total.${key}`)}
          />
        ))}
      </div>
    </section>
  );
}
