import { copperMass, BLEEDER_RESISTANCE_PER_UNIT, resistorPower, supplyPeakVoltage, type DesignSI, type Result } from '../../solver';
import { calibratedTuning, type Calibration, type CalibratedTuning } from './calibration';
import { suggestSpool, type SpoolSuggestion } from './spool';

import { METRES_PER_INCH as INCH } from '../format/length';

/** Bare form left at each end of the winding: at least 1 in (R. Quick, "COILBLD1" building notes, 1990s, lab-tesla.org; common practice). */
export const MIN_END_MARGIN = 1 * INCH;
/** Default end margin: Quick cuts the form about 3 in longer than the winding, 1.5 in each end (R. Quick, "COILBLD1" building notes, lab-tesla.org; common practice). */
export const DEFAULT_END_MARGIN = 1.5 * INCH;
/** Bleeder wattage the trade fits across each capacitor: ½ W (T. Fritz, Tesla Coil Mailing List, Feb 2000, pupman.com archive; common practice). */
export const BLEEDER_RATED_POWER = 0.5;
/**
 * Working voltage of a common ½ W film resistor, checked against the voltage across each bleeder: 350 V
 * (common practice: the usual limiting element voltage printed for ½ W carbon- and metal-film parts; check the
 * part's own datasheet).
 */
export const BLEEDER_RATED_VOLTAGE = 350;
/** Pulse capacitor commonly bought by the hundred for banks: 0.15 µF, 2000 V DC (hvtesla.com MMC notes; common practice). */
export const COMMON_BANK_UNIT = { capacitance: 0.15e-6, voltage: 2000 } as const;
/** String rating at least 2 × the supply peak (common practice; no primary source found). */
export const BANK_RATING_FACTOR = 2;
/** Most checkpoints a sheet lists, so a tiny `every` cannot produce a thousand-page table. */
export const MAX_CHECKPOINTS = 500;

export interface BuildSheetOptions {
  /** winder speed, revolutions per minute */
  rpm: number;
  /** extra wire to buy as a fraction of the computed length, e.g. 0.1 */
  margin: number;
  /** turns between checkpoints */
  every: number;
  /** bare form at each end, m; at least MIN_END_MARGIN */
  endMargin?: number;
}

export interface Checkpoint {
  turns: number;
  /** winding height from its first turn, m: turns × pitch */
  height: number;
  /** the same mark measured from the bottom end of the form */
  heightFromFormEnd: number;
}

export interface BankLayout {
  series: number;
  parallel: number;
  units: number;
  unitCapacitance: number;
  unitVoltage: number;
  capacitance: number;
  voltageRating: number;
  /** share of the supply peak across each unit; null without a supply */
  perUnitVoltage: number | null;
  /** voltage rating over supply peak; null without a supply */
  ratingMargin: number | null;
  /** true when the bank is our suggestion from a common unit (the design gave only a capacitance) */
  suggested: boolean;
  bleeder: {
    resistance: number;
    ratedPower: number;
    power: number | null;
    count: number;
    withinRating: boolean | null;
    timeConstant: number;
    /** the working voltage checked against, and whether the voltage across each bleeder is within it */
    ratedVoltage: number;
    voltageWithinRating: boolean | null;
    /** resistors in series across each unit to keep each within its working voltage */
    inSeries: number;
  };
}

/** Current-transformer ratios the trade picks (common practice, from memory): 1:N with N from this list. */
export const CT_RATIOS = [33, 50, 100, 200, 300, 500, 1000, 2000] as const;
/** Feedback CT: at most about 5 A peak out of it at the peak primary current (common practice, from memory). */
export const FEEDBACK_CT_MAX_OUT = 5;
/** Trip CT: about 0.5 A peak out at the trip, a few volts across the usual burden (common practice, from memory). */
export const TRIP_CT_OUT = 0.5;
/** Bus capacitance suggested for a droop of 5 % over one burst (common practice). */
export const BUS_DROOP_TARGET = 0.05;

