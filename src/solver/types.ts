/**
 * Shapes of the solver's input (a design resolved into SI base units) and of its result.
 * Every length is in metres, capacitance in farads, inductance in henries, frequency in hertz,
 * voltage in volts, current in amperes, time in seconds, angle in radians, energy in joules.
 */

export type InsulationBuild = 'bare' | 'single' | 'heavy';
export type PrimaryShape = 'flat' | 'helical' | 'conical';

export interface WireSI {
  /** bare copper diameter */
  diameter: number;
  /** outside diameter over the enamel: the winding pitch when close-wound */
  insulatedDiameter: number;
  /** gauge when the wire was given by AWG, otherwise null */
  awg: number | null;
  insulation: InsulationBuild | null;
}

export interface SecondarySI {
  formDiameter: number;
  turns: number;
  wire: WireSI;
  /** null: close-wound, turns × insulated diameter */
  windingLength: number | null;
  /** bottom of the winding above the primary reference plane */
  elevation: number;
  /** the coil form's dielectric; absent or null: the default thin PVC pipe (field/former.ts) */
  former?: FormerSI | null;
}

export type FormerMaterial = 'air' | 'pvc' | 'acrylic' | 'polyethylene' | 'polystyrene' | 'cardboard';

export interface FormerSI {
  /** the named material, or null when only a permittivity was given */
  material: FormerMaterial | null;
  /** relative permittivity of the form's wall */
  permittivity: number;
  /** wall thickness; equal to the form radius for a solid rod */
  wallThickness: number;
  /** true when the design named no former and the default was taken */
  assumed: boolean;
}

/** A grounded ring around the primary that catches strikes. */
export interface StrikeRailSI {
  /** centre-line diameter of the ring */
  diameter: number;
  /** height of the ring's centre above the primary reference plane */
  height: number;
  conductorDiameter: number;
}

export interface ToroidSI {
  shape: 'toroid';
  /** overall outside diameter */
  majorDiameter: number;
  /** tube (cross-section) diameter */
  minorDiameter: number;
  /** centre of the topload above the top of the winding */
  elevation: number;
}

export interface SphereSI {
  shape: 'sphere';
  diameter: number;
  elevation: number;
}

export type ToploadSI = ToroidSI | SphereSI;

export interface PrimarySI {
  shape: PrimaryShape;
  /** centre-line diameter of the innermost turn */
  innerDiameter: number;
  /** may be fractional */
  turns: number;
  conductorDiameter: number;
  /** gap between neighbouring conductor surfaces */
  spacing: number;
  /** conical only: rise above horizontal; null for flat and helical */
  angle: number | null;
  /** height of the innermost turn above the primary reference plane */
  elevation: number;
}

export interface TankSingleSI {
  kind: 'single';
  capacitance: number;
}

export interface TankBankSI {
  kind: 'bank';
  unitCapacitance: number;
  unitVoltage: number;
  series: number;
  parallel: number;
  /** each capacitor's RMS current rating; null when not given */
  unitRmsCurrent?: number | null;
}

export type TankSI = TankSingleSI | TankBankSI;

export interface TransformerSupplySI {
  kind: 'transformer';
  /** RMS output voltage */
  voltage: number;
  /** RMS short-circuit (rated) output current */
  current: number;
  lineFrequency: number;
  /** gap firings per second; null when not given */
  breakRate: number | null;
}

export type DriveTopologySI = 'dual-resonant' | 'single-resonant';
export type BridgeKindSI = 'full' | 'half';

export interface SolidStateSupplySI {
  kind: 'solid-state';
  busVoltage: number;
  topology: DriveTopologySI;
  bridge: BridgeKindSI;
  /** interrupter on-time: length of each burst */
  onTime: number;
  /** bursts per second */
  repetitionRate: number;
  /** the switches' pulsed current rating; null when not given */
  switchPeakCurrent: number | null;
  /** over-current trip; null when not given */
  currentLimit: number | null;
  busCapacitance: number | null;
  /** primary frequency over the secondary's loaded frequency */
  tuningRatio: number;
  /** fields the design left out that took their stated defaults, by name (e.g. "onTime") */
  defaulted: string[];
}

export type SupplySI = TransformerSupplySI | SolidStateSupplySI;

export interface TuningSI {
  /** allowance added to the topload for streamers; 0 when not given */
  streamerCapacitance: number;
  /** expected streamer length, when the allowance was derived from it */
  streamerLength: number | null;
  targetCoupling: number | null;
}

export interface DesignSI {
  secondary: SecondarySI;
  /** height of the primary reference plane above the ground plane */
  groundClearance: number;
  topload: ToploadSI | null;
  /** absent or null: no strike rail */
  strikeRail?: StrikeRailSI | null;
  primary: PrimarySI | null;
  tank: TankSI | null;
  supply: SupplySI | null;
  tuning: TuningSI;
}

/** A problem with a design that makes it impossible to build or to compute. */
export interface DesignIssue {
  path: string;
  message: string;
}

