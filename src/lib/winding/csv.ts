import { DATUM_LABELS, TOLERANCE_TEXT, type HeightDatum } from './estimate';

/** The parts of a session the export writes; the API's session view has them all. */
export interface CsvSession {
  id: string;
  designName: string;
  rpm: number;
  startedAt: string;
  finishedAt: string | null;
  plan: { turns: number; pitch: number };
  woundTurns: number | null;
  windingLength: number | null;
  readings: ReadonlyArray<{
    at: string;
    elapsed: number;
    counter: number;
    height: number | null;
    datum: HeightDatum | null;
    estimatedTurns: number | null;
    tolerance: number | null;
    flag: { correctedCount: number; cause: string } | null;
  }>;
  pauses: ReadonlyArray<{ reason: string; note: string | null; startedAt: string; endedAt: string | null }>;
}

function cell(v: string | number | null): string {
  if (v === null) return '';
  const s = String(v);
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

const row = (values: Array<string | number | null>) => values.map(cell).join(',');
const mm = (m: number | null) => (m === null ? null : (m * 1000).toFixed(1));

/** One session as CSV: a header block, then one line per reading and per pause in time order (SI lengths in mm). */
export function sessionCsv(s: CsvSession): string {
  const lines = [
    row(['session', s.id]),
    row(['design', s.designName]),
    row(['winder speed (rpm)', s.rpm]),
    row(['planned turns', s.plan.turns]),
    row(['pitch (mm)', (s.plan.pitch * 1000).toFixed(4)]),
    row(['started', s.startedAt]),
    row(['finished', s.finishedAt]),
    row(['turns wound', s.woundTurns]),
    row(['winding length (mm)', mm(s.windingLength)]),
    row(['tolerance', TOLERANCE_TEXT]),
    '',
    row(['entry', 'time', 'winding time (s)', 'counter', 'height (mm)', 'measured', 'turns from height', 'tolerance (turns)', 'flag', 'corrected count', 'pause reason', 'pause note', 'pause ended']),
  ];
  const entries: Array<{ t: string; line: string }> = [];
  for (const r of s.readings) {
    entries.push({
      t: r.at,
      line: row([
        'reading',
        r.at,
        r.elapsed.toFixed(0),
        r.counter,
        mm(r.height),
        r.datum ? DATUM_LABELS[r.datum] : null,
        r.estimatedTurns === null ? null : r.estimatedTurns.toFixed(1),
        r.tolerance === null ? null : r.tolerance.toFixed(1),
        r.flag ? r.flag.cause : null,
        r.flag ? r.flag.correctedCount : null,
        null,
        null,
        null,
      ]),
    });
  }
  for (const p of s.pauses) {
    entries.push({ t: p.startedAt, line: row(['pause', p.startedAt, null, null, null, null, null, null, null, null, p.reason, p.note, p.endedAt]) });
  }
  entries.sort((a, b) => a.t.localeCompare(b.t));
  return [...lines, ...entries.map((e) => e.line)].join('\r\n') + '\r\n';
}
