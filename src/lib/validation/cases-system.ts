import { defineCase, q } from './inputs';
import type { ReferenceCase } from './types';
import { METRES_PER_INCH } from '../../solver/constants';
import { bankCapacitance, bankVoltageRating } from '../../solver/tank/bank';
import { capacitorEnergy, powerAtBreakRate } from '../../solver/tank/energy';
import { sparkLengthFreau } from '../../solver/tank/spark';
import { ltrCapacitanceTransformer, resonantCapacitanceTransformer } from '../../solver/tank/supply';
import { splitFrequencies, transferTime } from '../../solver/response/modes';
import { energyExchange } from '../../solver/response/exchange';
import { streamerCapacitanceForLength } from '../../solver/tuning/streamer';

// the tuned pair of the coupled-response case (50 µH with 20 nF, secondary 40 mH tuned to match): its
// primary frequency for the closed-form reference
const F0 = 1 / (2 * Math.PI * Math.sqrt(50e-6 * 20e-9));
const COUPLED =
  '"Electronics" lecture notes, §2.7 "Coupled, resonant circuits", eqs. (2.99)–(2.123), author not identified (fliphtml5.com/osspz/sqrh, confirmed); P. Drude, Ann. Phys. 13 (1904) 512–561 (from memory); F. E. Terman, Radio Engineers\' Handbook, 1943 (from memory)';

