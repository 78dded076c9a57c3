import type { DesignInput } from './schema';

export interface ExampleDesign {
  id: string;
  name: string;
  description: string;
  design: DesignInput;
}

/** Invented example designs: starting points for new users and fixtures for tests and demos. */
export const exampleDesigns: readonly ExampleDesign[] = [
  {
    id: 'bench-sphere',
    name: 'Bench coil with a sphere',
    description:
      'A small spark-gap coil for the workbench: 3 in form, 28 AWG close-wound, a 6 in sphere and a 12-turn flat ' +
      'primary on a 6 kV / 20 mA transformer (50 Hz).',
    design: {
      secondary: { formDiameter: '3 in', turns: 800, wire: { awg: 28, insulation: 'heavy' }, elevation: '0.5 in' },
      groundClearance: '0.4 m',
      topload: { shape: 'sphere', diameter: '6 in', elevation: '4 in' },
      primary: { shape: 'flat', innerDiameter: '5 in', turns: 12, conductorDiameter: '4 mm', spacing: '4 mm' },
      tank: { capacitance: '6.8 nF' },
      supply: { kind: 'transformer', voltage: '6 kV', current: '20 mA', lineFrequency: '50 Hz' },
      tuning: { streamerLength: '8 in' },
    },
  },
  {
    id: 'sign-transformer-toroid',
    name: '12 kV sign-transformer coil',
    description:
      'A medium spark-gap coil: 4.5 in form, 1000 turns of 24 AWG, a 20 × 5 in toroid, a 16-turn flat primary of ' +
      '1/4 in tube and a 10 nF bank (20 in series × 2) on a 12 kV / 30 mA sign transformer with a 120 BPS gap.',
    design: {
      secondary: { formDiameter: '4.5 in', turns: 1000, wire: { awg: 24, insulation: 'heavy' }, elevation: '1 in' },
      groundClearance: '0.6 m',
      topload: { shape: 'toroid', majorDiameter: '20 in', minorDiameter: '5 in', elevation: '3 in' },
      primary: { shape: 'flat', innerDiameter: '6.5 in', turns: 16, conductorDiameter: '0.25 in', spacing: '0.25 in' },
      tank: { unitCapacitance: '100 nF', unitVoltage: '2 kV', series: 20, parallel: 2 },
      supply: { kind: 'transformer', voltage: '12 kV', current: '30 mA', lineFrequency: '60 Hz', breakRate: '120 Hz' },
      tuning: { streamerCapacitance: '3 pF', targetCoupling: 0.1 },
    },
  },
  {
    id: 'solid-state-helical',
    name: 'Dual-resonant solid-state coil with a helical primary',
    description:
      'A bridge-driven (dual-resonant) coil: 6 in form, 1100 turns of 24 AWG, a 30 × 8 in toroid, an 8-turn helical ' +
      'primary around the base and a 150 nF bank (4 in series × 4) driven by a full bridge from a 340 V bus, 50 µs bursts ' +
      'at 150 per second with a 600 A trip, the primary tuned to 0.9 × the secondary.',
    design: {
      secondary: { formDiameter: '6 in', turns: 1100, wire: { awg: 24, insulation: 'heavy' }, elevation: '2 in' },
      groundClearance: '0.5 m',
      topload: { shape: 'toroid', majorDiameter: '30 in', minorDiameter: '8 in', elevation: '4 in' },
      primary: { shape: 'helical', innerDiameter: '10 in', turns: 8, conductorDiameter: '0.25 in', spacing: '0.25 in' },
      tank: { unitCapacitance: '150 nF', unitVoltage: '2 kV', series: 4, parallel: 4, unitRmsCurrent: '10 A' },
      supply: {
        kind: 'solid-state',
        busVoltage: '340 V',
        topology: 'dual-resonant',
        bridge: 'full',
        onTime: '50 us',
        repetitionRate: '150 Hz',
        switchPeakCurrent: '1000 A',
        currentLimit: '600 A',
        busCapacitance: '3300 uF',
        tuningRatio: 0.9,
      },
      tuning: { streamerCapacitance: '6 pF' },
    },
  },
];
