import { COUPLING_SOLID_STATE_HIGH, COUPLING_SPARK_GAP_TYPICAL, resonantFrequencyLC } from '../../solver';
import { calibratedTuning } from '../buildsheet/calibration';
import { capacitance, frequency, lengthShort, sig, tapPosition } from '../buildsheet/format';
import type { Rule, RuleOutcome, TroubleshootContext } from './types';

import { METRES_PER_INCH as INCH } from '../format/length';
/** Bare-coil frequency from Wheeler + Medhurst is within about 5 % (R. G. Medhurst, Wireless Engineer 24, 1947, his stated accuracy; builders' reports on the Tesla Coil Mailing List, 1996–1997). */
export const FREQUENCY_AGREEMENT = 0.05;
/** Primary tuned a little below the secondary, about 5–10 % (T. Fritz, Tesla Coil Mailing List, May 2006; hvtesla.com tuning notes; common practice). */
export const PRIMARY_BELOW_MAX = 0.1;
export const PRIMARY_ABOVE_MAX = 0.01;
/** Tank within ±15 % of the transformer's resonant value. */
export const RESONANT_BAND = 0.15;
export const LTR_EXCESS = 1.5;
export const BANK_MARGIN_MIN = 2;
export const TOPLOAD_MIN_RATIO = 2.5;
export const PRIMARY_CLEARANCE_MIN = 1 * INCH;
export const SPARK_SHORTFALL = 0.5;
export const TOPLOAD_LARGE_FACTOR = 1.5;
/** The trip counts as firing early when it is reached before this share of the on-time (our threshold). */
export const TRIP_EARLY_SHARE = 0.9;
/** A measured peak within this share of the trip setting means the trip is what ends the bursts (our threshold). */
export const TRIP_MEASURED_SHARE = 0.95;
/** Feedback delay of a current transformer, gate drive and switches without compensation, about 150 ns (from memory). */
export const FEEDBACK_DELAY = 150e-9;
/** Phase lag above which the switches turn off with current still flowing: 10° of the primary period (common practice). */
export const PHASE_LAG_MAX_DEG = 10;
/** Bus droop over one burst above 10 % of the bus (common practice). */
export const BUS_DROOP_MAX = 0.1;

const pct = (x: number) => `${(x * 100).toFixed(1)} %`;
const triggered = (finding: string): RuleOutcome => ({ status: 'triggered', finding });
const clear = (finding: string): RuleOutcome => ({ status: 'clear', finding });
const unknown = (finding: string): RuleOutcome => ({ status: 'unknown', finding });
const notApplicable = (finding: string): RuleOutcome => ({ status: 'not-applicable', finding });
const isSparkGap = (ctx: TroubleshootContext) => ctx.design.supply?.kind !== 'solid-state';
const current = (a: number) => `${sig(a, 3)} A`;
const micro = (t: number) => `${sig(t * 1e6, 3)} µs`;

/** The k to judge: measured, then adopted, then the prediction at the tap, then with all turns. */
function couplingOf(ctx: TroubleshootContext): { k: number; from: string } | null {
  if (ctx.bench.coupling !== undefined) return { k: ctx.bench.coupling, from: 'measured' };
  if (ctx.calibration.coupling !== undefined) return { k: ctx.calibration.coupling, from: 'adopted' };
  const c = ctx.result.coupling;
  if (!c) return null;
  return c.kAtTap !== null ? { k: c.kAtTap, from: 'predicted at the tap' } : { k: c.k, from: 'predicted, all turns' };
}

