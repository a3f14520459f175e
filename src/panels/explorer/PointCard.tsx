import { Fragment, useState } from 'react';
import { shortProcessName } from '../../designs/buildPartition';
import { checkName, infeasibleBecause, type FeasibilityLimits } from '../../explore/chartData';
import {
  bankFigureEntry,
  bankMissingReason,
  explainFigure,
  pointCardFigures,
  type FigureKey,
} from '../../engine';
import type { SweepPoint, SweepRequest } from '../../explore/sweep';
import { CELL_KIND_LABEL } from '../../model/cell';
import { formatQuantity } from '../../model/units';
import { ExplanationCard } from '../FigureRow';

interface PointCardProps {
  readonly point: SweepPoint;
  readonly request: SweepRequest;
  readonly limits: FeasibilityLimits;
  readonly onFront: boolean;
  /** Whether figures can be clicked for their explanation (not in the hover tooltip). */
  readonly explainable?: boolean;
  readonly testId: string;
}

/** One sweep point: what partition it is, its figures, and whether it is feasible. */
export function PointCard({ point, request, limits, onFront, explainable = false, testId }: PointCardProps) {
  const [open, setOpen] = useState<FigureKey | null>(null);
  const cell = request.cells[point.cellIndex];
  const process = request.processes[point.processIndex];
  const f = point.figures;
  const reasons = f ? infeasibleBecause(f, limits) : [point.problem ?? 'no plan'];
  return (
    <div className="point-card" data-testid={testId}>
      <div className="point-title">
        {cell?.name ?? '?'} · {process ? shortProcessName(process) : '?'}
      </div>
      <div className="point-sub">
        {point.cellsPerBitline} cells per bit line × {point.cellsPerWordline} per word line
        {point.matRows > 0 && ` · ${point.matRows} × ${point.matColumns} mats`}
        {cell && ` · ${CELL_KIND_LABEL[cell.kind]} ${cell.bitlineArchitecture}`}
      </div>
      {f && (
        <table className="point-figures">
          <tbody>
            {pointCardFigures(Number.isFinite(f.dieYield)).map((key) => (
              <Fragment key={key}>
                <tr>
                  <td>
                    {explainable ? (
                      <button
                        type="button"
                        className="link"
                        title="Show formula, inputs and source"
                        aria-expanded={open === key}
                        onClick={() => setOpen(open === key ? null : key)}
                      >
                        {bankFigureEntry(key).label}
                      </button>
                    ) : (
                      bankFigureEntry(key).label
                    )}
                  </td>
                  <td className="num" data-testid={`${testId}-${key}`}>
                    {formatQuantity(f[key], bankFigureEntry(key).quantity)}
                  </td>
                </tr>
                {Number.isNaN(f[key]) && (
                  <tr>
                    <td colSpan={2} className="figure-missing" data-testid={`${testId}-${key}-missing`}>
                      {bankMissingReason(key, f)}
                    </td>
                  </tr>
                )}
              </Fragment>
            ))}
          </tbody>
        </table>
      )}
      {f && open && process && (
        <ExplanationCard
          explanation={explainFigure(open, f, {
            featureSize: process.featureSize,
            wordlineDriverResistance: process.wordlineDriverResistance,
            refreshWindow: request.operating.refreshWindow,
          })}
        />
      )}
      <div className={reasons.length === 0 ? 'point-status ok' : 'point-status bad'}>
        {reasons.length === 0 ? (onFront ? 'Pareto-optimal and feasible' : 'Feasible') : reasons.join('; ')}
      </div>
      {f && f.warningKinds.length > 0 && (
        <div className="point-status warn">warnings: {f.warningKinds.map(checkName).join(', ')}</div>
      )}
    </div>
  );
}
