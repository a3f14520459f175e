export type { ScatterPoints } from './chartStyle';
export { markerPath } from './chartStyle';
import { curveStepAfter, line, symbol } from 'd3';
import { useImperativeHandle, useLayoutEffect, useMemo, useRef, type ReactNode, type Ref } from 'react';
import { scatterSvgText, svgToPng } from './chartExport';
import { axisTicks, extentScale, grownExtent, type AxisScale, type ShownExtent } from './chartScale';
import { MARGIN, MARKER_SHAPES, type ScatterPoints } from './chartStyle';
import { nearestIndex, type NearestIndex } from './nearestPoint';
import { PointsCanvas } from './PointsCanvas';
import { placementOf, plotArea } from './pointsPicture';
import { placePoints, type ScreenPositions } from './screenPositions';
import { useElementSize } from './useElementSize';

/** A stretch of one axis where points are infeasible, shaded across the plot. */
export interface ShadedBand {
  readonly axis: 'x' | 'y';
  readonly from: number;
  readonly to: number;
  readonly label: string;
}

export interface AxisSpec {
  readonly label: string;
  readonly format: (value: number) => string;
  readonly better: 'lower' | 'higher' | 'neither';
}

interface ScatterChartProps {
  readonly data: ScatterPoints;
  /** Indices of the front, in drawing order along x. */
  readonly front: readonly number[];
  readonly x: AxisSpec;
  readonly y: AxisSpec;
  readonly bands: readonly ShadedBand[];
  readonly hovered: number | null;
  onHover(index: number | null): void;
  onPick(index: number): void;
  /** What to show beside the hovered point. */
  renderTooltip(index: number): ReactNode;
  /** Receives the chart's picture exports. */
  readonly exportRef?: Ref<ScatterExport>;
  /**
   * True while the data only grows at its end (a running sweep): the axes then grow in steps, with room
   * ahead, so that the canvas stamps only the new points; once false the axes fit the points exactly.
   */
  readonly growing?: boolean;
  /**
   * Told the chart's size (CSS px) once it has one and whenever it changes, before the browser paints:
   * whoever draws the points off the page (pointsPicture.ts) draws them for this size.
   */
  onSize?(width: number, height: number): void;
}

/** The chart as a picture file. */
export interface ScatterExport {
  svg(): string | null;
  png(scale?: number): Promise<Blob | null>;
}

/** A pointer within this many pixels of a point picks it. */
const PICK_RADIUS = 14;
const FRONT_SHAPE_PATHS = MARKER_SHAPES.map((t) => symbol(t, 90)() ?? '');

/**
 * A scatter chart: d3 computes scales, ticks, the front's step line and the marker shapes during
 * render, and a bucket grid finds the point under the pointer; React draws the SVG. The points themselves go on a canvas between a back
 * layer (bands, grid) and a front layer (ticks, front, hover), so a sweep of 100,000 points stays fluid.
 */
