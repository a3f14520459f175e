import {
  INFEASIBLE_FILL,
  MARGIN,
  MARKER_OUTLINE,
  MARKER_SIZE,
  markerPath,
  PLOT_BACKGROUND,
  type ScatterPoints,
} from './chartStyle';
import type { ScreenPositions } from './screenPositions';

const SVG_NS = 'http://www.w3.org/2000/svg';
/** Presentation properties copied from the live chart, so the file looks the same without the page's CSS. */
const STYLE_PROPERTIES = [
  'fill',
  'fill-opacity',
  'stroke',
  'stroke-width',
  'stroke-dasharray',
  'opacity',
  'font-family',
  'font-size',
  'font-weight',
  'font-style',
] as const;

/** A copy of an SVG layer's content with the computed styles written onto each element. */
function inlinedCopy(layer: SVGSVGElement): SVGGElement {
  const copy = layer.cloneNode(true) as SVGSVGElement;
  const live = [...layer.querySelectorAll('*')];
  const copied = [...copy.querySelectorAll('*')];
  live.forEach((element, i) => {
    const target = copied[i];
    if (!(target instanceof SVGElement)) return;
    const style = getComputedStyle(element);
    const text = STYLE_PROPERTIES.map((p) => `${p}:${style.getPropertyValue(p)}`).join(';');
    target.setAttribute('style', text);
    target.removeAttribute('class');
  });
  for (const interactive of copy.querySelectorAll('[data-testid="pick-surface"], circle'))
    interactive.remove();
  const group = document.createElementNS(SVG_NS, 'g');
  group.append(...copy.childNodes);
  return group;
}

/**
 * The scatter chart as a standalone SVG file: the back layer (bands, grid), every point as a vector
 * marker (infeasible ones first, as on screen), and the front layer (axes, titles, front). Built from the
 * live chart's layers and the same screen positions it drew.
 */
export function scatterSvgText(
  layers: { readonly back: SVGSVGElement; readonly front: SVGSVGElement },
  data: ScatterPoints,
  screen: ScreenPositions,
  width: number,
  height: number,
): string {
  const svg = document.createElementNS(SVG_NS, 'svg');
  svg.setAttribute('xmlns', SVG_NS);
  svg.setAttribute('width', String(width));
  svg.setAttribute('height', String(height));
  svg.setAttribute('viewBox', `0 0 ${width} ${height}`);
  const background = document.createElementNS(SVG_NS, 'rect');
  background.setAttribute('width', String(width));
  background.setAttribute('height', String(height));
  background.setAttribute('fill', PLOT_BACKGROUND);
  svg.append(background);
  svg.append(inlinedCopy(layers.back));

  const clip = document.createElementNS(SVG_NS, 'clipPath');
  clip.setAttribute('id', 'plot-area');
  const area = document.createElementNS(SVG_NS, 'rect');
  area.setAttribute('x', String(MARGIN.left));
  area.setAttribute('y', String(MARGIN.top));
  area.setAttribute('width', String(width - MARGIN.left - MARGIN.right));
  area.setAttribute('height', String(height - MARGIN.top - MARGIN.bottom));
  clip.append(area);
  svg.append(clip);
  const points = document.createElementNS(SVG_NS, 'g');
  points.setAttribute('clip-path', 'url(#plot-area)');
  const count = Math.min(data.count, screen.count);
  for (const infeasible of [true, false]) {
    for (let i = 0; i < count; i++) {
      if ((data.infeasible[i] === 1) !== infeasible) continue;
      const px = screen.x[i] ?? Number.NaN;
      const py = screen.y[i] ?? Number.NaN;
      if (!Number.isFinite(px) || !Number.isFinite(py)) continue;
      const marker = document.createElementNS(SVG_NS, 'path');
      marker.setAttribute('d', markerPath(data.shape[i] ?? 0, MARKER_SIZE));
      marker.setAttribute('transform', `translate(${MARGIN.left + px},${MARGIN.top + py})`);
      marker.setAttribute('fill', infeasible ? INFEASIBLE_FILL : data.colourOf(data.series[i] ?? 0));
      marker.setAttribute('fill-opacity', infeasible ? '0.45' : '0.9');
      if (!infeasible) {
        marker.setAttribute('stroke', MARKER_OUTLINE);
        marker.setAttribute('stroke-width', '0.7');
      }
      points.append(marker);
    }
  }
  svg.append(points);
  svg.append(inlinedCopy(layers.front));
  return `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(svg)}\n`;
}

/** Renders SVG text to a PNG at `scale` times its size. */
export async function svgToPng(svgText: string, width: number, height: number, scale = 2): Promise<Blob> {
  const url = URL.createObjectURL(new Blob([svgText], { type: 'image/svg+xml' }));
  try {
    const image = new Image();
    image.src = url;
    await image.decode();
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(width * scale);
    canvas.height = Math.round(height * scale);
    const context = canvas.getContext('2d');
    if (!context) throw new Error('no 2D canvas');
    context.scale(scale, scale);
    context.drawImage(image, 0, 0, width, height);
    return await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error('PNG encoding failed'))), 'image/png'),
    );
  } finally {
    URL.revokeObjectURL(url);
  }
}
