const METRES_PER_FOOT = 0.3048;

/**
 * Streamer capacitance per foot of streamer: about 1 pF/ft (T. Fritz, Tesla Coil Mailing List, May 2002,
 * pupman.com archive; common practice, single source). Competing figures run from 0.8 pF/ft (T. Fritz,
 * Tesla Coil Mailing List, July 2005, later field model) to about 1.9 pF/ft (*Spark Discharge*, CRC Press,
 * as quoted on the Tesla Coil Mailing List, July 2005), so the allowance is rough.
 */
export const STREAMER_CAPACITANCE_PER_FOOT = 1e-12;
export const STREAMER_CAPACITANCE_PER_FOOT_RANGE = { low: 0.8e-12, high: 2e-12 } as const;

/**
 * Capacitance allowance for streamers of the given length (m), at `perFoot` farads per foot.
 * Example: 0.762 m (2.5 ft) → 2.5 pF.
 */
export function streamerCapacitanceForLength(length: number, perFoot: number = STREAMER_CAPACITANCE_PER_FOOT): number {
  return (length / METRES_PER_FOOT) * perFoot;
}
