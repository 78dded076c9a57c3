import type { SupplyResult, SupplySI, TankResult, TankSI } from '../types';
import { bankCapacitance, bankVoltageRating, perUnitVoltage } from './bank';
import { BLEEDER_RESISTANCE_PER_UNIT, dischargeTimeConstant, resistorPower } from './bleeder';
import { capacitorEnergy, powerAtBreakRate } from './energy';
import { SPARK_LENGTH_NOTE, sparkLengthFreau } from './spark';
import { ltrCapacitanceTransformer, peakVoltageRms, resonantCapacitanceTransformer, transformerImpedance } from './supply';

export const TANK_CAUTION =
  'A charged tank capacitor can kill, and it can hold its charge after the power is off. Fit bleeders, ' +
  'and short every capacitor by hand with an insulated grounding stick before touching, in case a bleeder has opened.';

export const TRANSFORMER_CAUTION =
  "A high-voltage transformer's output can kill. Keep its ground-fault protection and other safety devices in " +
  'place, switch off and lock out the mains before touching anything, and follow local electrical codes.';

export const SOLID_STATE_CAUTION =
  'The rectified mains bus can kill, and the coil\'s RF output can cause deep burns that may not be felt. ' +
  'Discharge the bus capacitors before touching, and follow local electrical codes.';

/** Peak voltage the tank sees from the supply: √2 × RMS for a transformer, the bus voltage for solid state. */
export function supplyPeakVoltage(supply: SupplySI): number {
  return supply.kind === 'transformer' ? peakVoltageRms(supply.voltage) : supply.busVoltage;
}

/** Break rate of a spark-gap supply: the given one, or twice the line frequency (one firing per half-cycle). */
export function effectiveBreakRate(supply: SupplySI): number | null {
  if (supply.kind !== 'transformer') return null;
  return supply.breakRate ?? 2 * supply.lineFrequency;
}

export const SOLID_STATE_TANK_CAUTION =
  'In a bridge-driven coil the tank rings to several kilovolts in each burst and the bank heats with its RMS current; ' +
  'the bus capacitors beside the bridge stay charged after switch-off. Discharge and check with a meter before touching.';

export function evaluateTank(tank: TankSI, supply: SupplySI | null): TankResult {
  const capacitance = tank.kind === 'single' ? tank.capacitance : bankCapacitance(tank.unitCapacitance, tank.series, tank.parallel);
  if (supply?.kind === 'solid-state') {
    // the tank is not charged from the bus: its stress comes from the burst (the drive section), not from ½CV² of the bus
    return {
      capacitance,
      voltageRating: tank.kind === 'bank' ? bankVoltageRating(tank.unitVoltage, tank.series) : null,
      energyAtSupplyPeak: null,
      unitVoltage: tank.kind === 'bank' ? tank.unitVoltage : null,
      units: tank.kind === 'bank' ? tank.series * tank.parallel : null,
      perUnitVoltage: null,
      ratingMargin: null,
      bleeder: null,
      caution: SOLID_STATE_TANK_CAUTION,
    };
  }
  const peak = supply ? supplyPeakVoltage(supply) : null;
  const voltageRating = tank.kind === 'bank' ? bankVoltageRating(tank.unitVoltage, tank.series) : null;
  const perUnit = tank.kind === 'bank' && peak !== null ? perUnitVoltage(peak, tank.series) : null;
  return {
    capacitance,
    voltageRating,
    energyAtSupplyPeak: peak === null ? null : capacitorEnergy(capacitance, peak),
    unitVoltage: tank.kind === 'bank' ? tank.unitVoltage : null,
    units: tank.kind === 'bank' ? tank.series * tank.parallel : null,
    perUnitVoltage: perUnit,
    ratingMargin: voltageRating !== null && peak !== null ? voltageRating / peak : null,
    bleeder:
      tank.kind === 'bank'
        ? {
            resistancePerUnit: BLEEDER_RESISTANCE_PER_UNIT,
            count: tank.series * tank.parallel,
            powerPerUnit: perUnit === null ? 0 : resistorPower(perUnit, BLEEDER_RESISTANCE_PER_UNIT),
            timeConstant: dischargeTimeConstant(BLEEDER_RESISTANCE_PER_UNIT, tank.unitCapacitance),
          }
        : null,
    caution: TANK_CAUTION,
  };
}

export function evaluateSupply(supply: SupplySI, tankCapacitance: number | null): SupplyResult {
  const peakVoltage = supplyPeakVoltage(supply);
  if (supply.kind === 'solid-state') {
    return {
      kind: 'solid-state',
      resonantCapacitance: null,
      peakVoltage,
      impedance: null,
      ratedPower: null,
      ltrCapacitance: null,
      tankToResonantRatio: null,
      breakRate: null,
      energyPerBang: null,
      powerAtBreakRate: null,
      sparkLengthEstimate: null,
      sparkLengthPower: null,
      sparkLengthNote: null,
      caution: SOLID_STATE_CAUTION,
    };
  }
  const resonantCapacitance = resonantCapacitanceTransformer(supply.voltage, supply.current, supply.lineFrequency);
  const ratedPower = supply.voltage * supply.current;
  const breakRate = effectiveBreakRate(supply);
  const energyPerBang = tankCapacitance === null ? null : capacitorEnergy(tankCapacitance, peakVoltage);
  const throughput = energyPerBang === null || breakRate === null ? null : powerAtBreakRate(energyPerBang, breakRate);
  // the gap cannot pass more than the transformer delivers, so the rule is fed the smaller figure
  const sparkLengthPower = throughput === null ? ratedPower : Math.min(throughput, ratedPower);
  return {
    kind: 'transformer',
    resonantCapacitance,
    peakVoltage,
    impedance: transformerImpedance(supply.voltage, supply.current),
    ratedPower,
    ltrCapacitance: ltrCapacitanceTransformer(supply.voltage, supply.current, supply.lineFrequency),
    tankToResonantRatio: tankCapacitance === null ? null : tankCapacitance / resonantCapacitance,
    breakRate,
    energyPerBang,
    powerAtBreakRate: throughput,
    sparkLengthEstimate: sparkLengthFreau(sparkLengthPower),
    sparkLengthPower,
    sparkLengthNote: SPARK_LENGTH_NOTE,
    caution: TRANSFORMER_CAUTION,
  };
}
