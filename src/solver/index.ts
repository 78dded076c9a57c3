// The solver's only public entry. Everything is in SI base units.

export type * from './types';

export { solve, LUMPED_MODEL_NOTE } from './solve';
export { sweep, sweepablePaths, SWEEP_SERIES, DEFAULT_SWEEP_SERIES, type SweepResult, type SweepSeriesName } from './sweep';
export {
  turnsForFrequency,
  windingLengthForFrequency,
  tankCapacitanceForTap,
  elevationForCoupling,
  loadedFrequency,
} from './inverse';
export { evaluateUncertainty, UNCERTAINTY_SOURCES } from './uncertainty';
export { WARNING_CODES, type WarningCode } from './warnings';
export { checkDesign } from './system/checks';
export {
  windingDiameter,
  windingLength,
  closeWoundLength,
  toploadCentreHeight,
  secondarySheet,
} from './system/geometry';
export {
  ASPECT_RATIO_TYPICAL,
  COUPLING_SPARK_GAP_TYPICAL,
  COUPLING_SOLID_STATE_HIGH,
  BANK_RATING_FACTOR,
  STORED_ENERGY_WARNING,
} from './system/design-warnings';

export { MU_0, EPSILON_0, C_0, COPPER_RESISTIVITY_20C, COPPER_TEMP_COEFF_20C, COPPER_DENSITY } from './constants';
export { ellipKE } from './math/ellip';

export { awgDiameter, awgFromDiameter, AWG_MIN, AWG_MAX } from './wire/awg';
export { insulatedDiameter, insulatedDiameterAwg, INSULATION_SOURCE, FILM_BUILD_TABLE } from './wire/insulation';
export { copperResistance, skinDepth, acResistanceRoundWire } from './wire/resistance';
export { copperMass } from './wire/mass';
export { helixWireLength } from './wire/length';

export {
  inductanceSolenoidLorenz,
  nagaokaCoefficient,
  rosaCorrection,
  inductanceSolenoidRoundWire,
  inductanceSolenoidWheeler1928,
  inductanceSolenoidWheeler1982,
} from './secondary/inductance';
export { selfCapacitanceMedhurst, selfCapacitanceKnight, MEDHURST_ACCURACY, MEDHURST_TABLE } from './secondary/capacitance';
export { resonantFrequencyLC, quarterWaveFrequency, qualityFactor } from './secondary/resonance';

export { toploadCapacitance, capacitanceAxisymmetricBEM } from './topload/bem';
export { capacitanceSphere, capacitanceSphereOverPlane } from './topload/sphere';
export { capacitanceTorusIsolated, capacitanceToroidEmpirical } from './topload/torus';

export { primaryRings, primaryRingsAtTap, primaryConductorLength, primaryOuterDiameter } from './primary/geometry';
export { inductancePrimary, mutualInductanceLoops, inductanceLoopRoundWire } from './primary/inductance';
export { mutualPrimarySecondary, couplingCoefficient } from './coupling/mutual';

export {
  streamerCapacitanceForLength,
  STREAMER_CAPACITANCE_PER_FOOT,
  STREAMER_CAPACITANCE_PER_FOOT_RANGE,
} from './tuning/streamer';
export { solveTap, inductanceForResonance, capacitanceForResonance, type TapSolution } from './tuning/tap';

export { bankCapacitance, bankVoltageRating, perUnitVoltage } from './tank/bank';
export { capacitorEnergy, powerAtBreakRate } from './tank/energy';
export {
  peakVoltageRms,
  transformerImpedance,
  resonantCapacitanceTransformer,
  ltrCapacitanceTransformer,
} from './tank/supply';
export { BLEEDER_RESISTANCE_PER_UNIT, resistorPower, dischargeTimeConstant } from './tank/bleeder';
export { sparkLengthFreau, SPARK_LENGTH_NOTE } from './tank/spark';
export { TANK_CAUTION, TRANSFORMER_CAUTION, SOLID_STATE_CAUTION, supplyPeakVoltage, effectiveBreakRate } from './tank/evaluate';

export { splitFrequencies, transferTime } from './response/modes';
export {
  energyExchange,
  type CoupledPair,
  type EnergyExchangeOptions,
  type EnergyExchangeSeries,
} from './response/exchange';
export { evaluateDrive, driveSettings, bankStress, DRIVE_CAUTION } from './system/drive';
export { onTimeForTargetPeak, tankForTargetPeak, tapForTuningRatio } from './system/drive-goals';

// Bridge-driven (solid-state) coils: the burst simulation and its goal-first inverses.
export * from './drive';
