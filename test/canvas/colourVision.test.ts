import {
  differenceCiede2000,
  filterDeficiencyDeuter,
  filterDeficiencyProt,
  filterDeficiencyTrit,
  parse,
  wcagContrast,
  type Color,
} from 'culori';
import { describe, expect, it } from 'vitest';
import { BLOCK_STYLE } from '../../src/canvas/blockStyle';
import { MARKER_OUTLINE, PLOT_BACKGROUND } from '../../src/charts/chartStyle';
import { STRIP_TYPES, type BlockType } from '../../src/model/block';
import { SERIES_COLOURS, SERIES_COLOURS_WITH_CONTRAST } from '../../src/panels/explorer/seriesStyle';

/**
 * Colour-vision deficiencies simulated with the matrices of G. M. Machado, M. M. Oliveira and
 * L. A. F. Fernandes, "A Physiologically-based Model for Simulation of Color Vision Deficiency", IEEE
 * Transactions on Visualization and Computer Graphics 15(6), 2009 (severity 1.0: dichromacy), as the culori
 * library implements them; differences are CIEDE2000 (G. Sharma, W. Wu and E. N. Dalal, "The CIEDE2000
 * color-difference formula: implementation notes, supplementary test data, and mathematical
 * observations", Color Research and Application 30(1), 2005).
 */
const VISION: Record<string, (c: Color) => Color> = {
  'typical vision': (c) => c,
  protanopia: filterDeficiencyProt(1),
  deuteranopia: filterDeficiencyDeuter(1),
  tritanopia: filterDeficiencyTrit(1),
};
const deltaE = differenceCiede2000();

/** Least CIEDE2000 difference over every pair of the colours, as seen with one kind of vision. */
function leastDifference(colours: readonly string[], see: (c: Color) => Color) {
  let least = { delta: Infinity, pair: '' };
  for (let i = 0; i < colours.length; i++) {
    for (let j = i + 1; j < colours.length; j++) {
      const a = parse(colours[i] ?? '');
      const b = parse(colours[j] ?? '');
      if (!a || !b) throw new Error('unparsable colour');
      const delta = deltaE(see(a), see(b));
      if (delta < least.delta) least = { delta, pair: `${colours[i]} / ${colours[j]}` };
    }
  }
  return least;
}

/**
 * Pairs must differ by at least this CIEDE2000 distance under each simulation. About 2.3 is a just
 * noticeable difference; 6 keeps two block types or two series clearly apart at a glance (common
 * practice, no source).
 */
const LEAST_DELTA_E = 6;

/** Block types that look different on the canvas (row and column decoders share their colours on purpose). */
const DISTINCT_TYPES: readonly BlockType[] = ['mat', ...STRIP_TYPES.filter((t) => t !== 'columnDecoder')];

describe('colours under colour-vision deficiencies', () => {
  for (const [vision, see] of Object.entries(VISION)) {
    it(`block fills stay apart under ${vision}`, () => {
      const least = leastDifference(
        DISTINCT_TYPES.map((t) => BLOCK_STYLE[t].fill),
        see,
      );
      expect(least.delta, least.pair).toBeGreaterThanOrEqual(LEAST_DELTA_E);
    });

    it(`block outlines stay apart under ${vision}`, () => {
      const least = leastDifference(
        DISTINCT_TYPES.map((t) => BLOCK_STYLE[t].stroke),
        see,
      );
      expect(least.delta, least.pair).toBeGreaterThanOrEqual(LEAST_DELTA_E);
    });

    it(`sweep series colours stay apart under ${vision}`, () => {
      const least = leastDifference(SERIES_COLOURS, see);
      expect(least.delta, least.pair).toBeGreaterThanOrEqual(LEAST_DELTA_E);
    });
  }

  it('the old series blue and purple, which merged under deuteranopia, would fail the same check', () => {
    // The check can fail: the palette the explorer used before (blue #2f6db5, purple #7a4fb0).
    const deuteranopia = VISION.deuteranopia;
    if (!deuteranopia) throw new Error('no deuteranopia');
    expect(leastDifference(['#2f6db5', '#7a4fb0'], deuteranopia).delta).toBeLessThan(LEAST_DELTA_E);
  });
});

describe('contrast (WCAG 2.1 relative luminance ratio)', () => {
  it('the first series colours reach 3:1 on the plot by themselves (success criterion 1.4.11)', () => {
    for (const colour of SERIES_COLOURS.slice(0, SERIES_COLOURS_WITH_CONTRAST))
      expect(wcagContrast(colour, PLOT_BACKGROUND), colour).toBeGreaterThanOrEqual(3);
  });

  it('the marker outline reaches 3:1 on the plot and against every series colour it rings but black', () => {
    expect(wcagContrast(MARKER_OUTLINE, PLOT_BACKGROUND)).toBeGreaterThanOrEqual(3);
    for (const colour of SERIES_COLOURS.slice(SERIES_COLOURS_WITH_CONTRAST))
      expect(wcagContrast(MARKER_OUTLINE, colour), colour).toBeGreaterThanOrEqual(3);
  });

  it('block labels reach 4.5:1 on their fills (success criterion 1.4.3)', () => {
    for (const style of Object.values(BLOCK_STYLE))
      expect(wcagContrast(style.text, style.fill), style.fill).toBeGreaterThanOrEqual(4.5);
  });
});
