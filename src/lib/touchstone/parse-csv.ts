import { unitFactor } from './parse-touchstone';
import { fail, type FrequencyUnit, type ParseResult, type Sweep } from './types';

/**
 * Reads a two-column sweep (frequency, amplitude) as exported by network analysers, scopes and
 * generator sweeps: comma, semicolon, tab or space separated; lines starting with `#`, `!` or `//`
 * are comments; an optional header row names the columns. The frequency unit comes from the header
 * (e.g. "Frequency (kHz)"), Hz otherwise. The amplitude is read as dB when its header says dB or when
 * any value is negative, otherwise as a linear magnitude (volts, a ratio). Extra columns are ignored.
 */
export function parseSweepCsv(text: string): ParseResult<Sweep> {
  const lines = text.split(/\r\n|\r|\n/);
  let unit: FrequencyUnit = 'Hz';
  let headerDb: boolean | null = null;
  let label = 'amplitude';
  let sawData = false;
  const rows: Array<{ line: number; f: number; a: number; raw: string }> = [];

  for (let i = 0; i < lines.length; i++) {
    const lineNo = i + 1;
    const line = lines[i].trim();
    if (line === '' || /^(#|!|\/\/)/.test(line)) continue;
    const cells = split(line);
    const numeric = cells.map((c) => (c === '' ? NaN : Number(c)));
    if (!sawData && rows.length === 0 && numeric.slice(0, 2).some((v) => !Number.isFinite(v))) {
      // the header row
      const fHead = cells[0] ?? '';
      const u = /\b(ghz|mhz|khz|hz)\b/i.exec(fHead);
      if (u) unit = ({ hz: 'Hz', khz: 'kHz', mhz: 'MHz', ghz: 'GHz' } as const)[u[1].toLowerCase() as 'hz' | 'khz' | 'mhz' | 'ghz'];
      const aHead = cells[1] ?? '';
      headerDb = /\bdb/i.test(aHead);
      if (aHead) label = aHead.replace(/^"|"$/g, '');
      sawData = true;
      continue;
    }
    sawData = true;
    if (cells.length < 2) return fail(lineNo, `expected two columns (frequency, amplitude), found ${cells.length}.`);
    for (let c = 0; c < 2; c++) {
      if (!Number.isFinite(numeric[c])) return fail(lineNo, `"${cells[c]}" in column ${c + 1} is not a number.`);
    }
    const f = numeric[0] * unitFactor(unit);
    if (numeric[0] < 0) return fail(lineNo, `the frequency ${cells[0]} is negative.`);
    const prev = rows[rows.length - 1];
    if (prev && f <= prev.f) return fail(lineNo, `the frequency ${cells[0]} does not increase on the row before.`);
    rows.push({ line: lineNo, f, a: numeric[1], raw: cells[1] });
  }
  if (rows.length === 0) return fail(0, 'The file has no data rows (frequency, amplitude).');
  if (rows.length < 3) return fail(0, `The file has only ${rows.length} data row(s); a sweep needs at least 3.`);

  const db = headerDb ?? rows.some((r) => r.a < 0);
  return {
    ok: true,
    value: {
      frequency: rows.map((r) => r.f),
      magnitude: rows.map((r) => (db ? Math.pow(10, r.a / 20) : r.a)),
      label: db && !/db/i.test(label) ? `${label} (dB)` : label,
      passive: false,
    },
  };
}

function split(line: string): string[] {
  const sep = line.includes(',') ? ',' : line.includes(';') ? ';' : line.includes('\t') ? '\t' : /\s+/;
  return line.split(sep).map((c) => c.trim().replace(/^"(.*)"$/, '$1'));
}
