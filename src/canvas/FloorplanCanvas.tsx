import type Konva from 'konva';
import { useEffect, useMemo, useRef, useState } from 'react';
import { Group, Layer, Line, Rect, Stage, Text } from 'react-konva';
import { placeBlocks, type PlacedBlock } from '../geometry/placedBlocks';
import { boundingBox } from '../geometry/rect';
import { useAppStore } from '../store/useAppStore';
import { Legend } from './Legend';
import { BLOCK_STYLE, CANVAS_BACKGROUND, ERROR_STROKE, SELECTION_STROKE } from './blockStyle';
import { fitViewport, MICROMETRES_PER_METRE, zoomAround } from './viewportMath';

const UM = MICROMETRES_PER_METRE;
/** Each wheel notch zooms by this factor. */
const WHEEL_ZOOM = 1.15;
/** Labels are drawn only on blocks at least this many pixels across. */
const LABEL_MIN_PX = 70;

function useElementSize(ref: React.RefObject<HTMLDivElement | null>) {
  const [size, setSize] = useState({ width: 0, height: 0 });
  useEffect(() => {
    const element = ref.current;
    if (!element) return;
    const observer = new ResizeObserver(([entry]) => {
      if (entry)
        setSize({ width: Math.floor(entry.contentRect.width), height: Math.floor(entry.contentRect.height) });
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, [ref]);
  return size;
}

/** The floorplan drawn with Konva: blocks in micrometres under a pan/zoom camera; click to select. */
export function FloorplanCanvas() {
  const design = useAppStore((s) => s.history.present);
  const findings = useAppStore((s) => s.report.findings);
  const selectedIds = useAppStore((s) => s.selectedIds);
  const viewport = useAppStore((s) => s.viewport);
  const setViewport = useAppStore((s) => s.setViewport);
  const select = useAppStore((s) => s.select);
  const containerRef = useRef<HTMLDivElement>(null);
  const size = useElementSize(containerRef);
  const fitRequest = useAppStore((s) => s.fitRequest);
  const fittedFor = useRef<number | null>(null);

  const placed = useMemo(() => placeBlocks(design), [design]);
  const flagged = useMemo(
    () => new Set(findings.filter((f) => f.severity === 'error').flatMap((f) => f.blockIds)),
    [findings],
  );
  const selected = useMemo(() => new Set(selectedIds), [selectedIds]);

  useEffect(() => {
    // Frame the floorplan once the canvas has a size, and again whenever a fit is requested.
    if (fittedFor.current === fitRequest || size.width === 0) return;
    fittedFor.current = fitRequest;
    setViewport(fitViewport(boundingBox(placed.map((p) => p.rect)), size.width, size.height));
  }, [size, placed, setViewport, fitRequest]);

  const onWheel = (event: Konva.KonvaEventObject<WheelEvent>) => {
    event.evt.preventDefault();
    const pointer = event.target.getStage()?.getPointerPosition();
    if (!pointer) return;
    const factor = event.evt.deltaY < 0 ? WHEEL_ZOOM : 1 / WHEEL_ZOOM;
    setViewport(zoomAround(viewport, factor, pointer.x, pointer.y));
  };

  const onDragEnd = (event: Konva.KonvaEventObject<DragEvent>) => {
    const stage = event.target.getStage();
    if (event.target !== stage || !stage) return;
    setViewport({ ...viewport, offsetX: stage.x(), offsetY: stage.y() });
  };

  return (
    <div
      ref={containerRef}
      className="floorplan"
      data-testid="floorplan"
      data-view-scale={viewport.scale}
      data-view-x={viewport.offsetX}
      data-view-y={viewport.offsetY}
    >
      {size.width > 0 && (
        <Stage
          width={size.width}
          height={size.height}
          x={viewport.offsetX}
          y={viewport.offsetY}
          scaleX={viewport.scale}
          scaleY={viewport.scale}
          draggable
          onWheel={onWheel}
          onDragEnd={onDragEnd}
          onMouseDown={(e) => {
            if (e.target === e.target.getStage()) select([]);
          }}
          style={{ background: CANVAS_BACKGROUND }}
        >
          <Layer>
            {placed.map((p) => (
              <BlockShape
                key={p.block.id}
                placed={p}
                scale={viewport.scale}
                selected={selected.has(p.block.id)}
                flagged={flagged.has(p.block.id)}
                onSelect={(additive) =>
                  select(
                    additive ? [...selectedIds.filter((id) => id !== p.block.id), p.block.id] : [p.block.id],
                  )
                }
              />
            ))}
          </Layer>
        </Stage>
      )}
      <Legend />
    </div>
  );
}

interface BlockShapeProps {
  placed: PlacedBlock;
  scale: number;
  selected: boolean;
  flagged: boolean;
  onSelect(additive: boolean): void;
}

function BlockShape({ placed, scale, selected, flagged, onSelect }: BlockShapeProps) {
  const { block, rect } = placed;
  const style = BLOCK_STYLE[block.type];
  const x = rect.x * UM;
  const y = rect.y * UM;
  const w = rect.width * UM;
  const h = rect.height * UM;
  const showLabel = Math.min(w, h) * scale >= LABEL_MIN_PX;
  const stroke = selected ? SELECTION_STROKE : flagged ? ERROR_STROKE : style.stroke;
  const fontSize = 12 / scale;
  return (
    <Group
      onMouseDown={(e) => {
        e.cancelBubble = true;
        onSelect(e.evt.shiftKey);
      }}
    >
      <Rect
        x={x}
        y={y}
        width={w}
        height={h}
        fill={selected ? style.selectedFill : style.fill}
        stroke={stroke}
        strokeWidth={selected || flagged ? 3 : 1}
        strokeScaleEnabled={false}
      />
      {block.type === 'mat' && showLabel && (
        <>
          <BitlineHint
            x={x}
            y={y}
            w={w}
            h={h}
            vertical={block.bitlineAxis === 'vertical'}
            color={style.stroke}
          />
          <Text
            x={x + 6 / scale}
            y={y + 6 / scale}
            text={`${block.name || block.id}\n${block.cellsPerBitline} × ${block.cellsPerWordline}`}
            fontSize={fontSize}
            fill={style.text}
            listening={false}
          />
        </>
      )}
    </Group>
  );
}

/** A few faint lines along the bit-line direction so the orientation reads at a glance. */
function BitlineHint(props: {
  x: number;
  y: number;
  w: number;
  h: number;
  vertical: boolean;
  color: string;
}) {
  const { x, y, w, h, vertical, color } = props;
  const lines = [0.25, 0.5, 0.75].map((t) =>
    vertical
      ? [x + w * t, y + h * 0.08, x + w * t, y + h * 0.92]
      : [x + w * 0.08, y + h * t, x + w * 0.92, y + h * t],
  );
  return (
    <>
      {lines.map((points, i) => (
        <Line
          key={i}
          points={points}
          stroke={color}
          opacity={0.3}
          strokeWidth={1}
          strokeScaleEnabled={false}
          listening={false}
        />
      ))}
    </>
  );
}
