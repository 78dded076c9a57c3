// Types of the bridge-driven (solid-state) burst simulation. SI base units throughout.

export type DriveTopology = 'dual-resonant' | 'single-resonant';
export type BridgeKind = 'full' | 'half';

/** What drives the primary: the bridge, its bus and the interrupter's timing. */
export interface DriveSettingsSI {
  topology: DriveTopology;
  /** full: ±busVoltage across the primary; half: ±busVoltage/2 */
  bridge: BridgeKind;
  /** V */
  busVoltage: number;
  /** s, the interrupter's on-time (burst length) */
  onTime: number;
  /** Hz, bursts per second */
  repetitionRate: number;
  /** A, the switches' pulsed rating; null when not given */
  switchPeakCurrent: number | null;
  /** A, the over-current trip; null when not given */
  currentLimit: number | null;
  /** F, the bus capacitor bank; null when not given */
  busCapacitance: number | null;
  /** primary frequency / secondary frequency (used by tuning, not by the simulation itself) */
  tuningRatio: number;
}

/** lumped circuit at the tap; C1 null for single-resonant (bridge drives the primary turns directly) */
export interface BurstCircuitSI {
  /** H, primary inductance at the tap */
  L1: number;
  /** F, tank capacitance; null for single-resonant */
  C1: number | null;
  /** Ω, primary series resistance (conductor, capacitor ESR, switches) */
  R1: number;
  /** H, secondary effective inductance */
  L2: number;
  /** F, secondary effective capacitance (with topload and streamer allowance) */
  C2: number;
  /** Ω, secondary series resistance */
  R2: number;
  /** H, mutual inductance at the tap */
  M: number;
}

/** decimated to <= 2000 points */
export interface BurstWaveform {
  time: number[];
  primaryCurrent: number[];
  secondaryVoltage: number[];
}

export interface BurstResult {
  /** dual: 1/(2π√(L1 C1)); single: the secondary's frequency 1/(2π√(L2 C2)) */
  primaryFrequency: number;
  /** √(L1/C1), null for single-resonant */
  surgeImpedance: number | null;
  /** |i1| peak up to the end of onTime (the trip is reported in timeToCurrentLimit, not modelled: the burst runs on to onTime) */
  peakPrimaryCurrent: number;
  /** first time |i1| reaches currentLimit ?? switchPeakCurrent; null if not within onTime */
  timeToCurrentLimit: number | null;
  /** |v_C1| peak (null for single-resonant) */
  capacitorPeakVoltage: number | null;
  /** RMS of i1 over a whole repetition period: burst RMS × √(onTime·rate) */
  capacitorRmsCurrent: number | null;
  /** |v_C2| peak over the burst (unloaded upper bound) */
  secondaryPeakVoltage: number;
  /** |i2| peak (the secondary base current; for single-resonant the current the feedback follows) */
  baseCurrentPeak: number;
  /** ∫ v_bridge·i1 dt over the burst, drawn from the bus */
  burstEnergy: number;
  /** burstEnergy × repetitionRate */
  averagePower: number;
  /** onTime × repetitionRate */
  dutyCycle: number;
  /** burstEnergy/(busCapacitance·busVoltage), first order; null without busCapacitance */
  busDroop: number | null;
  /** times at which the bridge changed polarity */
  switchingInstants: number[];
  energyBalance: { drawn: number; stored: number; dissipated: number; relativeError: number };
  waveform: BurstWaveform;
  stepsPerPeriod: number;
}
