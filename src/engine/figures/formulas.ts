/**
 * Formula texts that several figures show (a mat's figure, the design's worst case, a bank's comparison
 * figure), written once so that the three explanations cannot drift apart.
 */
export const FORMULAS = {
  wordlineDelay:
    'v_far(t_wl) = V_high/2: exact step response of a distributed line (R_wl, C_wl) driven through R_drv (0.38·R_wl·C_wl alone, 0.69·R_drv·C_wl lumped)',
  retention: 't_ret = Cs · ΔV_allowed / I(T)',
  leakageAtTemperature: 'I(T) = I_ref·exp(−Ea/k·(1/T − 1/T_ref))',
  energyPerBit: 'E_bit = E_act / M',
  areaPerBit: 'A_bit = A_total / usable bits',
  areaPerBitInF2: 'A_bit / F²',
  arrayEfficiency: 'η = A_cells / A_total',
  refreshBusyFraction: 'busy = tRFC / tREFI',
  refreshPower: 'P_ref = Σ (E_act × word lines) / tREFW',
} as const;