/** The bridge-driven coil's sheet: bank stress, bus capacitor, current transformers and the primary conductor. */
export interface DriveSheet {
  topology: 'dual-resonant' | 'single-resonant';
  bridge: 'full' | 'half';
  busVoltage: number;
  onTime: number;
  repetitionRate: number;
  peakPrimaryCurrent: number;
  surgeImpedance: number | null;
  primaryFrequency: number;
  capacitorPeakVoltage: number | null;
  capacitorRmsCurrent: number | null;
  bank: null | { series: number; parallel: number; unitCapacitance: number; unitVoltage: number; unitPeakVoltage: number; voltageMargin: number; stringRmsCurrent: number; stringPeakCurrent: number; unitRmsCurrent: number | null; currentMargin: number | null };
  bus: { capacitance: number | null; energy: number | null; droop: number | null; suggestedCapacitance: number };
  /** 1:N of the feedback current transformer and the peak current out of it */
  feedbackCt: { ratio: number; outputPeak: number };
  /** 1:N of the trip current transformer, for the trip or (without one) the peak current */
  tripCt: { ratio: number; outputAtTrip: number; trip: number };
  /** the primary conductor's RMS current, AC resistance at the drive frequency and heat in it */
  conductor: { rmsCurrent: number | null; acResistance: number; heat: number | null };
}

export interface BuildSheet {
  options: Required<BuildSheetOptions>;
  secondary: {
    formDiameter: number;
    windingDiameter: number;
    turns: number;
    awg: number | null;
    insulation: string | null;
    wireDiameter: number;
    insulatedDiameter: number;
    pitch: number;
    turnsPerMetre: number;
    windingLength: number;
    formLength: number;
    wireLength: number;
    /** c / (4 × wire length): the straight-wire comparison, for the wire section only */
    quarterWaveFrequency: number | null;
    /** the wound coil's own resonance without topload, beside it */
    bareFrequency: number;
    wireToBuy: number;
    wireMass: number;
    massToBuy: number;
    spoolMetric: SpoolSuggestion;
    spoolImperial: SpoolSuggestion;
    /** s: turns / rpm */
    windingTime: number;
    dcResistance: number;
    checkpoints: Checkpoint[];
  };
  topload: null | {
    shape: 'toroid' | 'sphere';
    /** toroid: overall and tube diameters; sphere: its diameter */
    majorDiameter: number | null;
    minorDiameter: number | null;
    diameter: number | null;
    /** centre above the top turn of the winding */
    elevation: number;
    capacitance: number | null;
  };
  primary: null | {
    shape: string;
    innerDiameter: number;
    outerDiameter: number;
    spacing: number;
    elevation: number;
    angle: number | null;
    turns: number;
    conductorDiameter: number;
    conductorLength: number;
    conductorToBuy: number;
    /** predicted tap (turns from the inner end) and its conductor length */
    tapTurns: number | null;
    conductorLengthAtTap: number | null;
    targetFrequency: number | null;
    /** the tap for adopted measurements, when any were adopted */
    calibrated: CalibratedTuning | null;
  };
  tank: null | {
    capacitance: number;
    energyAtSupplyPeak: number | null;
    bank: BankLayout | null;
  };
  supply: null | {
    kind: 'transformer' | 'solid-state';
    peakVoltage: number;
    voltage: number | null;
    current: number | null;
    resonantCapacitance: number | null;
    ltrCapacitance: number | null;
    tankToResonantRatio: number | null;
    /** bypass capacitors the usual filter puts from the leads to the case: 2 up to 9 kV, 4 above (simplified protection filter, hotstreamer.deanostoybox.com/greg/filter.htm; common practice) */
    filterBypassCapacitors: number | null;
  };
  drive: DriveSheet | null;
}

/**
 * The arithmetic of a build sheet for one solved design. Everything comes from the solver's result
 * (wire length, mass, winding length, primary lengths, tank) and the options; nothing here re-derives
 * the physics. Winding time = turns / rpm; checkpoint n sits n × pitch above the first turn, pitch =
 * winding length / turns; wire and primary conductor to buy = computed length × (1 + margin).
 */