export const RULES: readonly Rule[] = [
  {
    id: 'tap-from-prediction-off',
    symptoms: ['short-sparks'],
    cause: 'The tap was set from a predicted frequency your coil does not have',
    threshold: `measured loaded frequency more than ${pct(FREQUENCY_AGREEMENT)} from the prediction`,
    source: 'Wheeler + Medhurst agree with measurement to about 5 % (TCML 1999/July/msg00259)',
    nextCheck: 'Adopt the measured loaded frequency on the bench page, move the tap to the calibrated position, then try taps either side at low power.',
    evaluate(ctx) {
      const fm = ctx.bench.loadedFrequency;
      const fp = ctx.result.system?.resonantFrequency;
      if (fp === undefined) return unknown('The design has no predicted loaded frequency.');
      if (fm === undefined) return unknown('No measured loaded frequency in the bench log; measure it with the topload fitted.');
      const rel = (fm - fp) / fp;
      if (Math.abs(rel) <= FREQUENCY_AGREEMENT) return clear(`Measured ${frequency(fm)} is within ${pct(Math.abs(rel))} of the predicted ${frequency(fp)}.`);
      if (ctx.calibration.loadedFrequency !== undefined && Math.abs(ctx.calibration.loadedFrequency - fm) / fm < 1e-6) {
        return clear(`Measured ${frequency(fm)} is ${pct(rel)} from the prediction, and it is adopted: the tap is calibrated to it.`);
      }
      const cal = calibratedTuning(ctx.design, ctx.result, { ...ctx.calibration, loadedFrequency: fm });
      const tap = cal?.tapTurns != null ? ` The tap for it is ${sig(cal.tapTurns, 4)} turns (${tapPosition(cal.tapTurns)}).` : '';
      return triggered(`Measured ${frequency(fm)} is ${pct(rel)} from the predicted ${frequency(fp)}.${tap}`);
    },
  },
  {
    id: 'primary-off-secondary',
    symptoms: ['short-sparks'],
    cause: 'The primary at its tap does not resonate just below the secondary',
    threshold: `primary (measured L at the tap with the tank) more than ${pct(PRIMARY_ABOVE_MAX)} above or ${pct(PRIMARY_BELOW_MAX)} below the secondary`,
    source: 'tune the primary a little below the loaded secondary, about 5–10 % (hvtesla.com/tuning.html; TCML 2001/May/msg00905)',
    nextCheck: 'Move the tap: outward (more turns) when the primary is above the secondary, inward when far below; re-measure the inductance at the tap.',
    evaluate(ctx) {
      if (!isSparkGap(ctx)) return notApplicable('For a bridge-driven coil see the rule on the primary tuned above the secondary.');
      const L = ctx.bench.primaryInductance;
      const C = ctx.calibration.tankCapacitance ?? ctx.result.tank?.capacitance;
      const fs = ctx.bench.loadedFrequency ?? ctx.result.system?.resonantFrequency;
      if (C === undefined || fs === undefined) return unknown('The design has no tank or secondary to compare.');
      if (L === undefined) return unknown('No measured primary inductance at the tap in the bench log.');
      const fpri = resonantFrequencyLC(L, C);
      const rel = fpri / fs - 1;
      const which = ctx.bench.loadedFrequency !== undefined ? 'measured' : 'predicted';
      const text = `Primary ${frequency(fpri)} (${capacitance(C)} with the measured inductance) against the ${which} secondary ${frequency(fs)}: ${rel >= 0 ? '+' : ''}${pct(rel)}.`;
      return rel > PRIMARY_ABOVE_MAX || rel < -PRIMARY_BELOW_MAX ? triggered(text) : clear(text);
    },
  },
  {
    id: 'tap-out-of-range',
    symptoms: ['short-sparks'],
    cause: 'The primary cannot reach the secondary’s frequency at any tap',
    threshold: 'no tap between a quarter turn and all turns tunes the primary to the target',
    source: 'the solver’s tap search (LC resonance of primary and tank)',
    nextCheck: 'Add primary turns or tank capacitance (or reduce them when even a quarter turn is too much).',
    evaluate(ctx) {
      const t = ctx.result.tuning;
      if (!t) return unknown('The design has no primary and tank to tune.');
      return t.inRange && t.tapTurns !== null
        ? clear(`The predicted tap is ${sig(t.tapTurns, 4)} turns of ${sig(ctx.design.primary!.turns, 4)}.`)
        : triggered(`With every turn the primary and tank resonate at ${frequency(t.primaryFrequencyAllTurns)}; the target is ${frequency(t.targetFrequency)}.`);
    },
  },
  {
    id: 'coupling-high',
    symptoms: ['racing-sparks', 'primary-strikes'],
    cause: 'Coupling too tight',
    threshold: `k above ${COUPLING_SPARK_GAP_TYPICAL.high} for a spark-gap coil, above ${COUPLING_SOLID_STATE_HIGH} for a solid-state coil`,
    source: 'spark gap 0.05–0.2 (Stefan’s tech notes, hotstreamer.deanostoybox.com/stk/tc/TECH4.HTM); solid state about 0.15–0.3 (from memory)',
    nextCheck: 'Raise the secondary a little at a time until racing sparks stop, and look for a loose or raised turn where they start.',
    evaluate(ctx) {
      const c = couplingOf(ctx);
      if (!c) return unknown('The design has no primary, so no coupling.');
      const limit = isSparkGap(ctx) ? COUPLING_SPARK_GAP_TYPICAL.high : COUPLING_SOLID_STATE_HIGH;
      const e = ctx.result.coupling?.elevationForTargetCoupling;
      const hint = e != null ? ` The secondary elevation for the target coupling is ${lengthShort(e)}.` : '';
      const text = `k = ${sig(c.k, 3)} (${c.from}); the limit for this kind of coil is ${limit}.`;
      return c.k > limit ? triggered(text + hint) : clear(text);
    },
  },
  {
    id: 'coupling-low',
    symptoms: ['short-sparks'],
    cause: 'Coupling too loose for a spark gap',
    threshold: `k below ${COUPLING_SPARK_GAP_TYPICAL.low} (spark-gap coils)`,
    source: 'spark gap 0.05–0.2 (Stefan’s tech notes, hotstreamer.deanostoybox.com/stk/tc/TECH4.HTM)',
    nextCheck: 'Lower the secondary or bring the primary closer, then check for racing sparks again.',
    evaluate(ctx) {
      if (!isSparkGap(ctx)) return notApplicable('This rule is for spark-gap coils.');
      const c = couplingOf(ctx);
      if (!c) return unknown('The design has no primary, so no coupling.');
      const text = `k = ${sig(c.k, 3)} (${c.from}).`;
      return c.k < COUPLING_SPARK_GAP_TYPICAL.low ? triggered(text) : clear(text);
    },
  },
  {
    id: 'tank-near-resonant',
    symptoms: ['supply-trips'],
    cause: 'Tank capacitor near the transformer’s resonant value',
    threshold: `tank within ±${pct(RESONANT_BAND)} of C = I/(2π f V)`,
    source: 'resonant rise can ring the transformer up to destructive voltages (TCML 2003/June/msg00590; B. Hickman, TCML 1999/January/msg00788)',
    nextCheck: 'Move to a larger-than-resonant tank (about 1.5 × the resonant value) or a smaller one, and check the safety gap setting.',
    evaluate(ctx) {
      const s = ctx.result.supply;
      if (!s || s.kind !== 'transformer') return notApplicable('This rule is for transformer supplies.');
      if (s.tankToResonantRatio === null || s.resonantCapacitance === null) return unknown('The design has no tank.');
      const text = `Tank / resonant = ${sig(s.tankToResonantRatio, 3)} × (resonant value ${capacitance(s.resonantCapacitance)}).`;
      return Math.abs(s.tankToResonantRatio - 1) <= RESONANT_BAND ? triggered(text) : clear(text);
    },
  },
  {
    id: 'tank-too-large',
    symptoms: ['short-sparks'],
    cause: 'Tank too large for the transformer to charge',
    threshold: `tank more than ${LTR_EXCESS} × the larger-than-resonant value 1/(4 f Z)`,
    source: '1/(4 f Z) charges to full peak in a quarter cycle (bartmcguyer.com, note 1); the 1.5 × margin is our threshold',
    nextCheck: 'Switch out strings of the bank to come nearer the larger-than-resonant value, then retune the tap.',
    evaluate(ctx) {
      const s = ctx.result.supply;
      if (!s || s.kind !== 'transformer') return notApplicable('This rule is for transformer supplies.');
      const C = ctx.result.tank?.capacitance;
      if (C === undefined || s.ltrCapacitance === null) return unknown('The design has no tank.');
      const text = `Tank ${capacitance(C)} is ${sig(C / s.ltrCapacitance, 3)} × the larger-than-resonant ${capacitance(s.ltrCapacitance)}.`;
      return C > LTR_EXCESS * s.ltrCapacitance ? triggered(text) : clear(text);
    },
  },
  {
    id: 'bank-voltage-margin',
    symptoms: ['supply-trips', 'short-sparks'],
    cause: 'Tank bank rated too close to the supply peak (a failing capacitor shorts the supply)',
    threshold: `string rating below ${BANK_MARGIN_MIN} × the supply peak`,
    source: 'common practice, no primary source found',
    nextCheck: 'With the power off and the bank shorted, check each capacitor; add units in series.',
    evaluate(ctx) {
      if (!isSparkGap(ctx)) return notApplicable('A bridge does not charge the bank to the bus; see the rule on the bank in the burst.');
      const t = ctx.result.tank;
      if (!t) return unknown('The design has no tank.');
      if (t.ratingMargin === null) return unknown('The design gives only a capacitance, no voltage rating; give the bank as units.');
      const text = `The string is rated ${sig(t.ratingMargin, 3)} × the supply peak.`;
      return t.ratingMargin < BANK_MARGIN_MIN ? triggered(text) : clear(text);
    },
  },
  {
    id: 'topload-small',
    symptoms: ['racing-sparks'],
    cause: 'Topload missing or small, so streamers break out from the top turns',
    threshold: `topload overall diameter below ${TOPLOAD_MIN_RATIO} × the secondary diameter`,
    source: 'toroid overall diameter normally 2.5–5 × the secondary (hvtesla.com/toroid_4.html)',
    nextCheck: 'Fit a larger topload, or lower it until the top turns stop breaking out.',
    evaluate(ctx) {
      const t = ctx.design.topload;
      const d = ctx.result.secondary?.windingDiameter ?? ctx.design.secondary.formDiameter;
      if (!t) return triggered('The design has no topload.');
      const D = t.shape === 'toroid' ? t.majorDiameter : t.diameter;
      const text = `Topload ${lengthShort(D)} is ${sig(D / d, 3)} × the winding diameter.`;
      return D / d < TOPLOAD_MIN_RATIO ? triggered(text) : clear(text);
    },
  },
  {
    id: 'no-breakout-point',
    symptoms: ['short-sparks'],
    cause: 'A smooth topload without a breakout point holds the charge',
    threshold: 'answer: no breakout point',
    source: 'mount the topload just below breakout and find the point by trial (hvtesla.com/toroid_4.html)',
    nextCheck: 'Add a short rod or point to the topload, and try the topload a little lower.',
    question: 'breakoutPoint',
    evaluate(ctx) {
      if (!ctx.design.topload) return notApplicable('The design has no topload.');
      const a = ctx.answers.breakoutPoint;
      if (a === undefined) return unknown('Answer the question about a breakout point.');
      return a ? clear('The topload has a breakout point.') : triggered('The topload has no breakout point.');
    },
  },
  {
    id: 'topload-large-for-power',
    symptoms: ['short-sparks'],
    cause: 'Toroid large for the input power, so it rarely breaks out',
    threshold: `toroid overall diameter above ${TOPLOAD_LARGE_FACTOR} × (expected spark length ÷ 2.5)`,
    source: 'Freau: toroid major diameter ≈ spark length ÷ 2.5 (TCML 1998); the 1.5 × margin is our threshold',
    nextCheck: 'Add a breakout point or use a smaller toroid at this power.',
    evaluate(ctx) {
      const t = ctx.design.topload;
      if (!t || t.shape !== 'toroid') return notApplicable('This rule is for toroids.');
      const est = ctx.result.supply?.sparkLengthEstimate;
      if (est == null) return notApplicable('No spark-length estimate (transformer supplies only).');
      const scale = est / 2.5;
      const text = `Toroid ${lengthShort(t.majorDiameter)} against Freau’s ${lengthShort(scale)} for the estimated ${lengthShort(est)} spark.`;
      return t.majorDiameter > TOPLOAD_LARGE_FACTOR * scale ? triggered(text) : clear(text);
    },
  },
  {
    id: 'rf-ground',
    symptoms: ['short-sparks', 'racing-sparks', 'primary-strikes', 'supply-trips'],
    cause: 'No dedicated RF ground',
    threshold: 'answer: no dedicated RF ground',
    source: 'a heavy, dedicated RF ground, not the house wiring ground (TCML 1999/December/msg00046, 1999/January/msg00639)',
    nextCheck: 'Run heavy cable from the secondary base, strike rail, safety gaps and transformer case to ground rods; keep the controls on the mains earth.',
    question: 'rfGround',
    evaluate(ctx) {
      const a = ctx.answers.rfGround;
      if (a === undefined) return unknown('Answer the question about the RF ground.');
      return a ? clear('The coil has a dedicated RF ground.') : triggered('The coil has no dedicated RF ground.');
    },
  },
  {
    id: 'strike-rail',
    symptoms: ['primary-strikes'],
    cause: 'No strike rail to catch strikes before they reach the primary',
    threshold: 'answer: no strike rail',
    source: 'a grounded rail about 2 in outside and above the primary, not a closed loop (D. C. Cox, TCML 1998/january/msg00706)',
    nextCheck: 'Fit a grounded strike rail (a 7/8 turn with a gap) and connect it to the RF ground.',
    question: 'strikeRail',
    evaluate(ctx) {
      const a = ctx.answers.strikeRail;
      if (a === undefined) return unknown('Answer the question about a strike rail.');
      return a ? clear('The coil has a strike rail.') : triggered('The coil has no strike rail.');
    },
  },
  {
    id: 'primary-clearance',
    symptoms: ['primary-strikes', 'racing-sparks'],
    cause: 'The primary’s inner turn sits close to the secondary',
    threshold: `radial gap between conductor surfaces below ${lengthShort(PRIMARY_CLEARANCE_MIN)}`,
    source: 'inner turn about 1.5–2 in from the form, 1 in on a small coil (D. C. Cox, TCML 1998; TCML 1997/june/msg00637)',
    nextCheck: 'Move the inner turn out, raise the secondary, or insulate between them; RF creeps over surfaces 3–4 × farther than through air.',
    evaluate(ctx) {
      const p = ctx.design.primary;
      const sec = ctx.result.secondary;
      if (!p || !sec) return unknown('The design has no primary.');
      const gap = (p.innerDiameter - p.conductorDiameter - sec.windingDiameter - ctx.design.secondary.wire.insulatedDiameter) / 2;
      const text = `The gap between the inner primary turn and the winding is ${lengthShort(gap)}.`;
      return gap < PRIMARY_CLEARANCE_MIN ? triggered(text) : clear(text);
    },
  },
  {
    id: 'supply-ground-fault',
    symptoms: ['supply-trips'],
    cause: 'The transformer’s ground-fault protection trips in Tesla-coil use',
    threshold: 'answer: the transformer has secondary ground-fault protection',
    source: 'such transformers trip at about 15 mA to ground (UL 2161 / NEC 1999; TCML 2002/May/msg00238)',
    nextCheck: 'The protection is a safety feature: do not bypass it. Use a supply intended for this work, and take professional advice.',
    question: 'groundFaultProtection',
    evaluate(ctx) {
      if (ctx.design.supply?.kind === 'solid-state') return notApplicable('This rule is for transformer supplies.');
      const a = ctx.answers.groundFaultProtection;
      if (a === undefined) return unknown('Answer the question about ground-fault protection.');
      return a ? triggered('The transformer has ground-fault protection.') : clear('The transformer has no ground-fault protection.');
    },
  },
  {
    id: 'spark-below-estimate',
    symptoms: ['short-sparks'],
    cause: 'Sparks well short of what the input power usually gives',
    threshold: `measured spark below ${pct(SPARK_SHORTFALL)} of Freau’s estimate`,
    source: 'Freau: inches ≈ 1.7 × √watts, a rough rule (TCML 1998); the 50 % threshold is ours',
    nextCheck: 'Work through the triggered causes above; re-measure the straight-line length to a grounded target.',
    evaluate(ctx) {
      const est = ctx.result.supply?.sparkLengthEstimate;
      if (est == null) return notApplicable('No spark-length estimate (transformer supplies only).');
      const m = ctx.bench.sparkLength;
      if (m === undefined) return unknown('No measured spark length in the bench log.');
      const text = `Measured ${lengthShort(m)} against an estimate of ${lengthShort(est)} (${pct(m / est)}).`;
      return m < SPARK_SHORTFALL * est ? triggered(text) : clear(text);
    },
  },
  {
    id: 'trip-early',
    symptoms: ['short-sparks', 'supply-trips'],
    cause: 'The over-current trip ends the bursts before the on-time',
    threshold: `the primary current reaches the trip before ${pct(TRIP_EARLY_SHARE)} of the on-time, or a measured peak within ${pct(1 - TRIP_MEASURED_SHARE)} of the trip setting`,
    source: 'the burst simulation (peak current against time); the shares are our thresholds',
    nextCheck: 'Shorten the on-time to what the trip allows, or lower the bus voltage or raise the surge impedance (less tank capacitance); raise the trip only within the switches’ pulsed rating.',
    evaluate(ctx) {
      const d = ctx.result.drive;
      if (isSparkGap(ctx)) return notApplicable('This rule is for bridge-driven coils.');
      if (!d) return unknown('The design has no simulated burst (it needs a primary, and a tank for a dual-resonant coil).');
      const trip = ctx.bench.tripSetting ?? d.currentLimit;
      if (trip === null) return unknown('No trip setting in the design or the bench log.');
      const measured = ctx.bench.peakPrimaryCurrent;
      if (measured !== undefined && measured >= TRIP_MEASURED_SHARE * trip) {
        return triggered(`Measured peak ${current(measured)} is at the ${current(trip)} trip: the trip is ending the bursts.`);
      }
      const reached = timeToReach(d, trip);
      if (reached !== null && reached < TRIP_EARLY_SHARE * d.onTime) {
        return triggered(`The simulated current reaches the ${current(trip)} trip after ${micro(reached)} of the ${micro(d.onTime)} on-time.`);
      }
      return clear(`The simulated peak ${current(d.peakPrimaryCurrent)} stays below the ${current(trip)} trip through the ${micro(d.onTime)} on-time.`);
    },
  },
  {
    id: 'feedback-phase-lag',
    symptoms: ['supply-trips'],
    cause: 'Hard switching: the feedback lags the primary current, so the bridge switches with current flowing',
    threshold: `feedback delay of about ${sig(FEEDBACK_DELAY * 1e9, 3)} ns (from memory) more than ${PHASE_LAG_MAX_DEG}° of the primary period, with no phase-lead compensation`,
    source: 'zero-current switching needs the feedback in phase with the primary current (common practice); delay figure from memory',
    nextCheck: 'Scope the gate drive against the primary current (through a current transformer) and add phase lead, or shorten the feedback path.',
    question: 'phaseLead',
    evaluate(ctx) {
      const d = ctx.result.drive;
      if (isSparkGap(ctx)) return notApplicable('This rule is for bridge-driven coils.');
      if (!d) return unknown('The design has no simulated burst.');
      const f = ctx.bench.primaryRingFrequency ?? d.primaryFrequency;
      const lag = 360 * f * FEEDBACK_DELAY;
      const text = `At ${frequency(f)} a ${sig(FEEDBACK_DELAY * 1e9, 3)} ns delay is ${sig(lag, 3)}° of a period.`;
      if (lag <= PHASE_LAG_MAX_DEG) return clear(text);
      const a = ctx.answers.phaseLead;
      if (a === undefined) return unknown(`${text} Answer the question about phase-lead compensation.`);
      return a ? clear(`${text} The feedback has phase-lead compensation.`) : triggered(`${text} The feedback has no phase-lead compensation.`);
    },
  },
  {
    id: 'bus-droop',
    symptoms: ['short-sparks', 'supply-trips'],
    cause: 'The bus sags during each burst',
    threshold: `bus droop over one burst above ${pct(BUS_DROOP_MAX)} of the bus voltage`,
    source: 'common practice of bridge-driven coil builders; the droop from the burst energy and the bus capacitance',
    nextCheck: 'Add bus capacitance (rated for the ripple current), shorten the on-time, or check the rectifier and the mains feed.',
    evaluate(ctx) {
      const d = ctx.result.drive;
      if (isSparkGap(ctx)) return notApplicable('This rule is for bridge-driven coils.');
      if (!d) return unknown('The design has no simulated burst.');
      if (d.busDroop === null) return unknown('Give the bus capacitance to compute the droop.');
      const text = `The bus falls by ${sig(d.busDroop, 3)} V of ${sig(d.busVoltage, 3)} V (${pct(d.busDroop / d.busVoltage)}) over a burst.`;
      return d.busDroop > BUS_DROOP_MAX * d.busVoltage ? triggered(text) : clear(text);
    },
  },
  {
    id: 'primary-above-secondary-bridge',
    symptoms: ['short-sparks', 'supply-trips'],
    cause: 'The primary is tuned above the secondary',
    threshold: 'primary (measured ring-down with the bridge disconnected, or predicted) above the secondary (measured or predicted loaded frequency)',
    source: 'dual-resonant coils tune the primary below the secondary, about 0.85–0.95 ×, since streamers pull the secondary down (common practice)',
    nextCheck: 'Move the tap outward (more turns) or add tank capacitance, then measure the ring-down again with the bridge disconnected.',
    evaluate(ctx) {
      const d = ctx.result.drive;
      if (isSparkGap(ctx)) return notApplicable('This rule is for bridge-driven coils.');
      if (ctx.design.supply?.kind === 'solid-state' && ctx.design.supply.topology === 'single-resonant') return notApplicable('A single-resonant coil has no primary tank.');
      const fp = ctx.bench.primaryRingFrequency ?? d?.primaryFrequency;
      const fs = ctx.bench.loadedFrequency ?? ctx.result.tuning?.targetFrequency ?? ctx.result.system?.resonantFrequency;
      if (fp === undefined || fs === undefined) return unknown('The design has no primary tank or secondary to compare.');
      const which = (m: boolean) => (m ? 'measured' : 'predicted');
      const text = `Primary ${frequency(fp)} (${which(ctx.bench.primaryRingFrequency !== undefined)}) against the secondary ${frequency(fs)} (${which(ctx.bench.loadedFrequency !== undefined)}): ratio ${sig(fp / fs, 3)}.`;
      return fp > fs ? triggered(text) : clear(text);
    },
  },
  {
    id: 'bank-burst-stress',
    symptoms: ['supply-trips', 'short-sparks'],
    cause: 'The tank capacitors are overstressed in the burst (a failing capacitor detunes or shorts the tank)',
    threshold: "each capacitor's share of the tank's peak voltage above its rating, or each string's RMS current above the capacitors' RMS rating",
    source: 'the burst simulation against the capacitors’ data-sheet ratings (common practice)',
    nextCheck: 'With the bus discharged, check each capacitor for heat and capacitance; add units in series for voltage and strings in parallel for current.',
    evaluate(ctx) {
      const d = ctx.result.drive;
      if (isSparkGap(ctx)) return notApplicable('This rule is for bridge-driven coils.');
      if (!d || d.capacitorPeakVoltage === null) return unknown('The design has no simulated tank.');
      const b = d.bank;
      if (!b) return unknown('The tank is given only as a capacitance; give it as a bank of capacitors with their ratings.');
      const over: string[] = [];
      if (b.voltageMargin < 1) over.push(`each capacitor sees ${sig(b.unitPeakVoltage, 3)} V peak against a ${sig(b.unitVoltage, 3)} V rating`);
      if (b.currentMargin !== null && b.currentMargin < 1) over.push(`each string carries ${sig(b.stringRmsCurrent, 3)} A RMS against a ${sig(b.unitRmsCurrent!, 3)} A rating`);
      if (over.length) return triggered(`In the burst ${over.join(', and ')}.`);
      const cur = b.currentMargin === null ? ' (no RMS current rating given)' : `, ${sig(b.currentMargin, 3)} × the RMS current`;
      return clear(`The capacitors are rated ${sig(b.voltageMargin, 3)} × their peak voltage${cur}.`);
    },
  },
];

/** When the simulated primary current first reaches `level`, from the burst waveform; null if it never does. */
function timeToReach(d: NonNullable<TroubleshootContext['result']['drive']>, level: number): number | null {
  const w = d.waveform;
  for (let i = 0; i < w.time.length; i++) if (Math.abs(w.primaryCurrent[i]) >= level) return w.time[i];
  return null;
}
