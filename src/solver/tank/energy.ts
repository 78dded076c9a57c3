/**
 * Energy stored in a capacitor, E = ½ C V².
 * Example: 20 nF at 16.97 kV (12 kV RMS peak) → 2.88 J.
 */
export function capacitorEnergy(capacitance: number, voltage: number): number {
  return 0.5 * capacitance * voltage * voltage;
}

/**
 * Power through a spark gap that fires `breakRate` times a second, each time dumping `energyPerBang`:
 * P = ½ · BPS · C · V² (R. Burnett, "Rotary spark gaps", richieburnett.co.uk/rotary.html; common practice). Example: 2.88 J at 120 BPS → 346 W.
 */
export function powerAtBreakRate(energyPerBang: number, breakRate: number): number {
  return energyPerBang * breakRate;
}
