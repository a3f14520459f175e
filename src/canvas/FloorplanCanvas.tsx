import { useEffect, useRef, useState } from 'react';
import { useEditorStore } from '../store/editorStore';
import { useAppStore } from '../store/useAppStore';
import { CanvasController } from './CanvasController';
import { CANVAS_BACKGROUND } from './blockStyle';
import { mountPaintedStage, type PaintedStage } from './paintedStage';
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

/**
 * The floorplan canvas: a Konva stage with three painted layers (grid, blocks, overlay with the rulers), mounted
 * once through Konva itself; the {@link CanvasController} handles input and repaints, so pointer moves
 * never re-render React components here.
 */
export function FloorplanCanvas() {
  const containerRef = useRef<HTMLDivElement>(null);
  const stageRef = useRef<PaintedStage | null>(null);
  const size = useElementSize(containerRef);
  const [controller] = useState(() => new CanvasController(useAppStore, useEditorStore));
  const mounted = size.width > 0;

  useEffect(() => {
    const element = containerRef.current;
    if (!mounted || !element) return;
    const view = controller.view;
    const stage = mountPaintedStage(element, view.width || 1, view.height || 1, CANVAS_BACKGROUND, {
      grid: view.paintGrid,
      blocks: view.paintBlocks,
      overlay: view.paintOverlay,
    });
    stageRef.current = stage;
    controller.attach(element, stage.layers);
    return () => {
      controller.detach();
      stage.destroy();
      stageRef.current = null;
    };
  }, [controller, mounted]);

  useEffect(() => {
    stageRef.current?.resize(size.width, size.height);
    controller.setSize(size.width, size.height);
  }, [controller, size]);

  return (
    <div
      ref={containerRef}
      className="floorplan"
      data-testid="floorplan"
      tabIndex={0}
      role="application"
      aria-label="Floorplan canvas"
      aria-roledescription="floorplan editor"
      aria-describedby="selection-announcer"
    />
  );
}
