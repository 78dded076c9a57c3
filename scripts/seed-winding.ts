/**
 * The demo's winding session (invented): Noor wound the 12 kV coil's secondary on the group's drill-motor jig at
 * 90 rpm with a bumper counter. The counter missed counts at that speed; the height readings caught it, and the
 * coil came out at 1000 turns while the counter showed 978. Idempotent: a design with a session gets no other.
 */
import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import type { Db } from '../src/server/db/client';
import { designs, windingSessions } from '../src/server/db/schema';
import { withDatabase } from '../src/server/services/database';
import {
  addWindingReading,
  finishWindingSession,
  pauseWindingSession,
  putWindingChecklist,
  resumeWindingSession,
  startWindingSession,
} from '../src/server/services/winding';
import type { SessionUser } from '../src/server/session';

export const DEMO_WINDING_DESIGN = '12 kV sign-transformer coil';
const START = Date.UTC(2026, 2, 7, 10, 0, 0);
const at = (minutes: number) => new Date(START + minutes * 60e3).toISOString();
const OFFSET = 0.0381;

/** Adds the finished session to the owner's 12 kV coil unless it has one; true when it added it. */
export async function seedWindingDemo(db: Db, owner: SessionUser): Promise<boolean> {
  const design = await db.query.designs.findFirst({ where: and(eq(designs.ownerId, owner.id), eq(designs.name, DEMO_WINDING_DESIGN)) });
  if (!design) return false;
  const existing = await db.query.windingSessions.findFirst({ where: eq(windingSessions.designId, design.id) });
  if (existing) return false;
  return withDatabase(db, async () => {
    const s = await startWindingSession(owner, design.id, { rpm: 90, spoolLength: 420, startOffset: OFFSET, startedAt: at(0) });
    const p = s.plan.pitch;
    const reading = (minutes: number, counter: number, turnsByHeight?: number, datum: 'form-end' | 'first-turn' = 'first-turn') =>
      addWindingReading(owner, design.id, s.id, {
        id: randomUUID(),
        at: at(minutes),
        counter,
        height: turnsByHeight === undefined ? null : (datum === 'form-end' ? OFFSET : 0) + turnsByHeight * p,
        datum: turnsByHeight === undefined ? null : datum,
      });
    await reading(1.2, 108, 108);
    await reading(2.5, 221);
    await reading(4, 356, 360, 'form-end'); // agrees within the tolerance
    await pauseWindingSession(owner, design.id, s.id, { reason: 'guide', note: 'moved the guide up the rail', at: at(4) });
    await resumeWindingSession(owner, design.id, s.id, { at: at(6.5) });
    await reading(9, 566, 585, 'form-end'); // 19 behind: missing counts
    await pauseWindingSession(owner, design.id, s.id, { reason: 'break', at: at(9.5) });
    await resumeWindingSession(owner, design.id, s.id, { at: at(12) });
    await reading(14.5, 826);
    await reading(16.1, 978, 1000); // 22 behind at the last turn
    await finishWindingSession(owner, design.id, s.id, { at: at(16.5), woundTurns: 1000, windingLength: 1000 * p + 0.001, notes: 'Counter missed counts above about 80 rpm; slow the jig next time.' });
    await putWindingChecklist(owner, design.id, s.id, { baseEndFastened: true, topEndFastened: true, coating: 'oil-based polyurethane', coats: 3, dryingHours: 8 });
    return true;
  });
}
