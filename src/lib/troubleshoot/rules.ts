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

const pct = (x: number) => `${(x * 100).toFixed(1)} %`;
const triggered = (finding: string): RuleOutcome => ({ status: 'triggered', finding });
const clear = (finding: string): RuleOutcome => ({ status: 'clear', finding });
const unknown = (finding: string): RuleOutcome => ({ status: 'unknown', finding });
const notApplicable = (finding: string): RuleOutcome => ({ status: 'not-applicable', finding });
const isSparkGap = (ctx: TroubleshootContext) => ctx.design.supply?.kind !== 'solid-state';

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
];
