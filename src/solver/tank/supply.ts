/** Peak of a sinusoidal RMS voltage, √2 · V. */
export function peakVoltageRms(voltageRms: number): number {
  return Math.SQRT2 * voltageRms;
}

/**
 * Output impedance of a current-limited (magnetic-shunt) transformer, Z = V/I from its
 * open-circuit voltage and short-circuit current. Example: 12 kV / 30 mA → 400 kΩ.
 */
export function transformerImpedance(voltageRms: number, currentRms: number): number {
  return voltageRms / currentRms;
}

/**
 * Capacitance that resonates with a current-limited transformer's leakage inductance at the line
 * frequency: C = 1/(2π f Z) = I/(2π f V).
 * Source: P. Lawrence, Tesla Coil Mailing List, June 2003 (pupman.com archive): 6 kV / 30 mA → 13.3 nF
 * at 60 Hz; the formula itself is common practice.
 * Example: 12 kV / 30 mA at 60 Hz → 6.63 nF.
 */
export function resonantCapacitanceTransformer(voltageRms: number, currentRms: number, lineFrequency: number): number {
  return 1 / (2 * Math.PI * lineFrequency * transformerImpedance(voltageRms, currentRms));
}

/**
 * "Larger than resonant" capacitance, the capacitor that charges to full peak in a quarter cycle at
 * rated current: C = 1/(4 f Z), π/2 ≈ 1.571 × the resonant value.
 * Source: B. McGuyer, "Note 1: LTR", bartmcguyer.com/notes/note-1-LTR.html (common practice). Example: 12 kV / 30 mA at 60 Hz → 10.4 nF.
 */
export function ltrCapacitanceTransformer(voltageRms: number, currentRms: number, lineFrequency: number): number {
  return 1 / (4 * lineFrequency * transformerImpedance(voltageRms, currentRms));
}