export function buildSheet(design: DesignSI, result: Result, options: BuildSheetOptions, calibration: Calibration = {}): BuildSheet {
  const sec = result.secondary;
  if (!sec) throw new RangeError('The design has no computed secondary; a build sheet needs one.');
  const s = design.secondary;
  const endMargin = Math.max(options.endMargin ?? DEFAULT_END_MARGIN, MIN_END_MARGIN);
  const opts = { ...options, endMargin };
  const pitch = sec.windingLength / s.turns;
  const wireToBuy = sec.wireLength * (1 + options.margin);
  const massToBuy = copperMass(wireToBuy, s.wire.diameter);

  const checkpoints: Checkpoint[] = [];
  const step = Math.max(1, Math.floor(options.every));
  for (let n = step; n < s.turns && checkpoints.length < MAX_CHECKPOINTS - 1; n += step) {
    checkpoints.push({ turns: n, height: n * pitch, heightFromFormEnd: endMargin + n * pitch });
  }
  checkpoints.push({ turns: s.turns, height: sec.windingLength, heightFromFormEnd: endMargin + sec.windingLength });

  const p = design.primary;
  const primary =
    p && result.primary
      ? {
          shape: p.shape,
          innerDiameter: p.innerDiameter,
          outerDiameter: result.primary.outerDiameter,
          spacing: p.spacing,
          elevation: p.elevation,
          angle: p.angle,
          turns: p.turns,
          conductorDiameter: p.conductorDiameter,
          conductorLength: result.primary.conductorLength,
          conductorToBuy: result.primary.conductorLength * (1 + options.margin),
          tapTurns: result.tuning?.tapTurns ?? null,
          conductorLengthAtTap: result.primary.conductorLengthAtTap,
          targetFrequency: result.tuning?.primaryTargetFrequency ?? result.tuning?.targetFrequency ?? null,
          calibrated: calibratedTuning(design, result, calibration),
        }
      : null;

  const bridge = design.supply?.kind === 'solid-state';
  const peak = design.supply && !bridge ? supplyPeakVoltage(design.supply) : null;
  let tank: BuildSheet['tank'] = null;
  if (design.tank && result.tank && bridge) {
    // no bleeders and no charged-bank figures: the burst sets the bank's stress (the drive section)
    const t = design.tank;
    const bank: BankLayout | null = t.kind === 'bank' ? { ...layout(t.unitCapacitance, t.unitVoltage, t.series, t.parallel, null, false) } : null;
    tank = { capacitance: result.tank.capacitance, energyAtSupplyPeak: null, bank };
  } else if (design.tank && result.tank) {
    const t = design.tank;
    const bank: BankLayout | null =
      t.kind === 'bank'
        ? layout(t.unitCapacitance, t.unitVoltage, t.series, t.parallel, peak, false)
        : peak !== null
          ? suggestBank(t.capacitance, peak)
          : null;
    tank = { capacitance: result.tank.capacitance, energyAtSupplyPeak: result.tank.energyAtSupplyPeak, bank };
  }

  const sup = design.supply;
  const supply: BuildSheet['supply'] =
    sup && result.supply
      ? {
          kind: sup.kind,
          peakVoltage: result.supply.peakVoltage,
          voltage: sup.kind === 'transformer' ? sup.voltage : null,
          current: sup.kind === 'transformer' ? sup.current : null,
          resonantCapacitance: result.supply.resonantCapacitance,
          ltrCapacitance: result.supply.ltrCapacitance,
          tankToResonantRatio: result.supply.tankToResonantRatio,
          filterBypassCapacitors: sup.kind === 'transformer' ? (sup.voltage <= 9000 ? 2 : 4) : null,
        }
      : null;

  return {
    drive: driveSheet(result),
    options: opts,
    secondary: {
      formDiameter: s.formDiameter,
      windingDiameter: sec.windingDiameter,
      turns: s.turns,
      awg: s.wire.awg,
      insulation: s.wire.insulation,
      wireDiameter: s.wire.diameter,
      insulatedDiameter: s.wire.insulatedDiameter,
      pitch,
      turnsPerMetre: s.turns / sec.windingLength,
      windingLength: sec.windingLength,
      formLength: sec.windingLength + 2 * endMargin,
      wireLength: sec.wireLength,
      quarterWaveFrequency: result.system?.quarterWaveFrequency ?? null,
      bareFrequency: sec.resonantFrequency,
      wireToBuy,
      wireMass: sec.wireMass,
      massToBuy,
      spoolMetric: suggestSpool(massToBuy, 'kg'),
      spoolImperial: suggestSpool(massToBuy, 'lb'),
      windingTime: (s.turns / options.rpm) * 60,
      dcResistance: sec.dcResistance,
      checkpoints,
    },
    topload:
      design.topload
        ? {
            shape: design.topload.shape,
            majorDiameter: design.topload.shape === 'toroid' ? design.topload.majorDiameter : null,
            minorDiameter: design.topload.shape === 'toroid' ? design.topload.minorDiameter : null,
            diameter: design.topload.shape === 'sphere' ? design.topload.diameter : null,
            elevation: design.topload.elevation,
            capacitance: result.topload?.capacitance ?? null,
          }
        : null,
    primary,
    tank,
    supply,
  };
}

