import { memo, useCallback, useLayoutEffect, useMemo, useRef, useState } from 'react';
import { buildPartition, shortProcessName } from '../../designs/buildPartition';
import { downloadBlob, fileBaseName } from '../../app/download';
import {
  markerPath,
  ScatterChart,
  type ScatterExport,
  type ScatterPoints,
  type ShadedBand,
} from '../../charts/ScatterChart';
import { createVariant } from '../../commands/createVariant';
import type { FeasibilityLimits } from '../../explore/chartData';
import { ChartModelBuilder, scatterInputOf } from '../../explore/chartModelBuilder';
import type { SweepChart } from '../../explore/sweepProtocol';
import { SweepTable } from '../../explore/sweepColumns';
import { bankFigureEntry, type FigureKey } from '../../engine';
import { pointBuildSpec, type SweepRequest } from '../../explore/sweep';
import { sweepPointsCsv } from '../../explore/pointsCsv';
import { familySentences } from '../../explore/familyTally';
import type { Design } from '../../model/design';
import { formatQuantity, formatWholeNumber } from '../../model/units';
import { defaultSweepSettings, type SweepSettings } from '../../explore/sweepSettings';
import { useAppStore } from '../../store/useAppStore';
import { useExploreStore } from '../../store/useExploreStore';
import { BuilderForm } from './BuilderForm';
import { ChartControls } from './ChartControls';
import { FrontTable } from './FrontTable';
import { PointCard } from './PointCard';
import { seriesColour } from './seriesStyle';
import { BankControls, SweepControls } from './SweepControls';
import { SweepProgress } from './SweepProgress';
import { sweepChartPlan } from './sweepChartPlan';
import { sweepAnnouncement } from './sweepStatusText';

/** The table of a view with no sweep yet. */
const NO_POINTS = new SweepTable();

/** Infeasible stretches of the axes that carry a constrained figure. */
function constraintBands(xAxis: FigureKey, yAxis: FigureKey, limits: FeasibilityLimits): ShadedBand[] {
  const bands: ShadedBand[] = [];
  for (const [axis, figure] of [
    ['x', xAxis],
    ['y', yAxis],
  ] as const) {
    if (figure === 'senseMargin') {
      bands.push({ axis, from: -Infinity, to: limits.minMargin, label: 'margin below minimum' });
    }
    if (figure === 'wordlineDelay') {
      bands.push({ axis, from: limits.maxDelay, to: Infinity, label: 'word line too slow' });
    }
  }
  return bands;
}

/**
 * The design-space explorer: sweep settings on the left; on the right the scatter of every swept
 * partition with its Pareto front, a tooltip per point, and clicking a point builds it as a new variant.
 */
