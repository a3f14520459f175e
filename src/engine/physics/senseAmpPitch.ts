import type { BitlineArchitecture } from '../../model/cell';

/**
 * Width along the strip available to one sense amplifier (m). A folded pair spans two bit-line
 * pitches, an open or single-ended amplifier one; with strips at both ends the amplifiers alternate
 * between them, doubling the room:
 *   budget = pitch × (folded ? 2 : 1) × (both ends ? 2 : 1).
 * Source: interleaved sense-amplifier layout, B. Keeth, R. J. Baker, DRAM Circuit Design: A Tutorial,
 * IEEE Press, 2001, ch. 2 (from memory).
 */
export function senseAmpPitchBudget(
  bitlinePitch: number,
  architecture: BitlineArchitecture,
  singleEnded: boolean,
  senseAmpEnds: number,
): number {
  const pitches = architecture === 'folded' && !singleEnded ? 2 : 1;
  return bitlinePitch * pitches * (senseAmpEnds >= 2 ? 2 : 1);
}