export interface SolverWarning {
  code: string;
  path: string;
  message: string;
}

export interface SecondaryResult {
  inductance: number;
  /** Medhurst's table (his coils on solid rods), for comparison and the lumped estimate */
  selfCapacitance: number;
  /** the winding without topload by the field model (same surroundings) */
  resonantFrequency: number;
  wireLength: number;
  windingLength: number;
  aspectRatio: number;
  dcResistance: number;
  wireMass: number;
  windingDiameter: number;
  pitch: number;
  /** current-sheet value before the round-wire corrections */
  inductanceSheet: number;
  /** Wheeler 1928 (SI form), for comparison */
  inductanceWheeler: number;
  /** Medhurst's table covers this aspect ratio */
  selfCapacitanceInRange: boolean;
  /** skin-effect resistance of the straight wire at the loaded frequency (no proximity factor) */
  acResistance: number | null;
  /** ωL/R_ac at the loaded frequency: an upper bound, since proximity and dielectric losses are left out */
  q: number | null;
}

export interface ToploadResult {
  capacitance: number;
  centreHeightAboveGround: number;
  /** the trade's empirical toroid formula (isolated, common practice), for comparison; null for a sphere */
  empirical: number | null;
}

export interface SystemResult {
  /** first mode of the field model (secondary, topload, ground, grounded primary and strike rail solved together) */
  resonantFrequency: number;
  /** Medhurst self-capacitance + topload computed alone, with the secondary's inductance: the older lumped estimate */
  lumpedResonantFrequency: number;
  quarterWaveFrequency: number;
  /** self-capacitance + topload, the lumped model's total */
  totalCapacitance: number;
  /** the lumped pair at the top that resonates at resonantFrequency with the same stored energy at a top voltage */
  effectiveInductance: number;
  effectiveCapacitance: number;
  /** first three mode frequencies of the distributed model, Hz */
  modes: number[];
  /** first mode along the winding, heights above the primary reference plane, top voltage = 1 */
  voltageProfile: Array<{ height: number; voltage: number }>;
  /** first-mode current along the winding at the section mid-heights, largest = 1 */
  currentProfile: Array<{ height: number; current: number }>;
  /** the field model's capacitances for a linear voltage profile (0 at the base, 1 at the top) */
  fieldCapacitance: FieldCapacitanceResult;
  /** the former taken for the field model (assumed: true when the design named none) */
  former: FormerSI;
  model: string;
}

export interface FieldCapacitanceResult {
  /** the whole structure: winding with a linear profile and the topload at the top voltage */
  structure: number;
  /** the winding alone, same profile and surroundings, no topload */
  coilAlone: number;
  /** the topload alone in the same surroundings (ground, primary, strike rail), no winding */
  toploadAlone: number;
  /** structure − coilAlone − toploadAlone: negative when the coil and topload shield each other */
  interaction: number;
}

export interface PrimaryResult {
  inductance: number;
  conductorLength: number;
  outerDiameter: number;
  /** null when no tap was found */
  inductanceAtTap: number | null;
  conductorLengthAtTap: number | null;
}

export interface CouplingResult {
  mutualInductance: number;
  k: number;
  /** k with only the turns up to the tap in circuit */
  kAtTap: number | null;
  mutualInductanceAtTap: number | null;
  /** secondary elevation that gives tuning.targetCoupling with all turns; null when not asked or unreachable */
  elevationForTargetCoupling: number | null;
}

export interface TuningResult {
  targetFrequency: number;
  tapTurns: number | null;
  inRange: boolean;
  streamerCapacitance: number;
  /** primary + tank frequency with every turn in circuit */
  primaryFrequencyAllTurns: number;
  /** inductance the primary needs at the tap */
  requiredInductance: number;
  /** what the tap tunes primary + tank to: targetFrequency, times the tuning ratio for a dual-resonant bridge coil */
  primaryTargetFrequency: number;
}

export interface BleederResult {
  /** suggested resistance across each capacitor */
  resistancePerUnit: number;
  count: number;
  /** dissipation in each resistor at the supply peak */
  powerPerUnit: number;
  /** R·C of each unit: the bank falls to about 1 % after 4.6 of these */
  timeConstant: number;
}

export interface TankResult {
  capacitance: number;
  voltageRating: number | null;
  energyAtSupplyPeak: number | null;
  unitVoltage: number | null;
  units: number | null;
  /** share of the supply peak across each capacitor of a string */
  perUnitVoltage: number | null;
  /** voltage rating over supply peak */
  ratingMargin: number | null;
  bleeder: BleederResult | null;
  caution: string;
}

