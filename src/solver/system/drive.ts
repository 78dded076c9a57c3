import { simulateBurst } from '../drive/burst';
import type { BurstCircuitSI, DriveSettingsSI } from '../drive/types';
import { capacitorEnergy } from '../tank/energy';
import type { DriveBankResult, DriveResult, SolidStateSupplySI, TankSI } from '../types';

export const DRIVE_CAUTION =
  'The bridge sits at mains potential and the bus capacitors hold a lethal charge after switch-off: discharge them ' +
  'and check with a meter before touching. Measure the bridge only through isolation (a current transformer, an ' +
  'isolated or differential probe), run the interrupter over optical fibre, and follow local electrical codes.';

/** Most points of the waveform a result carries (the burst is resampled onto this many, keeping the peaks). */
export const WAVEFORM_POINTS = 1200;

/** The simulation's settings from a solid-state supply as the design gives it. */
export function driveSettings(s: SolidStateSupplySI): DriveSettingsSI {
  return {
    topology: s.topology,
    bridge: s.bridge,
    busVoltage: s.busVoltage,
    onTime: s.onTime,
    repetitionRate: s.repetitionRate,
    switchPeakCurrent: s.switchPeakCurrent,
    currentLimit: s.currentLimit,
    busCapacitance: s.busCapacitance,
    tuningRatio: s.tuningRatio,
  };
}

/**
 * Each capacitor's share of the burst's stress in a bank of `parallel` strings of `series` equal capacitors:
 * the tank's peak voltage divides equally over a string (equal units in series), the tank's current divides
 * equally over the strings (equal strings in parallel); circuit theory of series and parallel capacitors.
 * Example: 30 nF bank of 2 strings × 10 units, tank peak 12 kV and 40 A RMS → 1.2 kV and 20 A per capacitor.
 */
export function bankStress(
  tank: Extract<TankSI, { kind: 'bank' }>,
  capacitorPeakVoltage: number,
  capacitorRmsCurrent: number,
  peakCurrent: number,
): DriveBankResult {
  const unitPeakVoltage = capacitorPeakVoltage / tank.series;
  const stringRmsCurrent = capacitorRmsCurrent / tank.parallel;
  const unitRms = tank.unitRmsCurrent ?? null;
  return {
    unitPeakVoltage,
    unitVoltage: tank.unitVoltage,
    voltageMargin: tank.unitVoltage / unitPeakVoltage,
    stringRmsCurrent,
    unitRmsCurrent: unitRms,
    currentMargin: unitRms === null ? null : unitRms / stringRmsCurrent,
    stringPeakCurrent: peakCurrent / tank.parallel,
    series: tank.series,
    parallel: tank.parallel,
  };
}

/**
 * Keeps at most `max` points of a sampled burst: the samples are split into equal runs and the sample of
 * largest |primary current| in each run is kept (with the matching time and secondary voltage), so the
 * envelope and the final peak survive. Shorter records are returned as they are.
 */
export function resampleWaveform(w: { time: number[]; primaryCurrent: number[]; secondaryVoltage: number[] }, max = WAVEFORM_POINTS) {
  const n = w.time.length;
  if (n <= max) return { time: [...w.time], primaryCurrent: [...w.primaryCurrent], secondaryVoltage: [...w.secondaryVoltage] };
  const time: number[] = [];
  const primaryCurrent: number[] = [];
  const secondaryVoltage: number[] = [];
  for (let b = 0; b < max; b++) {
    const lo = Math.floor((b * n) / max);
    const hi = Math.max(lo + 1, Math.floor(((b + 1) * n) / max));
    let best = lo;
    for (let i = lo; i < hi; i++) if (Math.abs(w.primaryCurrent[i]) > Math.abs(w.primaryCurrent[best])) best = i;
    time.push(w.time[best]);
    primaryCurrent.push(w.primaryCurrent[best]);
    secondaryVoltage.push(w.secondaryVoltage[best]);
  }
  return { time, primaryCurrent, secondaryVoltage };
}

/**
 * The drive section of a result: the burst simulated on the circuit (src/solver/drive), with the bank's
 * per-capacitor stress, the stored energies and the limit that ended the burst, if any.
 */
export function evaluateDrive(supply: SolidStateSupplySI, circuit: BurstCircuitSI, tank: TankSI | null, targetFrequency: number | null): DriveResult {
  const settings = driveSettings(supply);
  const b = simulateBurst(settings, circuit);
  const dual = supply.topology === 'dual-resonant' && circuit.C1 !== null;
  const vcap = dual ? b.capacitorPeakVoltage : null;
  const icap = dual ? b.capacitorRmsCurrent : null;
  return {
    topology: supply.topology,
    bridge: supply.bridge,
    busVoltage: supply.busVoltage,
    onTime: supply.onTime,
    repetitionRate: supply.repetitionRate,
    currentLimit: supply.currentLimit,
    switchPeakCurrent: supply.switchPeakCurrent,
    surgeImpedance: b.surgeImpedance,
    primaryFrequency: b.primaryFrequency,
    frequencyRatio: targetFrequency === null ? null : b.primaryFrequency / targetFrequency,
    peakPrimaryCurrent: b.peakPrimaryCurrent,
    timeToCurrentLimit: b.timeToCurrentLimit,
    // the trip when one is set, otherwise the switches' rating (the drive family's rule)
    limitBy: b.timeToCurrentLimit === null ? null : supply.currentLimit !== null ? 'currentLimit' : 'switchPeakCurrent',
    capacitorPeakVoltage: vcap,
    capacitorRmsCurrent: icap,
    capacitorPeakEnergy: vcap === null || circuit.C1 === null ? null : capacitorEnergy(circuit.C1, vcap),
    secondaryPeakVoltage: b.secondaryPeakVoltage,
    baseCurrentPeak: b.baseCurrentPeak,
    burstEnergy: b.burstEnergy,
    averagePower: b.averagePower,
    dutyCycle: b.dutyCycle,
    busDroop: b.busDroop,
    busEnergy: supply.busCapacitance === null ? null : capacitorEnergy(supply.busCapacitance, supply.busVoltage),
    bank: tank && tank.kind === 'bank' && vcap !== null && icap !== null ? bankStress(tank, vcap, icap, b.peakPrimaryCurrent) : null,
    stepsPerPeriod: b.stepsPerPeriod,
    circuit: { L1: circuit.L1, C1: circuit.C1, R1: circuit.R1, L2: circuit.L2, C2: circuit.C2, R2: circuit.R2, M: circuit.M },
    waveform: resampleWaveform(b.waveform),
    caution: DRIVE_CAUTION,
  };
}