/** Reference cases for the system-level solver (tuning, tank, supply, coupled response). */
export const systemCases: ReferenceCase[] = [
  defineCase({
    id: 'nst-resonant-capacitance-6kv-30ma',
    quantity: 'Transformer-resonant tank capacitance',
    method: 'transformer-capacitance',
    source: 'Pete Lawrence, TCML June 2003 (pupman.com msg00590): a 6 kV / 30 mA NST resonates with 13.3 nF at 60 Hz',
    kind: 'worked-example',
    inputs: { voltage: q(6, 'kV'), current: q(30, 'mA'), lineFrequency: q(60, 'Hz') },
    reference: 13.3,
    unit: 'nF',
    tolerance: 0.005,
    compute: (x) => resonantCapacitanceTransformer(x.voltage, x.current, x.lineFrequency) * 1e9,
  }),
  defineCase({
    id: 'nst-resonant-capacitance-rule-50hz',
    quantity: 'Transformer-resonant tank capacitance, 50 Hz rule',
    method: 'transformer-capacitance',
    source: 'C = I/(2π f V), the capacitor resonant with the transformer\'s leakage reactance (common practice; P. Lawrence, Tesla Coil Mailing List, June 2003, pupman.com archive): nF ≈ 3.183 × mA / kV at 50 Hz',
    kind: 'closed-form',
    inputs: { voltage: q(10, 'kV'), current: q(50, 'mA'), lineFrequency: q(50, 'Hz') },
    reference: (3.183 * 50) / 10,
    unit: 'nF',
    tolerance: 2e-4,
    compute: (x) => resonantCapacitanceTransformer(x.voltage, x.current, x.lineFrequency) * 1e9,
  }),
  defineCase({
    id: 'ltr-to-resonant-ratio',
    quantity: 'LTR over resonant capacitance',
    method: 'transformer-capacitance',
    source: 'C_LTR = 1/(4 f Z) against C_res = 1/(2π f Z): ratio π/2 ≈ 1.57 (B. McGuyer, "Note 1: LTR", bartmcguyer.com/notes/note-1-LTR.html; common practice)',
    kind: 'closed-form',
    inputs: { voltage: q(12, 'kV'), current: q(30, 'mA'), lineFrequency: q(60, 'Hz') },
    reference: Math.PI / 2,
    unit: '1',
    tolerance: 1e-12,
    compute: (x) => ltrCapacitanceTransformer(x.voltage, x.current, x.lineFrequency) / resonantCapacitanceTransformer(x.voltage, x.current, x.lineFrequency),
  }),
  defineCase({
    id: 'mmc-tray-capacitance',
    quantity: 'Series-parallel bank capacitance',
    method: 'tank-bank',
    source: 'hvtesla.com MMC notes: 0.15 µF / 2000 V units, a tray of 25 nF at 36 kV, i.e. 18 in series × 3 strings (hvtesla.com/mmc.html; common practice)',
    kind: 'worked-example',
    inputs: { unitCapacitance: q(0.15, 'uF'), series: 18, parallel: 3 },
    reference: 25,
    unit: 'nF',
    tolerance: 1e-12,
    compute: (x) => bankCapacitance(x.unitCapacitance, x.series, x.parallel) * 1e9,
  }),
  defineCase({
    id: 'mmc-tray-voltage-rating',
    quantity: 'Series-parallel bank voltage rating',
    method: 'tank-bank',
    source: 'hvtesla.com MMC notes: 18 × 2000 V units in series rated 36 kV (hvtesla.com/mmc.html; common practice)',
    kind: 'worked-example',
    inputs: { unitVoltage: q(2, 'kV'), series: 18 },
    reference: 36,
    unit: 'kV',
    tolerance: 1e-12,
    compute: (x) => bankVoltageRating(x.unitVoltage, x.series) / 1000,
  }),
  defineCase({
    id: 'stored-energy-half-cv-squared',
    quantity: 'Energy stored in the tank at the supply peak',
    method: 'stored-energy',
    source: 'E = ½CV² (any circuits text, e.g. Halliday, Resnick & Walker, Fundamentals of Physics, ch. 25 [from memory]); 20 nF at √2 × 12 kV',
    kind: 'closed-form',
    inputs: { capacitance: q(20, 'nF'), rmsVoltage: q(12, 'kV', { note: 'peak √2 × 12 kV = 16.97 kV' }) },
    reference: 2.88,
    unit: 'J',
    tolerance: 1e-12,
    compute: (x) => capacitorEnergy(x.capacitance, Math.SQRT2 * x.rmsVoltage),
  }),
  defineCase({
    id: 'break-rate-power',
    quantity: 'Power through the gap at a break rate',
    method: 'stored-energy',
    source: 'P = ½ · BPS · C · V² (R. Burnett, "Rotary spark gaps", richieburnett.co.uk/rotary.html; common practice): 2.88 J at 120 BPS',
    kind: 'closed-form',
    inputs: { energyPerBang: q(2.88, 'J'), breakRate: q(120, 'Hz') },
    reference: 345.6,
    unit: 'W',
    tolerance: 1e-12,
    compute: (x) => powerAtBreakRate(x.energyPerBang, x.breakRate),
  }),
  defineCase({
    id: 'freau-spark-length-1kw',
    quantity: "Spark length by Freau's rule",
    method: 'spark-length',
    source: 'J. Freau, Tesla Coil Mailing List, 1998 (pupman.com archive): 1.7 × √W inches; 1 kW gives about 54 in (common practice, single source, rough)',
    kind: 'common-practice',
    inputs: { inputPower: q(1000, 'W') },
    reference: 54,
    unit: 'in',
    tolerance: 0.005,
    compute: (x) => sparkLengthFreau(x.inputPower) / METRES_PER_INCH,
  }),
  defineCase({
    id: 'streamer-capacitance-per-foot',
    quantity: 'Streamer capacitance allowance',
    method: 'streamer-loading',
    source: 'T. Fritz, Tesla Coil Mailing List, May 2002 (pupman.com archive, msg00655): streamer model of about 1 pF per foot (common practice, single source)',
    kind: 'common-practice',
    inputs: { streamerLength: q(2.5, 'ft') },
    reference: 2.5,
    unit: 'pF',
    tolerance: 1e-12,
    compute: (x) => streamerCapacitanceForLength(x.streamerLength) * 1e12,
  }),
  defineCase({
    id: 'coupled-split-low',
    quantity: 'Lower normal-mode frequency of a tuned coupled pair',
    method: 'coupled-response',
    source: `f_lo = f0/√(1+k) (${COUPLED})`,
    kind: 'closed-form',
    inputs: { f0: q(100, 'kHz'), k: 0.2 },
    reference: 91.28709291752769,
    unit: 'kHz',
    tolerance: 1e-12,
    compute: (x) => splitFrequencies(x.f0, x.k).fLow / 1000,
  }),
  defineCase({
    id: 'coupled-split-high',
    quantity: 'Upper normal-mode frequency of a tuned coupled pair',
    method: 'coupled-response',
    source: `f_hi = f0/√(1−k) (${COUPLED})`,
    kind: 'closed-form',
    inputs: { f0: q(100, 'kHz'), k: 0.2 },
    reference: 111.80339887498948,
    unit: 'kHz',
    tolerance: 1e-12,
    compute: (x) => splitFrequencies(x.f0, x.k).fHigh / 1000,
  }),
  defineCase({
    id: 'coupled-transfer-time-small-k',
    quantity: 'First energy-transfer time, small k',
    method: 'coupled-response',
    source: `t₁ = 1/(2(f_hi − f_lo)) ≈ 1/(2 k f0) for small k (${COUPLED}); k = 0.01 at 100 kHz → 500 µs`,
    kind: 'closed-form',
    inputs: { f0: q(100, 'kHz'), k: 0.01 },
    reference: 500,
    unit: 'µs',
    tolerance: 1e-4,
    compute: (x) => transferTime(x.f0, x.k) * 1e6,
  }),
  defineCase({
    id: 'coupled-complete-transfer-k-5-13',
    quantity: 'Time of the first primary-energy minimum, k = 5/13 (integrated)',
    method: 'coupled-response',
    source: `t₁ from the normal modes (${COUPLED}); the primary empties completely at t₁ when f_hi/f_lo = √((1+k)/(1−k)) = 3/2, i.e. k = 5/13 (independent computation)`,
    kind: 'closed-form',
    inputs: { L1: q(50, 'uH'), C1: q(20, 'nF'), L2: q(40, 'mH'), k: q(5 / 13, '1', { note: '5/13' }), stepsPerCycle: 400 },
    // closed form t₁ = 1/(2 f0 (1/√(1−k) − 1/√(1+k))), written out so the reference does not use the solver
    reference: 1e6 / (2 * F0 * (1 / Math.sqrt(1 - 5 / 13) - 1 / Math.sqrt(1 + 5 / 13))),
    unit: 'µs',
    tolerance: 1e-3,
    // the secondary is tuned to the primary: C2 = L1·C1/L2
    compute: (x) => energyExchange({ L1: x.L1, C1: x.C1, L2: x.L2, C2: (x.L1 * x.C1) / x.L2, k: x.k }, { points: 2, stepsPerCycle: x.stepsPerCycle }).firstPrimaryMinimum! * 1e6,
  }),
];