export function ScatterChart(props: ScatterChartProps) {
  const {
    data,
    front,
    x,
    y,
    bands,
    hovered,
    onHover,
    onPick,
    renderTooltip,
    exportRef,
    growing = false,
    onSize,
  } = props;
  const boxRef = useRef<HTMLDivElement>(null);
  const backRef = useRef<SVGSVGElement>(null);
  const frontRef = useRef<SVGSVGElement>(null);
  const { width, height } = useElementSize(boxRef);
  const { plotW, plotH } = plotArea(width, height);
  useLayoutEffect(() => {
    if (width > 0) onSize?.(width, height);
  }, [width, height, onSize]);

  // While growing, each axis keeps the extent it showed as long as the points fit in it.
  const shown = useRef<{ source: object; x: ShownExtent; y: ShownExtent } | null>(null);
  const kept = shown.current && shown.current.source === data.source ? shown.current : null;
  const [xMin, xMax] = data.extent.x;
  const [yMin, yMax] = data.extent.y;
  const xShown = growing
    ? grownExtent(kept?.x ?? null, xMin, xMax)
    : { min: xMin, max: xMax, log: undefined };
  const yShown = growing
    ? grownExtent(kept?.y ?? null, yMin, yMax)
    : { min: yMin, max: yMax, log: undefined };
  if (growing) shown.current = { source: data.source, x: xShown as ShownExtent, y: yShown as ShownExtent };
  else shown.current = null;
  const xs = useMemo(
    () => extentScale(xShown.min, xShown.max, 0, plotW, xShown.log),
    [xShown.min, xShown.max, xShown.log, plotW],
  );
  const ys = useMemo(
    () => extentScale(yShown.min, yShown.max, plotH, 0, yShown.log),
    [yShown.min, yShown.max, yShown.log, plotH],
  );
  const placement = placementOf(xs, ys, plotW, plotH);
  // Positions of the points already placed are kept while the placement holds; only new points are
  // placed. A picture drawn off the page for this placement brings every position with it.
  const placed = useRef<ScreenPositions | null>(null);
  const screen = useMemo(() => {
    const picture = data.picture;
    placed.current =
      picture && picture.placement === placement && picture.count === data.count
        ? { source: data.source, placement, count: picture.count, x: picture.x, y: picture.y }
        : placePoints(placed.current, data, xs, ys, placement);
    return placed.current;
  }, [data, xs, ys, placement]);
  // The pick grid is built on the first pointer move after the points change, not on every update.
  const picker = useRef<{ screen: ScreenPositions; index: NearestIndex } | null>(null);

  const nearest = (event: React.PointerEvent | React.MouseEvent): number | null => {
    const rect = event.currentTarget.getBoundingClientRect();
    if (picker.current?.screen !== screen)
      picker.current = { screen, index: nearestIndex(screen.count, screen.x, screen.y, PICK_RADIUS) };
    return picker.current.index.find(event.clientX - rect.left, event.clientY - rect.top);
  };

  const frontPath = useMemo(() => {
    const points = front
      .filter((i) => i < screen.count)
      .map((i): [number, number] => [screen.x[i] ?? Number.NaN, screen.y[i] ?? Number.NaN]);
    return points.length > 1 ? (line().curve(curveStepAfter)(points) ?? '') : '';
  }, [front, screen]);

  useImperativeHandle(exportRef, () => {
    const svg = () =>
      backRef.current && frontRef.current && width > 0
        ? scatterSvgText({ back: backRef.current, front: frontRef.current }, data, screen, width, height)
        : null;
    return {
      svg,
      png: async (scale = 2) => {
        const text = svg();
        return text ? svgToPng(text, width, height, scale) : null;
      },
    };
  }, [data, screen, width, height]);

  const hoveredAt: [number, number] | undefined =
    hovered !== null && hovered < screen.count
      ? [screen.x[hovered] ?? Number.NaN, screen.y[hovered] ?? Number.NaN]
      : undefined;

  return (
    <div className="scatter" ref={boxRef} data-testid="scatter" data-points={data.count}>
      {width > 0 && (
        <>
          <svg ref={backRef} className="layer" width={width} height={height} aria-hidden="true">
            <g transform={`translate(${MARGIN.left},${MARGIN.top})`}>
              <Bands bands={bands} xs={xs} ys={ys} width={plotW} height={plotH} />
              <Grid xs={xs} ys={ys} width={plotW} height={plotH} />
            </g>
          </svg>
          <PointsCanvas data={data} screen={screen} width={width} height={height} growing={growing} />
          <svg
            ref={frontRef}
            className="layer"
            width={width}
            height={height}
            role="img"
            aria-label={`${y.label} against ${x.label}`}
          >
            <g transform={`translate(${MARGIN.left},${MARGIN.top})`}>
              <Axes xs={xs} ys={ys} x={x} y={y} width={plotW} height={plotH} />
              {frontPath && <path className="front-line" d={frontPath} data-testid="front-line" />}
              {front.map((i) => {
                if (i >= screen.count) return null;
                return (
                  <path
                    key={i}
                    className="front-point"
                    data-testid="front-point"
                    data-index={i}
                    d={FRONT_SHAPE_PATHS[(data.shape[i] ?? 0) % FRONT_SHAPE_PATHS.length]}
                    transform={`translate(${screen.x[i]},${screen.y[i]})`}
                    fill={data.colourOf(data.series[i] ?? 0)}
                  />
                );
              })}
              {hoveredAt && <circle className="hover-ring" cx={hoveredAt[0]} cy={hoveredAt[1]} r={9} />}
              <rect
                className="pick-surface"
                width={plotW}
                height={plotH}
                data-testid="pick-surface"
                onPointerMove={(e) => {
                  const i = nearest(e);
                  if (i !== hovered) onHover(i);
                }}
                onPointerLeave={() => onHover(null)}
                onClick={(e) => {
                  // The point whose card is showing is the one the click builds, even when the card's
                  // appearance has nudged the layout since the pointer last moved.
                  const i = hovered ?? nearest(e);
                  if (i !== null) onPick(i);
                }}
                style={{ cursor: hovered !== null ? 'pointer' : 'crosshair' }}
              />
            </g>
          </svg>
        </>
      )}
      {hoveredAt && hovered !== null && (
        <div
          className="chart-tooltip"
          data-testid="chart-tooltip"
          style={{
            left: Math.min(MARGIN.left + hoveredAt[0] + 14, Math.max(0, width - 300)),
            top: Math.min(MARGIN.top + hoveredAt[1] + 14, Math.max(0, height - 250)),
          }}
        >
          {renderTooltip(hovered)}
        </div>
      )}
    </div>
  );
}

