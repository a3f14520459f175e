import type { Quantity } from '../../model/units';

/** One input of a formula, in SI units. */
export interface ExplanationInput {
  readonly symbol: string;
  readonly label: string;
  readonly value: number;
  readonly quantity: Quantity;
}

/** How a figure was computed: formula, inputs, result and where the method comes from. */
export interface Explanation {
  readonly title: string;
  readonly symbol: string;
  readonly formula: string;
  readonly inputs: readonly ExplanationInput[];
  readonly value: number;
  readonly quantity: Quantity;
  readonly method: string;
  readonly source: string;
  /** Why the figure does not exist, when its value is NaN (shown "—" with this reason). */
  readonly missingReason?: string;
}

export const input = (
  symbol: string,
  label: string,
  value: number,
  quantity: Quantity,
): ExplanationInput => ({
  symbol,
  label,
  value,
  quantity,
});

/** Sources named by several explanations. */
export const SOURCES = {
  keethBaker: 'B. Keeth, R. J. Baker, DRAM Circuit Design: A Tutorial, IEEE Press, 2001 (from memory)',
  westeHarris: 'N. Weste, D. Harris, CMOS VLSI Design, 4th ed., Addison-Wesley, 2011, §12.3',
  takahashi:
    'T. Takahashi et al., "A Multigigabit DRAM Technology With 6F² Open-Bitline Cell…", IEEE JSSC 36(11), 2001 (efficiency = cell area / total area)',
  pelgrom:
    'M. Pelgrom, A. Duinmaijer, A. Welbers, "Matching Properties of MOS Transistors", IEEE JSSC 24(5), 1989',
  acklam:
    'P. J. Acklam, "An algorithm for computing the inverse normal cumulative distribution function", 2003',
  rabaey:
    'J. Rabaey, A. Chandrakasan, B. Nikolić, Digital Integrated Circuits, 2nd ed., 2003, ch. 4 (from memory)',
  jedec: 'JEDEC JESD79-3 / JESD79-4; Micron DDR3 SDRAM datasheet, refresh table',
  gainCells:
    'P. Meinerzhagen, A. Teman, R. Giterman et al., Gain-Cell Embedded DRAMs for Low-Power VLSI Systems-on-Chip, Springer, 2018 (from memory)',
  arrhenius: 'Arrhenius law; K. Itoh, VLSI Memory Chip Design, Springer, 2001 (from memory)',
  elmore: 'W. C. Elmore, J. Appl. Phys. 19, 1948 (first-moment delay)',
  criticalArea: 'critical-area / kill-ratio yield modelling (Stapper; Maly) (from memory)',
  common: 'common practice (no source)',
} as const;