export function ExplorerView() {
  const design = useAppStore((s) => s.history.present);
  const execute = useAppStore((s) => s.execute);
  const stored = useExploreStore((s) => s.settings);
  const setSettings = useExploreStore((s) => s.setSettings);
  const run = useExploreStore((s) => s.run);
  const xAxis = useExploreStore((s) => s.xAxis);
  const yAxis = useExploreStore((s) => s.yAxis);
  const constraints = useExploreStore((s) => s.constraints);
  const lastBuilt = useExploreStore((s) => s.lastBuilt);
  const noteBuilt = useExploreStore((s) => s.noteBuilt);
  const [hovered, setHovered] = useState<number | null>(null);
  const [pickError, setPickError] = useState<string | null>(null);
  const [builtByForm, setBuiltByForm] = useState<string | null>(null);
  const chart = useRef<ScatterExport>(null);

  const settings = useMemo(() => stored ?? defaultSweepSettings(design), [stored, design]);
  const minMargin =
    constraints.minMargin ?? run.request?.operating.minimumSenseMargin ?? design.operating.minimumSenseMargin;
  const limits = useMemo(
    () => ({ minMargin, maxDelay: constraints.maxDelay }),
    [minMargin, constraints.maxDelay],
  );
  // The chart model grows with the table: each update takes in only the rows shown since the last one.
  // Other axes, limits or another run start a new model from the whole table. A finished sweep's model
  // and points picture, built by the worker for these very axes and limits, are taken over once.
  const builder = useRef<ChartModelBuilder | null>(null);
  const adopted = useRef<{ chart: SweepChart; builder: ChartModelBuilder } | null>(null);
  const table = run.table ?? NO_POINTS;
  const finished = run.status === 'done' ? run.chart : null;
  const model = useMemo(() => {
    let b = builder.current;
    if (
      finished &&
      adopted.current?.chart !== finished &&
      finished.xAxis === xAxis &&
      finished.yAxis === yAxis &&
      finished.limits.minMargin === limits.minMargin &&
      finished.limits.maxDelay === limits.maxDelay &&
      finished.model.rows === run.shown
    ) {
      builder.current = b = new ChartModelBuilder(table, xAxis, yAxis, limits, finished.model);
      adopted.current = { chart: finished, builder: b };
    } else if (!b || b.table !== table || b.xAxis !== xAxis || b.yAxis !== yAxis || b.limits !== limits)
      builder.current = b = new ChartModelBuilder(table, xAxis, yAxis, limits);
    b.update(run.shown);
    return b.snapshot();
  }, [table, run.shown, xAxis, yAxis, limits, finished]);
  const data = useMemo(
    (): ScatterPoints => ({
      ...scatterInputOf(model, seriesColour),
      picture: adopted.current?.builder === model.source ? adopted.current.chart.picture : null,
    }),
    [model],
  );
  const frontSet = useMemo(() => new Set(model.front), [model.front]);
  const request = run.request;
  const shown = run.shown;
  // Put in words once the sweep has stopped, from the tallies the chart model keeps.
  const whyInfeasible = useMemo(
    () =>
      run.status === 'running' || !run.request || !builder.current
        ? []
        : familySentences(
            builder.current.tallies,
            run.request.cells.map((c) => c.name),
            run.request.processes.map(shortProcessName),
          ),
    // The model stands for the builder's state: a new model, new tallies.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [run.status, run.request, model],
  );
  const hoveredRow = hovered !== null && hovered < model.count ? (model.row[hovered] ?? -1) : -1;
  const hoveredPoint = useMemo(
    () => (hoveredRow >= 0 ? table.point(hoveredRow) : undefined),
    [table, hoveredRow],
  );

  // The worker draws the finished chart for the chart shown: it is told the axes, limits and size at the
  // start of each run (once the chart has its size) and whenever they change while the sweep runs.
  const planSweepChart = useExploreStore((s) => s.planSweepChart);
  const chartSize = useRef<{ width: number; height: number } | null>(null);
  const running = run.status === 'running';
  const sendPlan = useCallback(() => {
    const size = chartSize.current;
    if (running && request && size) planSweepChart(sweepChartPlan(request, { xAxis, yAxis }, limits, size));
  }, [running, request, xAxis, yAxis, limits, planSweepChart]);
  useLayoutEffect(sendPlan, [sendPlan, run.id]);
  const onChartSize = useCallback(
    (width: number, height: number) => {
      chartSize.current = { width, height };
      sendPlan();
    },
    [sendPlan],
  );

  const pick = (plottedIndex: number) => {
    const point = plottedIndex < model.count ? table.point(model.row[plottedIndex] ?? -1) : undefined;
    if (!point || !request || !point.figures) return;
    const built = buildPartition({ ...pointBuildSpec(request, point), cells: design.cells });
    if (!built.ok) {
      setPickError(built.error);
      return;
    }
    if (execute(createVariant, { design: built.design })) {
      setPickError(null);
      setBuiltByForm(null);
      noteBuilt({ pointIndex: point.index, name: built.design.name });
    } else {
      setPickError(useAppStore.getState().lastError);
    }
  };

  const xInfo = bankFigureEntry(xAxis);
  const yInfo = bankFigureEntry(yAxis);
  const builtRow = lastBuilt ? table.rowOf(lastBuilt.pointIndex) : -1;
  const builtPoint = builtRow >= 0 ? table.point(builtRow) : undefined;
  const exportBase = () =>
    `${fileBaseName(design.name)}-${xAxis}-vs-${yAxis}`.replace(/([a-z])([A-Z])/g, '$1-$2').toLowerCase();

  return (
    <div className="explorer" data-testid="explorer">
      <ExplorerControls
        design={design}
        settings={settings}
        onChange={setSettings}
        minMargin={minMargin}
        onBuilt={setBuiltByForm}
      />
      <div className="explorer-main">
        <div className="sweep-status" data-testid="sweep-status" data-status={run.status}>
          <SweepProgress
            run={run}
            counts={
              shown > 0
                ? ` · ${formatWholeNumber(model.counts.feasible)} feasible · ${model.front.length} on the front` +
                  (model.counts.unplanned > 0
                    ? ` · ${formatWholeNumber(model.counts.unplanned)} need too many mats`
                    : '')
                : ''
            }
          />
          {shown > 0 && request && (
            <span className="chart-exports">
              <button
                type="button"
                data-testid="export-points-csv"
                title="Every point with every figure, its feasibility and whether it is on the front, as CSV"
                onClick={() => {
                  const index = table.place('index');
                  const front = new Set(model.front.map((i) => index[model.row[i] ?? -1] ?? -1));
                  const text = sweepPointsCsv(table.points(shown), request, limits, front);
                  downloadBlob(new Blob([text], { type: 'text/csv' }), `${exportBase()}.points.csv`);
                }}
              >
                Points CSV
              </button>
              <button
                type="button"
                data-testid="export-chart-svg"
                title="The chart as an SVG drawing"
                onClick={() => {
                  const text = chart.current?.svg();
                  if (text)
                    downloadBlob(new Blob([text], { type: 'image/svg+xml' }), `${exportBase()}.chart.svg`);
                }}
              >
                Chart SVG
              </button>
              <button
                type="button"
                data-testid="export-chart-png"
                title="The chart as a PNG picture at twice its size on screen"
                onClick={async () => {
                  const blob = await chart.current?.png(2);
                  if (blob) downloadBlob(blob, `${exportBase()}.chart.png`);
                }}
              >
                Chart PNG
              </button>
            </span>
          )}
        </div>
        <div className="sr-only" role="status" aria-live="polite" data-testid="sweep-announcer">
          {sweepAnnouncement(run, model.counts.feasible, model.front.length, whyInfeasible)}
        </div>
        {whyInfeasible.length > 0 && (
          <details className="sweep-why-box">
            <summary data-testid="sweep-why-summary">
              {whyInfeasible.length === 1
                ? 'Why one family has no feasible point'
                : `Why ${whyInfeasible.length} families have no feasible point`}
            </summary>
            <ul className="sweep-why" data-testid="sweep-why" aria-label="Families with no feasible point">
              {whyInfeasible.map((sentence) => (
                <li key={sentence}>{sentence}</li>
              ))}
            </ul>
          </details>
        )}
        {/* The chart stands from the Run click on, so it has its size before the first points come. */}
        {run.status === 'idle' ? (
          <div className="chart-empty">
            <p>
              Run a sweep to see {yInfo.label.toLowerCase()} against {xInfo.label.toLowerCase()} for every
              partition, with the Pareto front of the feasible ones. Hover a point for its figures; click it
              (or use the Build buttons in the table of front points) to build that bank as a new variant.
            </p>
          </div>
        ) : (
          <ScatterChart
            data={data}
            front={model.front}
            x={{
              label: xInfo.label,
              better: xInfo.better,
              format: (v) => formatQuantity(v, xInfo.quantity, 3),
            }}
            y={{
              label: yInfo.label,
              better: yInfo.better,
              format: (v) => formatQuantity(v, yInfo.quantity, 3),
            }}
            bands={constraintBands(xAxis, yAxis, limits)}
            hovered={hovered !== null && hovered < data.count ? hovered : null}
            onHover={setHovered}
            onPick={pick}
            exportRef={chart}
            growing={running}
            onSize={onChartSize}
            renderTooltip={() =>
              hoveredPoint && request ? (
                <>
                  <PointCard
                    point={hoveredPoint}
                    request={request}
                    limits={limits}
                    onFront={hovered !== null && frontSet.has(hovered)}
                    testId="hover-point"
                  />
                  <div className="point-hint">Click to build this bank as a new variant</div>
                </>
              ) : null
            }
          />
        )}
        {request && shown > 0 && <SeriesLegend request={request} />}
        {request && model.front.length > 0 && (
          <FrontTable
            model={model}
            table={table}
            request={request}
            xAxis={xAxis}
            yAxis={yAxis}
            onFocusPoint={setHovered}
            onBuild={pick}
          />
        )}
        {pickError && (
          <p className="field-error" role="alert">
            {pickError}
          </p>
        )}
        {builtByForm && (
          <p className="built-note" data-testid="built-note">
            Built “{builtByForm}” as a new variant; it is now the design being edited.
          </p>
        )}
        {lastBuilt && builtPoint && request && (
          <div className="built" data-testid="built">
            <p className="built-note" data-testid="built-note">
              Built “{lastBuilt.name}” as a new variant; it is now the design being edited. Compare it under
              Variants.
            </p>
            <PointCard
              point={builtPoint}
              request={request}
              limits={limits}
              onFront={model.front.some((i) => model.row[i] === builtRow)}
              explainable
              testId="built-point"
            />
          </div>
        )}
      </div>
    </div>
  );
}

