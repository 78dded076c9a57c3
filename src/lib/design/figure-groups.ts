/**
 * How results are grouped wherever a builder reads them (the designer's results panel, the copied summary,
 * shared pages): by what the builder does with each figure. A group is a list of figure keys of
 * `RESULT_FIGURES`; a new figure joins a group by adding its key here, and a new group is one more entry.
 * Every figure a person reads appears in exactly one group (the lead figures included), checked by a test.
 */
import type { ResultFigureId } from './figures';

export interface ResultGroup {
  key: string;
  title: string;
  /** one line under the title: what the builder does with these figures */
  purpose: string;
  figures: readonly ResultFigureId[];
}

/** The few figures that decide the build, shown first and large. */
export const LEAD_FIGURES: readonly ResultFigureId[] = ['tapTurns', 'loadedFrequency', 'k', 'tankEnergy'];

export const RESULT_GROUPS = [
  {
    key: 'buy',
    title: 'What to buy',
    purpose: 'Wire, conductor and capacitors to order, with their ratings.',
    figures: ['wireLength', 'wireMass', 'conductorLength', 'tankCapacitance', 'tankVoltageRating', 'bleeder', 'resonantCapacitance', 'ltrCapacitance', 'tankToResonantRatio'],
  },
  {
    key: 'set',
    title: 'What to set',
    purpose: 'Dimensions to build to and the settings to start from.',
    figures: ['windingLength', 'windingDiameter', 'aspectRatio', 'primaryOuterDiameter', 'conductorLengthAtTap', 'elevationForTargetCoupling', 'targetFrequency', 'requiredInductance'],
  },
  {
    key: 'measure',
    title: 'What to expect when measuring',
    purpose: 'Values a meter, a signal generator or a scope should show on the built coil.',
    figures: [
      'secondaryInductance',
      'dcResistance',
      'selfCapacitance',
      'secondaryFrequency',
      'toploadCapacitance',
      'totalCapacitance',
      'secondaryQ',
      'primaryInductance',
      'primaryInductanceAtTap',
      'primaryFrequencyAllTurns',
      'kAtTap',
      'mutualInductance',
      'fLow',
      'fHigh',
      'transferTime',
    ],
  },
  {
    key: 'hurt',
    title: 'What can hurt',
    purpose: 'Voltages, stored energy and power: the figures behind the cautions.',
    figures: ['peakVoltage', 'perUnitVoltage', 'ratingMargin', 'ratedPower', 'energyPerBang', 'powerAtBreakRate', 'sparkLengthEstimate'],
  },
] as const satisfies readonly ResultGroup[];

export type ResultGroupKey = (typeof RESULT_GROUPS)[number]['key'];

/**
 * Figures kept in the solver's result and the registry but not among the grouped results: the quarter-wave
 * wire figure is a comparison, explained on the methods page and given in the build sheet's wire section.
 */
export const UNGROUPED_FIGURES: readonly ResultFigureId[] = ['quarterWaveFrequency'];

/**
 * The figures of a bridge-driven coil, shown together in the drive panel (they exist only for a solid-state
 * supply): what the switches, the bank and the bus go through in a burst.
 */
export const DRIVE_FIGURES: readonly ResultFigureId[] = [
  'surgeImpedance',
  'drivePrimaryFrequency',
  'driveFrequencyRatio',
  'peakPrimaryCurrent',
  'timeToCurrentLimit',
  'capacitorPeakVoltage',
  'capacitorRmsCurrent',
  'capacitorPeakEnergy',
  'unitPeakVoltage',
  'unitVoltageMargin',
  'stringRmsCurrent',
  'unitCurrentMargin',
  'secondaryPeakVoltage',
  'baseCurrentPeak',
  'burstEnergy',
  'averagePower',
  'dutyCycle',
  'busDroop',
  'busEnergy',
];
