import type { DesignIssue, DesignSI, Result, SweepSeriesName } from '../solver';

/** A goal the builder fixes; the solver's inverse functions find the input that meets it. */
export type Goal =
  | { kind: 'frequency'; hz: number }
  | { kind: 'tap'; turns: number }
  | { kind: 'coupling'; k: number }
  /** solid-state: the on-time for a target peak primary current, A */
  | { kind: 'onTime'; peak: number }
  /** solid-state: the tank capacitance for a target peak primary current at the design's on-time, A */
  | { kind: 'tankForCurrent'; peak: number }
  /** dual-resonant: the tap for a primary to secondary frequency ratio */
  | { kind: 'tapRatio'; ratio: number };

export type GoalAnswer =
  | { kind: 'frequency'; turns: number; windingLength: number }
  | { kind: 'tap'; capacitance: number }
  | { kind: 'coupling'; elevation: number }
  | { kind: 'onTime'; onTime: number }
  | { kind: 'tankForCurrent'; capacitance: number; surgeImpedance: number }
  | { kind: 'tapRatio'; tapTurns: number };

export interface SweepRequest {
  path: string;
  from: number;
  to: number;
  points: number;
  series: SweepSeriesName[];
}

export interface SweepData {
  path: string;
  rows: Array<Record<string, number | null>>;
  series: SweepSeriesName[];
  /** indexes of the rows whose design the form's own checks refuse (not buildable) */
  invalid?: number[];
  /** the first refused point's reason, naming the field by its label */
  invalidReason?: string | null;
}

export interface TuningCurve {
  rows: Array<{ tap: number; primaryFrequency: number | null }>;
  secondaryFrequency: number;
  /** with the streamer allowance */
  targetFrequency: number;
  /** what the tap aims at: targetFrequency, times the tuning ratio of a dual-resonant bridge coil */
  primaryTargetFrequency?: number;
  tapTurns: number | null;
  tapLow: number | null;
  tapHigh: number | null;
}

export interface CouplingCurve {
  rows: Array<{ elevation: number; k: number | null }>;
  elevation: number;
  k: number;
  targetK: number | null;
}

export interface ExchangeCurve {
  rows: Array<{ t: number; primary: number; secondary: number }>;
  firstPrimaryMinimum: number | null;
  residualPrimaryEnergy: number | null;
  k: number;
}

export interface BurstCurve {
  /** the burst as simulated: time, primary current, secondary top voltage */
  rows: Array<{ t: number; current: number; voltage: number }>;
  /** the peak primary current reached by each on-time up to the design's: the running peak of |current| */
  peaks: Array<{ onTime: number; peak: number }>;
  onTime: number;
  peakPrimaryCurrent: number;
  currentLimit: number | null;
  switchPeakCurrent: number | null;
  timeToCurrentLimit: number | null;
  topology: 'dual-resonant' | 'single-resonant';
}

export type SolverRequest =
  | { type: 'solve'; input: unknown }
  | { type: 'sweep'; input: unknown; sweep: SweepRequest }
  | { type: 'charts'; input: unknown }
  | { type: 'goal'; input: unknown; goal: Goal };

export interface Solved {
  design: DesignSI;
  result: Result;
  ms: number;
}

export interface ChartsData {
  tuning: TuningCurve | null;
  coupling: CouplingCurve | null;
  exchange: ExchangeCurve | null;
  /** solid-state supplies: the burst and the peak current against on-time */
  burst: BurstCurve | null;
}

export type SolverReply =
  | { type: 'solve'; data: Solved }
  | { type: 'sweep'; data: SweepData }
  | { type: 'charts'; data: ChartsData }
  | { type: 'goal'; data: GoalAnswer | null };

export type SolverMessage = { id: number; request: SolverRequest };

export type SolverResponse =
  | { id: number; ok: true; reply: SolverReply }
  | { id: number; ok: false; issues: DesignIssue[]; message?: string; failed?: undefined }
  /** the computation itself broke (a thrown error, or the worker stopped): not the input's fault, worth a retry */
  | { id: number; ok: false; issues: []; message: string; failed: true };

/** What a person reads when the computation broke rather than the input being wrong. */
export const SOLVER_FAILED_MESSAGE = 'The computation stopped unexpectedly.';
