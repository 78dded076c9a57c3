/**
 * Capacitance of a series-parallel bank of equal capacitors (an MMC): `parallel` strings of `series`
 * units each. C = C_unit · parallel / series.
 * Source: hvtesla.com/mmc.html MMC notes (common practice); circuit theory for capacitors in series and parallel.
 * Example: 150 nF units, 10 in series, 2 strings → 30 nF.
 */
export function bankCapacitance(unitCapacitance: number, series: number, parallel: number): number {
  return (unitCapacitance * parallel) / series;
}

/**
 * DC voltage rating of a string: unit rating × units in series, assuming equal sharing (which the
 * bleeders enforce at DC). Example: 2 kV units, 10 in series → 20 kV.
 */
export function bankVoltageRating(unitVoltage: number, series: number): number {
  return unitVoltage * series;
}

/** Share of a voltage across each unit of a string of equal capacitors. */
export function perUnitVoltage(voltage: number, series: number): number {
  return voltage / series;
}
