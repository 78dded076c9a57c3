import { parseSweepCsv } from './parse-csv';
import { magnitude, parseTouchstone } from './parse-touchstone';
import { fail, type ParseResult, type Sweep, type TouchstoneData } from './types';

export type SweepTrace = 'S11' | 'S21' | 'S12' | 'S22';

/** The kind of sweep file a name points to, or null when the extension is not one we read. */
export function sweepFileKind(fileName: string): 's1p' | 's2p' | 'csv' | 'txt' | null {
  const m = /\.(s1p|s2p|csv|txt)$/i.exec(fileName);
  return m ? (m[1].toLowerCase() as 's1p' | 's2p' | 'csv' | 'txt') : null;
}

/** One trace of a Touchstone file: S11 of a one-port; S21 (transmission) of a two-port unless asked otherwise. */
export function touchstoneTrace(t: TouchstoneData, trace?: SweepTrace): ParseResult<Sweep> {
  const name = trace ?? (t.ports === 1 ? 'S11' : 'S21');
  const index = { S11: 0, S21: 1, S12: 2, S22: 3 }[name];
  if (index >= t.data[0].length) return fail(0, `${name} is not in a ${t.ports}-port file.`);
  const label = `${t.parameter}${name.slice(1)}`;
  return {
    ok: true,
    value: { frequency: t.frequency, magnitude: t.data.map((row) => magnitude(row[index])), label, passive: t.parameter === 'S' },
  };
}

/**
 * Reads any sweep file we accept, chosen by its name: .s1p/.s2p as Touchstone; .csv as columns; .txt as
 * Touchstone when it has an option line, otherwise as columns.
 */
export function parseSweepFile(fileName: string, text: string, trace?: SweepTrace): ParseResult<Sweep> {
  const kind = sweepFileKind(fileName);
  if (kind === null) return fail(0, 'Sweep files must end in .s1p, .s2p, .csv or .txt.');
  const asTouchstone = kind === 's1p' || kind === 's2p' || (kind === 'txt' && /^\s*#/m.test(text));
  if (!asTouchstone) return parseSweepCsv(text);
  const parsed = parseTouchstone(text, kind === 's1p' ? 1 : kind === 's2p' ? 2 : undefined);
  if (!parsed.ok) return parsed;
  return touchstoneTrace(parsed.value, trace);
}
