import type { SolverWarning } from './types';

/**
 * Stable warning codes with the source of each threshold. Codes are lower_snake and never change
 * meaning; messages are plain words for the builder and may be reworded.
 */
export const WARNING_CODES = {
  aspect_ratio_low: 'winding length : winding diameter below 2.5 : 1 (typical range 2.5–5 : 1, Rzeszotarski, TCML 1997)',
  aspect_ratio_high: 'winding length : winding diameter above 5 : 1 (typical range 2.5–5 : 1, Rzeszotarski, TCML 1997)',
  medhurst_out_of_range: "aspect ratio outside Medhurst's table (1947), self-capacitance extrapolated",
  space_wound: 'pitch well above the insulated diameter: current-sheet formulas less accurate',
  coupling_high_for_spark_gap: 'k above 0.2 with a spark-gap supply (typical 0.05–0.2, Stefan’s tech notes, hotstreamer.deanostoybox.com/stk/tc/TECH4.HTM)',
  coupling_low_for_spark_gap: 'k below 0.05 with a spark-gap supply (typical 0.05–0.2, Stefan’s tech notes, hotstreamer.deanostoybox.com/stk/tc/TECH4.HTM)',
  coupling_high_for_solid_state: 'k above 0.3 with a solid-state supply (≈0.15–0.3, from memory)',
  tap_out_of_range: 'the primary cannot reach the target frequency with this tank capacitance',
  target_coupling_unreachable: 'no secondary elevation gives the requested coupling',
  bank_rating_below_peak: 'tank voltage rating below the supply peak',
  bank_rating_low: 'tank voltage rating below 2 × supply peak (common practice)',
  tank_near_resonant: 'tank capacitance within 15 % of the transformer-resonant value',
  large_stored_energy: 'tank stores more than 1 J at the supply peak',
  topload_smaller_than_form: 'topload narrower than the secondary winding',
  primary_inside_form: "primary's inner turn inside the secondary's diameter",
  frequency_high_for_solid_state: 'loaded frequency above 500 kHz with a solid-state supply (usual range 35–500 kHz)',
  break_rate_assumed: 'no break rate given: twice the line frequency assumed',
  value_not_finite: 'a computed value was not finite and was left out',
  q_below_one: "the secondary's Q is below 1: it does not resonate, coupled results are withheld",
  computation_failed: 'a part of the result could not be computed',
  drive_defaults_assumed: 'a solid-state supply left out drive fields: the stated defaults (common practice) were taken',
  bank_unit_voltage_exceeded: "a capacitor's share of the tank's peak voltage in the burst is above its rating",
  bank_unit_current_exceeded: "a string's RMS current at the repetition rate is above the capacitors' RMS current rating",
  tank_rating_unknown: 'a solid-state tank given only as a capacitance: its peak voltage and RMS current cannot be checked',
  bus_droop_high: 'the bus falls by more than 10 % over one burst (common practice)',
  primary_above_secondary: 'a dual-resonant primary tuned above the secondary (usually 0.85–0.95 ×, common practice)',
} as const;

export type WarningCode = keyof typeof WARNING_CODES;

export function warning(code: WarningCode, path: string, message: string): SolverWarning {
  return { code, path, message };
}
