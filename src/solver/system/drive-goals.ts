import { onTimeForPeakCurrent, tankCapacitanceForPeakCurrent } from '../drive/goals';
import { solve } from '../solve';
import { inductanceForResonance, solveTap } from '../tuning/tap';
import type { DesignSI, SolidStateSupplySI } from '../types';
import { driveSettings } from './drive';
import { minimumTap, primaryInductanceAtTap } from './primary';

type Answer<T> = { ok: true; value: T } | { ok: false; reason: string };

function bridgeOf(d: DesignSI): SolidStateSupplySI | null {
  return d.supply?.kind === 'solid-state' ? d.supply : null;
}

/** The burst of a design as solved, or why there is none. */
function burstOf(d: DesignSI) {
  const u = bridgeOf(d);
  if (!u) return { ok: false as const, reason: 'the design has no solid-state supply' };
  const r = solve(d);
  if (!r.drive) return { ok: false as const, reason: 'the design has no simulated burst: it needs a primary, and a tank with a tap within reach for a dual-resonant coil' };
  return { ok: true as const, supply: u, result: r, drive: r.drive };
}

/** Shortest interrupter on-time at which the peak primary current reaches `peak` (the drive family's goal, on the design's circuit). */
export function onTimeForTargetPeak(d: DesignSI, peak: number): Answer<number> {
  const b = burstOf(d);
  if (!b.ok) return b;
  const g = onTimeForPeakCurrent(driveSettings(b.supply), { ...b.drive.circuit }, peak);
  return g.onTime === null ? { ok: false, reason: g.reason ?? 'not reached' } : { ok: true, value: g.onTime };
}

/**
 * Tank capacitance (and so surge impedance) that gives the peak primary current `peak` at the design's
 * on-time, the primary retuned by its tap to the same frequency (the drive family's goal).
 */
export function tankForTargetPeak(d: DesignSI, peak: number): Answer<{ capacitance: number; surgeImpedance: number }> {
  const b = burstOf(d);
  if (!b.ok) return b;
  if (b.supply.topology !== 'dual-resonant') return { ok: false, reason: 'a single-resonant coil has no primary tank' };
  const { C1: _c1, ...rest } = b.drive.circuit;
  const g = tankCapacitanceForPeakCurrent(driveSettings(b.supply), rest, peak, b.drive.primaryFrequency);
  if (g.capacitance === null || g.surgeImpedance === null) return { ok: false, reason: g.reason ?? 'not reached' };
  return { ok: true, value: { capacitance: g.capacitance, surgeImpedance: g.surgeImpedance } };
}

/** Primary tap (turns from the inner end) that tunes primary + tank to `ratio` × the tuning target. */
export function tapForTuningRatio(d: DesignSI, ratio: number): Answer<number> {
  if (!d.primary) return { ok: false, reason: 'the design has no primary' };
  const r = solve(d);
  if (!r.tuning || !r.tank) return { ok: false, reason: 'the design has no tank to tune' };
  const p = d.primary;
  const tap = solveTap((t) => primaryInductanceAtTap(p, t), inductanceForResonance(ratio * r.tuning.targetFrequency, r.tank.capacitance), minimumTap(p), p.turns);
  return tap.inRange && tap.tapTurns !== null ? { ok: true, value: tap.tapTurns } : { ok: false, reason: 'no tap of this primary reaches that frequency with this tank' };
}
