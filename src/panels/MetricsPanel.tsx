import { useMemo, useState } from 'react';
import {
  explainMatFigure,
  explainTotal,
  findMatReport,
  MAT_FIGURE_PANEL,
  TOTAL_FIGURE_PANEL,
} from '../engine';
import { CELL_KIND_LABEL } from '../model/cell';
import { useShownReport } from '../store/liveReport';
import { useAppStore } from '../store/useAppStore';
import { FigureRow } from './FigureRow';

/** Figures of the selected mat and of the whole design: live during a drag, else the document's. */
export function MetricsPanel() {
  const design = useAppStore((s) => s.history.present);
  const report = useShownReport();
  const selectedIds = useAppStore((s) => s.selectedIds);
  const [openKey, setOpenKey] = useState<string | null>(null);
  const toggle = (key: string) => setOpenKey((current) => (current === key ? null : key));

  // The first selected mat (the lookup by id is a map, so thousands of selected blocks stay cheap).
  const mat = useMemo(() => {
    for (const id of selectedIds) {
      const found = findMatReport(report, id);
      if (found) return found;
    }
    return undefined;
  }, [report, selectedIds]);

  return (
    <section className="panel" aria-labelledby="metrics-heading">
      <h2 id="metrics-heading">Figures</h2>
      {mat ? (
        <div className="figures" data-testid="mat-figures">
          <h3 className="figures-title">
            Selected: {mat.name || mat.matId} · {CELL_KIND_LABEL[mat.figures.cellKind]}{' '}
            {mat.figures.architecture}
          </h3>
          {MAT_FIGURE_PANEL.map((group) => (
            <div key={group.title} className="figure-group">
              <h4>{group.title}</h4>
              {group.keys.map((key) => {
                const explanation = explainMatFigure(key, mat, design, report);
                return explanation ? (
                  <FigureRow
                    key={key}
                    testId={`metric-${key}`}
                    explanation={explanation}
                    open={openKey === `mat.${key}`}
                    onToggle={() => toggle(`mat.${key}`)}
                  />
                ) : null;
              })}
            </div>
          ))}
        </div>
      ) : (
        <p className="hint">Click a mat on the floorplan to see its figures.</p>
      )}
      <div className="figures" data-testid="total-figures">
        <h3 className="figures-title">Whole floorplan</h3>
        {TOTAL_FIGURE_PANEL.filter((group) => group.title !== 'Yield').map((group) => (
          <div key={group.title} className="figure-group">
            <h4>{group.title}</h4>
            {group.keys.map((key) => {
              const explanation = explainTotal(key, report, design);
              return explanation ? (
                <FigureRow
                  key={key}
                  testId={`total-${key}`}
                  explanation={explanation}
                  open={openKey === `total.${key}`}
                  onToggle={() => toggle(`total.${key}`)}
                />
              ) : null;
            })}
          </div>
        ))}
      </div>
    </section>
  );
}
