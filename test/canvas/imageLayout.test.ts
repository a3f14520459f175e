import { describe, expect, it } from 'vitest';
import { imageLayout, scaleBar, SIDE_PANEL_WIDTH } from '../../src/canvas/imageLayout';

describe('PNG layout', () => {
  it('puts the legend and scale bar in a panel beside the floorplan, never on it', () => {
    const layout = imageLayout(1200);
    expect(layout.panelX).toBeGreaterThanOrEqual(layout.floorplanWidth);
    expect(layout.width).toBe(1200 + SIDE_PANEL_WIDTH);
  });

  it('the scale bar is the longest 1, 2 or 5 × 10ⁿ length within 160 px (arithmetic)', () => {
    // 4 px/µm: 160 px is 40 µm, so 20 µm (80 px).
    expect(scaleBar(4e6).length).toBeCloseTo(20e-6, 15);
    expect(scaleBar(4e6).pixels).toBeCloseTo(80, 9);
    // 1 px/µm: 160 µm → 100 µm.
    expect(scaleBar(1e6).length).toBeCloseTo(100e-6, 15);
    // 0.001 px/µm: 160 mm → 100 mm.
    expect(scaleBar(1e3).length).toBeCloseTo(0.1, 12);
    for (const ppm of [3.7e5, 1e7, 2.2e8]) {
      const bar = scaleBar(ppm);
      expect(bar.pixels).toBeLessThanOrEqual(160);
      expect(bar.pixels).toBeGreaterThan(160 / 2.5);
    }
  });
});