function layout(unitC: number, unitV: number, series: number, parallel: number, peak: number | null, suggested: boolean): BankLayout {
  const perUnit = peak === null ? null : peak / series;
  const power = perUnit === null ? null : resistorPower(perUnit, BLEEDER_RESISTANCE_PER_UNIT);
  return {
    series,
    parallel,
    units: series * parallel,
    unitCapacitance: unitC,
    unitVoltage: unitV,
    capacitance: (unitC * parallel) / series,
    voltageRating: unitV * series,
    perUnitVoltage: perUnit,
    ratingMargin: peak === null ? null : (unitV * series) / peak,
    suggested,
    bleeder: {
      resistance: BLEEDER_RESISTANCE_PER_UNIT,
      ratedPower: BLEEDER_RATED_POWER,
      power,
      count: series * parallel,
      withinRating: power === null ? null : power <= BLEEDER_RATED_POWER,
      timeConstant: BLEEDER_RESISTANCE_PER_UNIT * unitC,
      ratedVoltage: BLEEDER_RATED_VOLTAGE,
      voltageWithinRating: perUnit === null ? null : perUnit <= BLEEDER_RATED_VOLTAGE,
      inSeries: perUnit === null ? 1 : Math.max(1, Math.ceil(perUnit / BLEEDER_RATED_VOLTAGE)),
    },
  };
}

/**
 * A bank of the common 0.15 µF / 2 kV unit near a single given capacitance: enough units in series for
 * a string rating of 2 × the supply peak, then the number of strings that comes closest to the value.
 */
export function suggestBank(capacitance: number, peak: number): BankLayout {
  const u = COMMON_BANK_UNIT;
  const series = Math.max(1, Math.ceil((BANK_RATING_FACTOR * peak) / u.voltage));
  const parallel = Math.max(1, Math.round((capacitance * series) / u.capacitance));
  return layout(u.capacitance, u.voltage, series, parallel, peak, true);
}

/** The smallest listed 1:N that keeps `current / N` at or below `out` (the largest listed when none does). */
export function ctRatio(current: number, out: number): number {
  return CT_RATIOS.find((n) => current / n <= out) ?? CT_RATIOS[CT_RATIOS.length - 1];
}

/**
 * The drive part of the sheet from the solver's burst: the bank as simulated, the bus capacitor (with the
 * capacitance for a 5 % droop, from C·V·ΔV ≈ energy per burst), the current transformers (ratios by the
 * trade's rule of thumb above) and the primary conductor's heat, I²R at the drive frequency.
 */
export function driveSheet(result: Result): DriveSheet | null {
  const d = result.drive;
  if (!d) return null;
  const trip = d.currentLimit ?? d.peakPrimaryCurrent;
  const tripRatio = ctRatio(trip, TRIP_CT_OUT);
  const feedbackRatio = ctRatio(d.peakPrimaryCurrent, FEEDBACK_CT_MAX_OUT);
  const rms = d.capacitorRmsCurrent;
  const b = d.bank;
  return {
    topology: d.topology,
    bridge: d.bridge,
    busVoltage: d.busVoltage,
    onTime: d.onTime,
    repetitionRate: d.repetitionRate,
    peakPrimaryCurrent: d.peakPrimaryCurrent,
    surgeImpedance: d.surgeImpedance,
    primaryFrequency: d.primaryFrequency,
    capacitorPeakVoltage: d.capacitorPeakVoltage,
    capacitorRmsCurrent: rms,
    bank: b
      ? {
          series: b.series,
          parallel: b.parallel,
          unitCapacitance: d.circuit.C1 === null ? 0 : (d.circuit.C1 * b.series) / b.parallel,
          unitVoltage: b.unitVoltage,
          unitPeakVoltage: b.unitPeakVoltage,
          voltageMargin: b.voltageMargin,
          stringRmsCurrent: b.stringRmsCurrent,
          stringPeakCurrent: b.stringPeakCurrent,
          unitRmsCurrent: b.unitRmsCurrent,
          currentMargin: b.currentMargin,
        }
      : null,
    bus: {
      capacitance: d.busEnergy === null ? null : (2 * d.busEnergy) / (d.busVoltage * d.busVoltage),
      energy: d.busEnergy,
      droop: d.busDroop,
      suggestedCapacitance: d.burstEnergy / (BUS_DROOP_TARGET * d.busVoltage * d.busVoltage),
    },
    feedbackCt: { ratio: feedbackRatio, outputPeak: d.peakPrimaryCurrent / feedbackRatio },
    tripCt: { ratio: tripRatio, outputAtTrip: trip / tripRatio, trip },
    conductor: { rmsCurrent: rms, acResistance: d.circuit.R1, heat: rms === null ? null : rms * rms * d.circuit.R1 },
  };
}