function Bands(props: {
  bands: readonly ShadedBand[];
  xs: AxisScale;
  ys: AxisScale;
  width: number;
  height: number;
}) {
  const { bands, xs, ys, width, height } = props;
  const clamp = (v: number, max: number) => Math.min(max, Math.max(0, v));
  return (
    <g className="bands">
      {bands.map((b) => {
        const scale = b.axis === 'x' ? xs.scale : ys.scale;
        const max = b.axis === 'x' ? width : height;
        const lo = Math.max(b.from, scale.domain()[0] ?? b.from);
        const hi = Math.min(b.to, scale.domain()[1] ?? b.to);
        const a = clamp(scale(Number.isFinite(lo) ? lo : 0), max);
        const c = clamp(scale(Number.isFinite(hi) ? hi : 0), max);
        if (!(hi > lo)) return null;
        const start = Math.min(a, c);
        const size = Math.abs(c - a);
        if (size < 0.5) return null;
        return (
          <g key={`${b.axis}-${b.label}`} data-testid="infeasible-band">
            {b.axis === 'x' ? (
              <rect className="band" x={start} y={0} width={size} height={height} />
            ) : (
              <rect className="band" x={0} y={start} width={width} height={size} />
            )}
            <text
              className="band-label"
              x={b.axis === 'x' ? start + 6 : width - 6}
              y={b.axis === 'x' ? 14 : start + size - 6}
              textAnchor={b.axis === 'x' ? 'start' : 'end'}
            >
              {b.label}
            </text>
          </g>
        );
      })}
    </g>
  );
}

/** Grid lines at the ticks and the plot frame, under the points. */
function Grid(props: { xs: AxisScale; ys: AxisScale; width: number; height: number }) {
  const { xs, ys, width, height } = props;
  return (
    <g>
      {axisTicks(xs, Math.max(3, Math.floor(width / 110))).map((t) => (
        <line key={`x${t}`} className="grid" x1={xs.scale(t)} x2={xs.scale(t)} y1={0} y2={height} />
      ))}
      {axisTicks(ys, Math.max(3, Math.floor(height / 60))).map((t) => (
        <line key={`y${t}`} className="grid" x1={0} x2={width} y1={ys.scale(t)} y2={ys.scale(t)} />
      ))}
      <rect className="frame" width={width} height={height} />
    </g>
  );
}

/** Tick labels and axis titles, over the points. */
function Axes(props: {
  xs: AxisScale;
  ys: AxisScale;
  x: AxisSpec;
  y: AxisSpec;
  width: number;
  height: number;
}) {
  const { xs, ys, x, y, width, height } = props;
  const xTicks = axisTicks(xs, Math.max(3, Math.floor(width / 110)));
  const yTicks = axisTicks(ys, Math.max(3, Math.floor(height / 60)));
  const arrow = (spec: AxisSpec, axis: 'x' | 'y') => {
    if (spec.better === 'neither') return '';
    if (axis === 'x') return spec.better === 'lower' ? '← better' : 'better →';
    return spec.better === 'lower' ? '↓ better' : '↑ better';
  };
  return (
    <g className="axes">
      {xTicks.map((t) => (
        <g key={`x${t}`} transform={`translate(${xs.scale(t)},0)`}>
          <line className="tick-mark" y1={height} y2={height + 4} />
          <text className="tick" y={height + 16} textAnchor="middle">
            {x.format(t)}
          </text>
        </g>
      ))}
      {yTicks.map((t) => (
        <g key={`y${t}`} transform={`translate(0,${ys.scale(t)})`}>
          <line className="tick-mark" x1={-4} x2={0} />
          <text className="tick" x={-8} dy="0.32em" textAnchor="end">
            {y.format(t)}
          </text>
        </g>
      ))}
      <text
        className="axis-label"
        x={width / 2}
        y={height + 38}
        textAnchor="middle"
        data-testid="x-axis-label"
      >
        {x.label}
        {xs.log ? ' (log)' : ''} <tspan className="better">{arrow(x, 'x')}</tspan>
      </text>
      <text
        className="axis-label"
        transform={`translate(${-60},${height / 2}) rotate(-90)`}
        textAnchor="middle"
        data-testid="y-axis-label"
      >
        {y.label}
        {ys.log ? ' (log)' : ''} <tspan className="better">{arrow(y, 'y')}</tspan>
      </text>
    </g>
  );
}
