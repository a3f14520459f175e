import type Konva from 'konva';
import { useEffect, useRef, useState } from 'react';
import { Layer, Shape, Stage } from 'react-konva';
import { useEditorStore } from '../store/editorStore';
import { useAppStore } from '../store/useAppStore';
import { CanvasController } from './CanvasController';
import { CANVAS_BACKGROUND } from './blockStyle';
import './canvas.css';

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

type Paint = (ctx: CanvasRenderingContext2D) => void;

/** One Konva layer holding one shape that paints itself; nothing in it takes pointer events. */
function PaintedLayer({ layerRef, paint }: { layerRef: React.Ref<Konva.Layer>; paint: Paint }) {
  return (
    <Layer ref={layerRef} listening={false} imageSmoothingEnabled={false}>
      <Shape sceneFunc={(context) => paint(context._context)} listening={false} perfectDrawEnabled={false} />
    </Layer>
  );
}

/**
 * The floorplan canvas: a Konva stage with four painted layers (grid, blocks, overlay, rulers). React
 * mounts it once; the {@link CanvasController} handles input and repaints, so pointer moves never
 * re-render React components here.
 */
export function FloorplanCanvas() {
  const containerRef = useRef<HTMLDivElement>(null);
  const size = useElementSize(containerRef);
  const [controller] = useState(() => new CanvasController(useAppStore, useEditorStore));
  const grid = useRef<Konva.Layer>(null);
  const blocks = useRef<Konva.Layer>(null);
  const overlay = useRef<Konva.Layer>(null);
  const rulers = useRef<Konva.Layer>(null);
  const mounted = size.width > 0;

  useEffect(() => {
    const element = containerRef.current;
    if (!mounted || !element || !grid.current || !blocks.current || !overlay.current || !rulers.current)
      return;
    controller.attach(element, {
      grid: grid.current,
      blocks: blocks.current,
      overlay: overlay.current,
      rulers: rulers.current,
    });
    return () => controller.detach();
  }, [controller, mounted]);

  useEffect(() => {
    controller.setSize(size.width, size.height);
  }, [controller, size]);

  const view = controller.view;
  return (
    <div ref={containerRef} className="floorplan" data-testid="floorplan" tabIndex={-1}>
      {mounted && (
        <Stage
          width={size.width}
          height={size.height}
          listening={false}
          style={{ background: CANVAS_BACKGROUND }}
        >
          <PaintedLayer layerRef={grid} paint={view.paintGrid} />
          <PaintedLayer layerRef={blocks} paint={view.paintBlocks} />
          <PaintedLayer layerRef={overlay} paint={view.paintOverlay} />
          <PaintedLayer layerRef={rulers} paint={view.paintRulers} />
        </Stage>
      )}
    </div>
  );
}