/**
 * The settings column. Memoised: a running sweep re-renders the view at every progress update, and
 * none of these fields depends on the sweep's progress.
 */
const ExplorerControls = memo(function ExplorerControls(props: {
  readonly design: Design;
  readonly settings: SweepSettings;
  onChange(settings: SweepSettings): void;
  readonly minMargin: number;
  onBuilt(name: string): void;
}) {
  const { design, settings, onChange, minMargin, onBuilt } = props;
  return (
    <div className="explorer-controls">
      <BankControls settings={settings} onChange={onChange} />
      <SweepControls design={design} settings={settings} onChange={onChange} />
      <ChartControls minMargin={minMargin} />
      <BuilderForm design={design} settings={settings} onBuilt={onBuilt} />
    </div>
  );
});

function SeriesLegend({ request }: { readonly request: SweepRequest }) {
  return (
    <div className="series-legend" data-testid="series-legend">
      {request.cells.map((c, i) => (
        <span key={c.id}>
          <span className="swatch-dot" style={{ background: seriesColour(i) }} /> {c.name}
        </span>
      ))}
      {request.processes.map((p, i) => (
        <span key={p.id + i}>
          <svg width="14" height="14" viewBox="-7 -7 14 14" aria-hidden="true">
            <path d={markerPath(i, 60)} fill="#4a5260" />
          </svg>{' '}
          {shortProcessName(p)}
        </span>
      ))}
      <span>
        <span className="swatch-dot infeasible" /> infeasible
      </span>
      <span>
        <span className="front-key" /> Pareto front
      </span>
    </div>
  );
}
