import { useState } from 'react';
import { shortProcessName } from '../../designs/buildPartition';
import type { ColumnChartModel } from '../../explore/chartModelBuilder';
import type { SweepTable } from '../../explore/sweepColumns';
import { bankFigureEntry, type FigureKey } from '../../engine';
import type { SweepRequest } from '../../explore/sweep';
import { formatQuantity } from '../../model/units';
import { markerPath } from '../../charts/ScatterChart';
import { FRONT_ROWS_FIRST_SHOWN } from './frontTableRows';
import { seriesColour } from './seriesStyle';

interface FrontTableProps {
  readonly model: ColumnChartModel;
  /** The sweep's points; the table builds an object only for each front point. */
  readonly table: SweepTable;
  readonly request: SweepRequest;
  readonly xAxis: FigureKey;
  readonly yAxis: FigureKey;
  /** Index into the plotted points of the row in use, shown on the chart. */
  onFocusPoint(plottedIndex: number | null): void;
  onBuild(plottedIndex: number): void;
}

const at = (column: Float64Array, row: number) => column[row] ?? Number.NaN;

/**
 * The Pareto-front points as a table, best first along the horizontal axis: what partition each is, its
 * two charted figures, and a button that builds it as a new variant. It is the keyboard's way to the
 * front; focusing a row's button rings its point on the chart.
 */
export function FrontTable({ model, table, request, xAxis, yAxis, onFocusPoint, onBuild }: FrontTableProps) {
  const xInfo = bankFigureEntry(xAxis);
  const yInfo = bankFigureEntry(yAxis);
  const [showAll, setShowAll] = useState(false);
  const shown = showAll ? model.front : model.front.slice(0, FRONT_ROWS_FIRST_SHOWN);
  const hidden = model.front.length - shown.length;
  return (
    <div className="front-table-box">
      <table className="front-table" data-testid="front-table">
        <caption>
          Pareto front: {model.front.length} point{model.front.length === 1 ? '' : 's'}, best{' '}
          {xInfo.label.toLowerCase()} first
        </caption>
        <thead>
          <tr>
            <th scope="col">Cell · process</th>
            <th scope="col">Cells per BL × WL</th>
            <th scope="col">Mats</th>
            <th scope="col" className="num">
              {xInfo.label}
            </th>
            <th scope="col" className="num">
              {yInfo.label}
            </th>
            <th scope="col">
              <span className="sr-only">Build</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {shown.map((plottedIndex, rank) => {
            const row = plottedIndex < model.count ? (model.row[plottedIndex] ?? -1) : -1;
            if (row < 0 || !table.planned(row)) return null;
            // Read from the columns: no point object per row.
            const point = {
              cellIndex: at(table.place('cellIndex'), row),
              processIndex: at(table.place('processIndex'), row),
              cellsPerBitline: at(table.place('cellsPerBitline'), row),
              cellsPerWordline: at(table.place('cellsPerWordline'), row),
              matRows: at(table.place('matRows'), row),
              matColumns: at(table.place('matColumns'), row),
            };
            const cell = request.cells[point.cellIndex];
            const process = request.processes[point.processIndex];
            const title = `${cell?.name ?? '?'} · ${process ? shortProcessName(process) : '?'}`;
            return (
              <tr key={plottedIndex} data-testid="front-row">
                <th scope="row">
                  <svg width="12" height="12" viewBox="-6 -6 12 12" aria-hidden="true">
                    <path
                      d={markerPath(point.processIndex, 40)}
                      fill={seriesColour(point.cellIndex)}
                      stroke="#1f2328"
                      strokeWidth={0.7}
                    />
                  </svg>{' '}
                  {title}
                </th>
                <td>
                  {point.cellsPerBitline} × {point.cellsPerWordline}
                </td>
                <td>
                  {point.matRows} × {point.matColumns}
                </td>
                <td className="num">{formatQuantity(at(table.figure(xAxis), row), xInfo.quantity)}</td>
                <td className="num">{formatQuantity(at(table.figure(yAxis), row), yInfo.quantity)}</td>
                <td>
                  <button
                    type="button"
                    data-testid={`build-front-${rank}`}
                    title="Build this bank as a new variant and edit it"
                    aria-label={`Build ${title}, ${point.cellsPerBitline} × ${point.cellsPerWordline}, as a new variant`}
                    onFocus={() => onFocusPoint(plottedIndex)}
                    onBlur={() => onFocusPoint(null)}
                    onClick={() => onBuild(plottedIndex)}
                  >
                    Build
                  </button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {hidden > 0 && (
        <button
          type="button"
          className="front-more"
          data-testid="front-show-all"
          title="List every point of the Pareto front in this table"
          onClick={() => setShowAll(true)}
        >
          Show the other {hidden} front points
        </button>
      )}
    </div>
  );
}
