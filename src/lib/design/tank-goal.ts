/**
 * The tank-capacitance goal: given the capacitance that puts the tap where the builder wants it, change the
 * tank in the form it already has. A single capacitor gets the value; a bank of equal units keeps its units
 * (value and rating) and gets the strings and units per string that come nearest, or the goal says it cannot.
 */
import { formatQuantity } from '../format/quantity';
import { designField } from './registry';

export type TankForm =
  | { mode: 'single'; capacitance: string }
  | { mode: 'bank'; unitCapacitance: number; unitCapacitanceText: string; unitVoltage: number; series: number; parallel: number }
  | { mode: 'none' };

export type TankChange = { path: 'tank.mode' | 'tank.capacitance' | 'tank.series' | 'tank.parallel'; label: string; from: string; to: string };

export type TankProposal =
  | { ok: true; changes: TankChange[]; achieved: number; message: string }
  | { ok: false; message: string };

/** A bank's value within this of the goal is accepted; further off, the goal says it cannot. */
export const BANK_TOLERANCE = 0.05;
/** Most series units per string tried: the string keeps at least its voltage rating, and rarely needs more than twice the units. */
const SERIES_FACTOR = 2;

const capText = (c: number) => formatQuantity(c, 'capacitance', { digits: 3 }).replace('µ', 'u');

/** The tank change that gives `capacitance` (F), in the tank's own form, with every change named by its label. */
export function proposeTank(capacitance: number, tank: TankForm): TankProposal {
  const bounds = designField('tank.capacitance').bounds!;
  if (!Number.isFinite(capacitance) || capacitance <= 0) return { ok: false, message: 'No positive tank capacitance puts the tap there.' };
  if (capacitance < bounds.min || capacitance > bounds.max) {
    return {
      ok: false,
      message: `This tap needs ${capText(capacitance)} of tank capacitance, outside what a tank can be (${bounds.label}); choose a tap nearer the middle of the primary.`,
    };
  }
  if (tank.mode === 'none' || tank.mode === 'single') {
    const label = designField('tank.capacitance').label;
    const to = capText(capacitance);
    const changes: TankChange[] = [];
    if (tank.mode === 'none') changes.push({ path: 'tank.mode', label: 'Tank capacitor', from: 'none', to: 'one capacitor' });
    changes.push({ path: 'tank.capacitance', label, from: tank.mode === 'single' ? tank.capacitance : '', to });
    return { ok: true, changes, achieved: capacitance, message: `${label} set to ${to}.` };
  }
  const { unitCapacitance: cu, series: s0, parallel: p0 } = tank;
  if (!Number.isFinite(cu) || cu <= 0) return { ok: false, message: `Fix ${designField('tank.unitCapacitance').label} and the string counts first; the bank's units are needed to propose strings.` };
  let best: { series: number; parallel: number; achieved: number } | null = null;
  for (let series = s0; series <= Math.max(s0, Math.ceil(s0 * SERIES_FACTOR)); series++) {
    const parallel = Math.max(1, Math.round((capacitance * series) / cu));
    const achieved = (cu * parallel) / series;
    if (!best || Math.abs(achieved / capacitance - 1) < Math.abs(best.achieved / capacitance - 1) - 1e-12) best = { series, parallel, achieved };
    if (Math.abs(achieved / capacitance - 1) <= BANK_TOLERANCE / 5) break;
  }
  const off = Math.abs(best!.achieved / capacitance - 1);
  if (off > BANK_TOLERANCE) {
    return {
      ok: false,
      message:
        `Strings of ${tank.unitCapacitanceText} units cannot make ${capText(capacitance)} within ${BANK_TOLERANCE * 100} % while keeping at least ${s0} in each string ` +
        `(nearest ${capText(best!.achieved)}); use units of another value, or move the tap.`,
    };
  }
  const changes: TankChange[] = [];
  if (best!.series !== s0) changes.push({ path: 'tank.series', label: designField('tank.series').label, from: String(s0), to: String(best!.series) });
  if (best!.parallel !== p0) changes.push({ path: 'tank.parallel', label: designField('tank.parallel').label, from: String(p0), to: String(best!.parallel) });
  const what = changes.length ? changes.map((c) => `${c.label} ${c.from} → ${c.to}`).join(', ') : 'nothing changed: the bank already gives it';
  return {
    ok: true,
    changes,
    achieved: best!.achieved,
    message: `${what}; the bank gives ${capText(best!.achieved)} for the ${capText(capacitance)} asked (${tank.unitCapacitanceText} units kept).`,
  };
}
