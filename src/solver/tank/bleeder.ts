/**
 * Bleeder suggested across each capacitor of a bank: about 10 MΩ, ½ W per unit
 * (T. Fritz, Tesla Coil Mailing List, February 2000,
 * pupman.com archive; common practice). Bleeders can open: short each capacitor by
 * hand before touching.
 */
export const BLEEDER_RESISTANCE_PER_UNIT = 10e6;

/** Power a resistor dissipates with a DC voltage across it, V²/R. Example: 1.7 kV across 10 MΩ → 0.29 W. */
export function resistorPower(voltage: number, resistance: number): number {
  return (voltage * voltage) / resistance;
}

/** R·C time constant: the voltage falls to 1/e in one, to about 1 % in 4.6. */
export function dischargeTimeConstant(resistance: number, capacitance: number): number {
  return resistance * capacitance;
}
