import { helixWireLength } from '../../solver';
import type { WindingPlan } from './plan';

/** A pause as the live figures need it: instants in ms; an open pause has no end. */
export interface PauseSpan {
  startedAt: number;
  endedAt: number | null;
}

/** Winding time so far, s: from the start to `now`, less every pause (an open pause counts up to `now`). */
export function elapsedWinding(startedAt: number, pauses: readonly PauseSpan[], now: number): number {
  const end = Math.max(now, startedAt);
  let paused = 0;
  for (const p of pauses) {
    const a = Math.max(p.startedAt, startedAt);
    const b = Math.min(p.endedAt ?? end, end);
    if (b > a) paused += b - a;
  }
  return Math.max(0, (end - startedAt - paused) / 1000);
}

/** Turns the winder has put on after `elapsed` seconds at `rpm`, capped at the plan. */
export function turnsAt(elapsed: number, rpm: number, planned: number): number {
  return Math.min(planned, (elapsed / 60) * rpm);
}

/** Wire in a helix of `turns` at the plan's pitch and diameter, m (the solver's helix length). */
export function wireFor(plan: Pick<WindingPlan, 'pitch' | 'windingDiameter'>, turns: number): number {
  return turns > 0 ? helixWireLength(turns, plan.windingDiameter, turns * plan.pitch) : 0;
}

export interface LiveFigures {
  /** s, pauses excluded */
  elapsed: number;
  /** turns expected on the form at the winder speed (not rounded) */
  expectedTurns: number;
  /** m above the first turn: expected turns × pitch */
  expectedHeight: number;
  /** m of wire on the form */
  wireUsed: number;
  /** m left on the spool; null without a spool length */
  wireLeft: number | null;
  /** true when the spool runs out before the plan is wound */
  spoolShort: boolean | null;
  /** s of winding left at this speed, pauses excluded */
  timeToFinish: number;
}

/**
 * The figures a builder watches at the jig. Winding time = turns / rpm as on the build sheet; the expected
 * height is turns × pitch (the build sheet's checkpoints); wire used is the helix length of the turns wound
 * so far (√((πD)² + p²) per turn, the solver's wire-length formula).
 */
export function liveFigures(
  plan: WindingPlan,
  session: { rpm: number; spoolLength: number | null; startedAt: number; pauses: readonly PauseSpan[] },
  now: number,
): LiveFigures {
  const elapsed = elapsedWinding(session.startedAt, session.pauses, now);
  const expectedTurns = turnsAt(elapsed, session.rpm, plan.turns);
  const wireUsed = wireFor(plan, expectedTurns);
  const wireLeft = session.spoolLength === null ? null : session.spoolLength - wireUsed;
  return {
    elapsed,
    expectedTurns,
    expectedHeight: expectedTurns * plan.pitch,
    wireUsed,
    wireLeft,
    spoolShort: session.spoolLength === null ? null : session.spoolLength < plan.wireLength,
    timeToFinish: ((plan.turns - expectedTurns) / session.rpm) * 60,
  };
}
