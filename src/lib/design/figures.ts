/**
 * Every figure of the solver's result that people read, said once: a stable key, where it sits in the result
 * (`path`, also the results panel's `data-result`), its label, how it is shown, and a typed accessor.
 * The designer's results panel, the library's summaries, comparisons and shared pages all read this list.
 */
import type { Result } from '../../solver/types';
import type { DisplayKind } from '../format/quantity';

export interface ResultFigure {
  key: string;
  path: string;
  label: string;
  /** a shorter label for a headline card */
  short?: string;
  kind: DisplayKind;
  get: (r: Result) => number | null | undefined;
}

const fig = <K extends string>(key: K, path: string, label: string, kind: DisplayKind, get: ResultFigure['get'], short?: string) =>
  ({ key, path, label, kind, get, ...(short ? { short } : {}) }) as ResultFigure & { key: K };

export const RESULT_FIGURES = [
  fig('secondaryInductance', 'secondary.inductance', 'Secondary inductance', 'inductance', (r) => r.secondary?.inductance),
  fig('selfCapacitance', 'secondary.selfCapacitance', 'Secondary self-capacitance (Medhurst)', 'capacitance', (r) => r.secondary?.selfCapacitance),
  fig('secondaryFrequency', 'secondary.resonantFrequency', 'Secondary alone (no topload)', 'frequency', (r) => r.secondary?.resonantFrequency),
  fig('windingLength', 'secondary.windingLength', 'Secondary winding length', 'length', (r) => r.secondary?.windingLength),
  fig('windingDiameter', 'secondary.windingDiameter', 'Winding diameter (wire centres)', 'length', (r) => r.secondary?.windingDiameter),
  fig('aspectRatio', 'secondary.aspectRatio', 'Secondary aspect ratio (length / diameter)', 'ratio', (r) => r.secondary?.aspectRatio),
  fig('wireLength', 'secondary.wireLength', 'Secondary wire length', 'wireLength', (r) => r.secondary?.wireLength),
  fig('dcResistance', 'secondary.dcResistance', 'DC resistance (20 °C)', 'resistance', (r) => r.secondary?.dcResistance),
  fig('wireMass', 'secondary.wireMass', 'Copper mass', 'mass', (r) => r.secondary?.wireMass),
  fig('secondaryQ', 'secondary.q', 'Q at the loaded frequency (upper bound)', 'count', (r) => r.secondary?.q),
  fig('toploadCapacitance', 'topload.capacitance', 'Topload capacitance', 'capacitance', (r) => r.topload?.capacitance),
  fig('loadedFrequency', 'system.resonantFrequency', 'Loaded resonant frequency (with topload)', 'frequency', (r) => r.system?.resonantFrequency, 'Loaded resonant frequency'),
  fig('totalCapacitance', 'system.totalCapacitance', 'Total capacitance (self + topload)', 'capacitance', (r) => r.system?.totalCapacitance),
  fig('quarterWaveFrequency', 'system.quarterWaveFrequency', 'Quarter-wave wire figure, c / (4 × wire length)', 'frequency', (r) => r.system?.quarterWaveFrequency),
  fig('targetFrequency', 'tuning.targetFrequency', 'Tuning target (with streamer allowance)', 'frequency', (r) => r.tuning?.targetFrequency),
  fig('tapTurns', 'tuning.tapTurns', 'Primary tap (turns from the inner end)', 'turns', (r) => r.tuning?.tapTurns, 'Primary tap'),
  fig('primaryFrequencyAllTurns', 'tuning.primaryFrequencyAllTurns', 'Primary + tank, every turn in circuit', 'frequency', (r) => r.tuning?.primaryFrequencyAllTurns),
  fig('requiredInductance', 'tuning.requiredInductance', 'Primary inductance needed at the tap', 'inductance', (r) => r.tuning?.requiredInductance),
  fig('primaryInductance', 'primary.inductance', 'Primary inductance (all turns)', 'inductance', (r) => r.primary?.inductance),
  fig('primaryInductanceAtTap', 'primary.inductanceAtTap', 'Primary inductance at the tap', 'inductance', (r) => r.primary?.inductanceAtTap),
  fig('conductorLength', 'primary.conductorLength', 'Conductor length, all turns', 'wireLength', (r) => r.primary?.conductorLength),
  fig('conductorLengthAtTap', 'primary.conductorLengthAtTap', 'Conductor length to the tap', 'wireLength', (r) => r.primary?.conductorLengthAtTap),
  fig('primaryOuterDiameter', 'primary.outerDiameter', 'Primary outside diameter', 'length', (r) => r.primary?.outerDiameter),
  fig('k', 'coupling.k', 'Coupling coefficient k (all primary turns)', 'coupling', (r) => r.coupling?.k, 'Coupling k'),
  fig('kAtTap', 'coupling.kAtTap', 'k with the turns up to the tap', 'coupling', (r) => r.coupling?.kAtTap),
  fig('mutualInductance', 'coupling.mutualInductance', 'Mutual inductance', 'inductance', (r) => r.coupling?.mutualInductance),
  fig('elevationForTargetCoupling', 'coupling.elevationForTargetCoupling', 'Secondary elevation for the target k', 'length', (r) => r.coupling?.elevationForTargetCoupling),
  fig('fLow', 'response.fLow', 'Lower split frequency', 'frequency', (r) => r.response?.fLow),
  fig('fHigh', 'response.fHigh', 'Upper split frequency', 'frequency', (r) => r.response?.fHigh),
  fig('transferTime', 'response.transferTime', 'Energy moves to the secondary in', 'time', (r) => (r.response ? (r.response.firstPrimaryMinimum ?? r.response.transferTime) : null)),
  fig('tankCapacitance', 'tank.capacitance', 'Tank capacitance', 'capacitance', (r) => r.tank?.capacitance),
  fig('tankVoltageRating', 'tank.voltageRating', 'Tank voltage rating', 'voltage', (r) => r.tank?.voltageRating),
  fig('perUnitVoltage', 'tank.perUnitVoltage', 'Voltage across each capacitor at the supply peak', 'voltage', (r) => r.tank?.perUnitVoltage),
  fig('ratingMargin', 'tank.ratingMargin', 'Rating over supply peak', 'ratio', (r) => r.tank?.ratingMargin),
  fig('tankEnergy', 'tank.energyAtSupplyPeak', 'Tank energy at the supply peak', 'energy', (r) => r.tank?.energyAtSupplyPeak),
  fig('bleeder', 'tank.bleeder', 'Bleeder across each capacitor', 'resistance', (r) => r.tank?.bleeder?.resistancePerUnit),
  fig('peakVoltage', 'supply.peakVoltage', 'Supply peak voltage', 'voltage', (r) => r.supply?.peakVoltage),
  fig('ratedPower', 'supply.ratedPower', 'Rated power', 'power', (r) => r.supply?.ratedPower),
  fig('resonantCapacitance', 'supply.resonantCapacitance', 'Capacitance resonant with the transformer', 'capacitance', (r) => r.supply?.resonantCapacitance),
  fig('ltrCapacitance', 'supply.ltrCapacitance', 'Larger-than-resonant value, 1 / (4 f Z)', 'capacitance', (r) => r.supply?.ltrCapacitance),
  fig('tankToResonantRatio', 'supply.tankToResonantRatio', 'Tank over resonant capacitance', 'ratio', (r) => r.supply?.tankToResonantRatio),
  fig('energyPerBang', 'supply.energyPerBang', 'Energy per firing', 'energy', (r) => r.supply?.energyPerBang),
  fig('powerAtBreakRate', 'supply.powerAtBreakRate', 'Power at the break rate', 'power', (r) => r.supply?.powerAtBreakRate),
  fig('sparkLengthEstimate', 'supply.sparkLengthEstimate', 'Spark length, rough rule of thumb', 'length', (r) => r.supply?.sparkLengthEstimate),
  fig('surgeImpedance', 'drive.surgeImpedance', 'Surge impedance of the primary tank, √(L/C)', 'resistance', (r) => r.drive?.surgeImpedance),
  fig('drivePrimaryFrequency', 'drive.primaryFrequency', 'Primary frequency (tank at the tap)', 'frequency', (r) => r.drive?.primaryFrequency),
  fig('driveFrequencyRatio', 'drive.frequencyRatio', 'Primary over secondary frequency', 'ratio', (r) => r.drive?.frequencyRatio),
  fig('peakPrimaryCurrent', 'drive.peakPrimaryCurrent', 'Peak primary current at the end of the burst', 'current', (r) => r.drive?.peakPrimaryCurrent, 'Peak primary current'),
  fig('timeToCurrentLimit', 'drive.timeToCurrentLimit', 'Time to reach the current limit', 'time', (r) => r.drive?.timeToCurrentLimit),
  fig('capacitorPeakVoltage', 'drive.capacitorPeakVoltage', 'Tank peak voltage in the burst', 'voltage', (r) => r.drive?.capacitorPeakVoltage),
  fig('capacitorRmsCurrent', 'drive.capacitorRmsCurrent', 'Tank RMS current at the repetition rate', 'current', (r) => r.drive?.capacitorRmsCurrent),
  fig('capacitorPeakEnergy', 'drive.capacitorPeakEnergy', 'Tank energy at its peak voltage, ½CV²', 'energy', (r) => r.drive?.capacitorPeakEnergy),
  fig('unitPeakVoltage', 'drive.bank.unitPeakVoltage', 'Peak voltage across each capacitor', 'voltage', (r) => r.drive?.bank?.unitPeakVoltage),
  fig('unitVoltageMargin', 'drive.bank.voltageMargin', 'Capacitor rating over its peak voltage', 'ratio', (r) => r.drive?.bank?.voltageMargin),
  fig('stringRmsCurrent', 'drive.bank.stringRmsCurrent', 'RMS current through each capacitor (each string)', 'current', (r) => r.drive?.bank?.stringRmsCurrent),
  fig('unitCurrentMargin', 'drive.bank.currentMargin', 'Capacitor RMS rating over its current', 'ratio', (r) => r.drive?.bank?.currentMargin),
  fig('secondaryPeakVoltage', 'drive.secondaryPeakVoltage', 'Secondary peak voltage (upper bound, no streamer loss)', 'voltage', (r) => r.drive?.secondaryPeakVoltage),
  fig('baseCurrentPeak', 'drive.baseCurrentPeak', 'Secondary base current, peak', 'current', (r) => r.drive?.baseCurrentPeak),
  fig('burstEnergy', 'drive.burstEnergy', 'Energy drawn from the bus per burst', 'energy', (r) => r.drive?.burstEnergy),
  fig('averagePower', 'drive.averagePower', 'Average power from the bus', 'power', (r) => r.drive?.averagePower),
  fig('dutyCycle', 'drive.dutyCycle', 'Duty cycle (on-time × repetition rate)', 'ratio', (r) => r.drive?.dutyCycle),
  fig('busDroop', 'drive.busDroop', 'Bus droop over one burst', 'voltage', (r) => r.drive?.busDroop),
  fig('busEnergy', 'drive.busEnergy', 'Energy held by the bus capacitors, ½CV²', 'energy', (r) => r.drive?.busEnergy),
] as const;

export type ResultFigureId = (typeof RESULT_FIGURES)[number]['key'];

const byKey = new Map<string, ResultFigure>(RESULT_FIGURES.map((f) => [f.key, f]));

export function resultFigure(key: ResultFigureId): ResultFigure {
  return byKey.get(key)!;
}

/**
 * A figure's value in a result, or null when the result lacks it. Takes a stored result as well: its JSON
 * may come from an older solver, so a missing section reads as null, not as an error.
 */
export function figureOf(result: Result | unknown, f: ResultFigure): number | null {
  if (result === null || typeof result !== 'object') return null;
  const v = f.get(result as Result);
  return typeof v === 'number' && Number.isFinite(v) ? v : null;
}
