/** Shapes shared by the sweep parsers and the resonance finder. Frequencies in Hz. */

export type FrequencyUnit = 'Hz' | 'kHz' | 'MHz' | 'GHz';
export type DataFormat = 'RI' | 'MA' | 'DB';
export type ParameterType = 'S' | 'Y' | 'Z' | 'G' | 'H';

export interface Complex {
  re: number;
  im: number;
}

export interface TouchstoneData {
  ports: 1 | 2;
  frequencyUnit: FrequencyUnit;
  parameter: ParameterType;
  format: DataFormat;
  /** reference impedance in ohms (the `R` of the option line; 50 by default) */
  reference: number;
  /** frequency of each row, Hz, strictly increasing */
  frequency: number[];
  /**
   * network data per row in matrix order: [P11] for one port; [P11, P21, P12, P22] for two ports
   * whatever order the file used.
   */
  data: Complex[][];
}

/** One trace: amplitude against frequency, amplitude as a linear magnitude (not dB). */
export interface Sweep {
  frequency: number[];
  magnitude: number[];
  /** what the trace is, e.g. "S21" or "amplitude" */
  label: string;
  /** true when the magnitudes are of a passive S-parameter, so 1 is the natural reference */
  passive: boolean;
}

/** A parse failure, with the 1-based line it was found on (0 when the file as a whole is at fault). */
export interface SweepParseError {
  line: number;
  message: string;
}

export type ParseResult<T> = { ok: true; value: T } | { ok: false; error: SweepParseError };

export function fail<T>(line: number, message: string): ParseResult<T> {
  return { ok: false, error: { line, message: line > 0 ? `Line ${line}: ${message}` : message } };
}
