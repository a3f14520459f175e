import { useEffect, useLayoutEffect, useState, type RefObject } from 'react';

interface Size {
  readonly width: number;
  readonly height: number;
}

/** The content box of an element as a ResizeObserver's contentRect gives it (px, floored). */
function contentSize(element: HTMLElement): Size {
  const box = element.getBoundingClientRect();
  const style = getComputedStyle(element);
  const px = (value: string) => parseFloat(value) || 0;
  const width =
    box.width -
    px(style.paddingLeft) -
    px(style.paddingRight) -
    px(style.borderLeftWidth) -
    px(style.borderRightWidth);
  const height =
    box.height -
    px(style.paddingTop) -
    px(style.paddingBottom) -
    px(style.borderTopWidth) -
    px(style.borderBottomWidth);
  return { width: Math.floor(Math.max(0, width)), height: Math.floor(Math.max(0, height)) };
}

/**
 * The content size of an element (px), following resizes. Measured once as the element mounts, before
 * the browser paints, so the first frame already has the real size (waiting for the observer's first
 * report would render and lay out everything twice); an unchanged size renders nothing.
 */
export function useElementSize(ref: RefObject<HTMLElement | null>) {
  const [size, setSize] = useState<Size>({ width: 0, height: 0 });
  const update = (next: Size) =>
    setSize((old) => (old.width === next.width && old.height === next.height ? old : next));
  useLayoutEffect(() => {
    if (ref.current) update(contentSize(ref.current));
  }, [ref]);
  useEffect(() => {
    const element = ref.current;
    if (!element) return;
    const observer = new ResizeObserver(([entry]) => {
      if (entry) {
        update({ width: Math.floor(entry.contentRect.width), height: Math.floor(entry.contentRect.height) });
      }
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, [ref]);
  return size;
}