export interface SupplyResult {
  resonantCapacitance: number | null;
  kind: 'transformer' | 'solid-state';
  peakVoltage: number;
  /** V/I of a current-limited transformer */
  impedance: number | null;
  ratedPower: number | null;
  /** 1/(4 f Z): charges to full peak in a quarter-cycle */
  ltrCapacitance: number | null;
  /** tank capacitance over the resonant value */
  tankToResonantRatio: number | null;
  breakRate: number | null;
  energyPerBang: number | null;
  powerAtBreakRate: number | null;
  /** Freau's rule of thumb, transformer supplies only */
  sparkLengthEstimate: number | null;
  /** the input power the spark-length rule was fed */
  sparkLengthPower: number | null;
  sparkLengthNote: string | null;
  caution: string;
}

export interface ResponseResult {
  f0: number;
  k: number;
  fLow: number;
  fHigh: number;
  /** first null of the primary envelope, 1/(2(fHigh − fLow)) */
  transferTime: number;
  /** first minimum of primary energy found by integrating the lossless pair */
  firstPrimaryMinimum: number | null;
  /** primary energy left at that minimum, as a fraction of the initial energy */
  residualPrimaryEnergy: number | null;
  halfCyclesToTransfer: number;
}

export interface UncertaintyContribution {
  source: string;
  description: string;
  /** relative change of the loaded frequency at each end of the source's range (low ≤ 0 ≤ high) */
  relLow: number;
  relHigh: number;
}

export interface UncertaintyResult {
  loadedFrequency: {
    nominal: number;
    low: number;
    high: number;
    contributions: UncertaintyContribution[];
  };
  /** tap positions for the ends of the frequency band and the primary model's spread; null without a tap */
  tapTurns: { low: number | null; high: number | null } | null;
  method: string;
}

/** The capacitor bank checked against the burst: each capacitor's share of the peak voltage and of the RMS current. */
export interface DriveBankResult {
  /** peak voltage across each capacitor of a string (the tank's peak over the capacitors in series) */
  unitPeakVoltage: number;
  /** DC rating of each capacitor */
  unitVoltage: number;
  /** unit rating over the unit's peak voltage; below 1 the rating is exceeded */
  voltageMargin: number;
  /** RMS current each string (and so each capacitor in it) carries: the tank's over the strings in parallel */
  stringRmsCurrent: number;
  /** each capacitor's RMS current rating; null when not given */
  unitRmsCurrent: number | null;
  /** rating over the string's RMS current; null without a rating */
  currentMargin: number | null;
  /** peak current through each string */
  stringPeakCurrent: number;
  series: number;
  parallel: number;
}

/** A bridge-driven (solid-state) supply simulated through one burst. */
export interface DriveResult {
  topology: DriveTopologySI;
  bridge: BridgeKindSI;
  busVoltage: number;
  onTime: number;
  repetitionRate: number;
  currentLimit: number | null;
  switchPeakCurrent: number | null;
  /** √(L/C) of the primary at the tap with the tank; null without a tank (single-resonant) */
  surgeImpedance: number | null;
  /** frequency of primary + tank at the tap (dual-resonant) or the drive frequency (single-resonant) */
  primaryFrequency: number;
  /** primaryFrequency over the tuning target (the secondary with its streamer allowance) */
  frequencyRatio: number | null;
  /** largest primary current up to the end of the on-time (the burst is simulated to the on-time even past a trip) */
  peakPrimaryCurrent: number;
  /** when the current limit (or the switches' rating) is reached; null if not within the on-time */
  timeToCurrentLimit: number | null;
  /** which of the two set timeToCurrentLimit */
  limitBy: 'currentLimit' | 'switchPeakCurrent' | null;
  /** peak voltage across the whole tank; null without a tank */
  capacitorPeakVoltage: number | null;
  /** RMS current through the whole tank at the repetition rate; null without a tank */
  capacitorRmsCurrent: number | null;
  /** ½ C V² at capacitorPeakVoltage */
  capacitorPeakEnergy: number | null;
  /** top voltage of the unloaded secondary: an upper bound, without streamer loss */
  secondaryPeakVoltage: number;
  baseCurrentPeak: number;
  burstEnergy: number;
  averagePower: number;
  dutyCycle: number;
  /** fall of the bus voltage over one burst; null without a bus capacitance */
  busDroop: number | null;
  /** ½ Cbus Vbus² held by the bus capacitors; null without a bus capacitance */
  busEnergy: number | null;
  bank: DriveBankResult | null;
  /** integration steps per period of the primary */
  stepsPerPeriod: number;
  /** the circuit the burst was simulated on */
  circuit: { L1: number; C1: number | null; R1: number; L2: number; C2: number; R2: number; M: number };
  waveform: { time: number[]; primaryCurrent: number[]; secondaryVoltage: number[] };
  caution: string;
}

export interface Result {
  secondary: SecondaryResult | null;
  topload: ToploadResult | null;
  system: SystemResult | null;
  primary: PrimaryResult | null;
  coupling: CouplingResult | null;
  tuning: TuningResult | null;
  tank: TankResult | null;
  supply: SupplyResult | null;
  response: ResponseResult | null;
  uncertainty: UncertaintyResult | null;
  /** solid-state supplies only; null for a transformer */
  drive: DriveResult | null;
  warnings: SolverWarning[];
}
