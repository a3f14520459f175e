import { repairSettingsOf } from '../../engine';
import type { PlacedMat } from '../../geometry/placedBlocks';
import type { Design } from '../../model/design';
import { pxPerMetre, type Scene } from './scene';

/** Fill of the spare word lines and bit-line pairs (an amber wash, read apart from the teal mat). */
export const SPARE_FILL = 'rgba(214, 137, 16, 0.28)';
export const SPARE_STROKE = '#a8660a';

/** Positions closer than this share a mat-row band (m), as in the yield figures. */
const BAND_GRID = 1e-9;

const HOSTS = new WeakMap<Design, ReadonlySet<string>>();

/**
 * The mats that hold the spare rows of their row-repair domain: every mat when each mat is a domain; in a
 * mat row, its first mat along the word lines; for the whole floorplan, its first mat. The yield figures
 * count a domain's R spare rows once, so they are drawn once.
 */
export function spareHostsOf(design: Design): ReadonlySet<string> {
  const cached = HOSTS.get(design);
  if (cached) return cached;
  const domain = repairSettingsOf(design).repairDomain;
  const hosts = new Set<string>();
  const firstInBand = new Map<string, { id: string; along: number }>();
  for (const b of design.blocks) {
    if (b.type !== 'mat') continue;
    if (domain === 'mat') hosts.add(b.id);
    else if (domain === 'bank') {
      if (hosts.size === 0) hosts.add(b.id);
    } else {
      const vertical = b.bitlineAxis === 'vertical';
      const key = `${vertical ? 'v' : 'h'}${Math.round((vertical ? b.y : b.x) / BAND_GRID)}`;
      const along = vertical ? b.x : b.y;
      const first = firstInBand.get(key);
      if (!first || along < first.along) firstInBand.set(key, { id: b.id, along });
    }
  }
  for (const { id } of firstInBand.values()) hosts.add(id);
  HOSTS.set(design, hosts);
  return hosts;
}

/**
 * Marks the spare lines of a mat at line-level zoom, washed and outlined, with a short tag when there is
 * room: the last R word-line pitches in the mat that hosts its row domain's spare rows, and in every mat
 * the spare columns of the strips at its two bit-line ends (each strip's C spare sense amplifiers reach
 * into the mats on both its sides, so a tiled mat holds 2·C spare columns; the yield figures count them
 * once per strip).
 */
export function paintSpareLines(ctx: CanvasRenderingContext2D, mat: PlacedMat, scene: Scene): void {
  const { spareColumns } = repairSettingsOf(scene.design);
  const spareRows = spareHostsOf(scene.design).has(mat.block.id)
    ? repairSettingsOf(scene.design).spareRows
    : 0;
  if (spareRows === 0 && spareColumns === 0) return;
  const k = pxPerMetre(scene.viewport);
  const ox = scene.viewport.offsetX;
  const oy = scene.viewport.offsetY;
  const r = mat.rect;
  const g = mat.geometry;
  const vertical = mat.block.bitlineAxis === 'vertical';
  const rowBand = Math.min(spareRows, g.wordlineCount) * g.wordlinePitch;
  // A spare column is a bit-line pair: two bit lines in a folded mat, one (plus its partner mat's) when open.
  const linesPerColumn = mat.cell.bitlineArchitecture === 'folded' ? 2 : 1;
  const columnBand = Math.min(2 * spareColumns * linesPerColumn, g.bitlineCount) * g.bitlinePitch;
  // Word lines run across the bit lines: with vertical bit lines the spare rows are a band at the bottom.
  const bands = vertical
    ? [
        { x: r.x, y: r.y + r.height - rowBand, w: r.width, h: rowBand, tag: `${spareRows} spare rows` },
        {
          x: r.x + r.width - columnBand,
          y: r.y,
          w: columnBand,
          h: r.height,
          tag: `2 × ${spareColumns} spare cols (per strip)`,
        },
      ]
    : [
        { x: r.x + r.width - rowBand, y: r.y, w: rowBand, h: r.height, tag: `${spareRows} spare rows` },
        {
          x: r.x,
          y: r.y + r.height - columnBand,
          w: r.width,
          h: columnBand,
          tag: `2 × ${spareColumns} spare cols (per strip)`,
        },
      ];
  ctx.save();
  ctx.fillStyle = SPARE_FILL;
  ctx.strokeStyle = SPARE_STROKE;
  ctx.lineWidth = 1.5;
  ctx.font = '11px system-ui, sans-serif';
  ctx.textBaseline = 'bottom';
  for (const b of bands) {
    if (!(b.w > 0) || !(b.h > 0)) continue;
    const x = b.x * k + ox;
    const y = b.y * k + oy;
    ctx.fillRect(x, y, b.w * k, b.h * k);
    ctx.strokeRect(x, y, b.w * k, b.h * k);
    ctx.fillStyle = SPARE_STROKE;
    if (b.w * k > 60) ctx.fillText(b.tag, x + 3, y - 2);
    ctx.fillStyle = SPARE_FILL;
  }
  ctx.restore();
}
