import { describe, expect, it } from 'vitest';
import { sessionCsv, type CsvSession } from '~/lib/winding';

const session: CsvSession = {
  id: 's1',
  designName: 'Coil "A", the tall one',
  rpm: 40,
  startedAt: '2026-03-07T10:00:00.000Z',
  finishedAt: '2026-03-07T10:30:00.000Z',
  plan: { turns: 1000, pitch: 0.000564 },
  woundTurns: 1030,
  windingLength: 0.5838,
  readings: [
    { at: '2026-03-07T10:05:00.000Z', elapsed: 300, counter: 198, height: 0.1128, datum: 'first-turn', estimatedTurns: 200, tolerance: 4.8, flag: null },
    { at: '2026-03-07T10:20:00.000Z', elapsed: 900, counter: 385, height: 0.2694, datum: 'form-end', estimatedTurns: 410, tolerance: 6.9, flag: { correctedCount: 410, cause: 'missing counts' } },
  ],
  pauses: [{ reason: 'splice', note: 'second spool, joined', startedAt: '2026-03-07T10:10:00.000Z', endedAt: '2026-03-07T10:13:00.000Z' }],
};

describe('sessionCsv(session)', () => {
  it('sessionCsv quotes fields with commas or quotes and writes entries in time order', () => {
    const lines = sessionCsv(session).trimEnd().split('\r\n');
    expect(lines[1]).toBe('design,"Coil ""A"", the tall one"');
    const entries = lines.filter((l) => /^(reading|pause),/.test(l));
    expect(entries.map((l) => l.split(',')[0])).toEqual(['reading', 'pause', 'reading']);
    expect(entries[0]).toBe('reading,2026-03-07T10:05:00.000Z,300,198,112.8,from the first turn,200.0,4.8,,,,,');
    expect(entries[1]).toContain('splice,"second spool, joined",2026-03-07T10:13:00.000Z');
    expect(entries[2]).toContain(',385,269.4,from the end of the form,410.0,6.9,missing counts,410,');
  });
});
