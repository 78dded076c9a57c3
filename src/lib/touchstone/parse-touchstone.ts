import { fail, type Complex, type DataFormat, type FrequencyUnit, type ParameterType, type ParseResult, type TouchstoneData } from './types';

/**
 * Reads a Touchstone network-data file (versions 1.x and 2.0) with one or two ports.
 *
 * Format (Touchstone File Format Specification, version 2.0, IBIS Open Forum, 2009): `!` starts a
 * comment anywhere on a line; the option line `# <Hz|kHz|MHz|GHz> <S|Y|Z|G|H> <DB|MA|RI> R <ohms>`
 * comes before the data, with defaults GHz, S, MA, R 50 for anything it leaves out; each data row is
 * a frequency followed by the matrix entries as pairs (RI: real, imaginary; MA: magnitude, angle in
 * degrees; DB: 20·log10 magnitude, angle in degrees). Two-port rows list N11 N21 N12 N22 (the
 * version 1 order, and `[Two-Port Data Order] 21_12` in version 2) or N11 N12 N21 N22 (`12_21`).
 * Frequencies must increase; in a two-port file, a row with a lower frequency and five values starts
 * the noise parameters, which are not read.
 *
 * `ports` comes from the file name (.s1p, .s2p) when known; otherwise from `[Number of Ports]` or the
 * first data row. Files with more ports are refused with a message.
 */
export function parseTouchstone(text: string, ports?: 1 | 2): ParseResult<TouchstoneData> {
  const lines = text.split(/\r\n|\r|\n/);
  let unit: FrequencyUnit = 'GHz';
  let parameter: ParameterType = 'S';
  let format: DataFormat = 'MA';
  let reference = 50;
  let optionSeen = false;
  let nPorts: 1 | 2 | undefined = ports;
  let order: '21_12' | '12_21' = '21_12';
  let inNoise = false;
  const frequency: number[] = [];
  const data: Complex[][] = [];

  for (let i = 0; i < lines.length; i++) {
    const lineNo = i + 1;
    const line = lines[i].replace(/!.*$/, '').trim();
    if (line === '') continue;

    if (line.startsWith('#')) {
      if (optionSeen) continue; // the specification says later option lines are ignored
      if (frequency.length > 0) return fail(lineNo, 'the option line (starting with #) must come before the data.');
      optionSeen = true;
      const tokens = line.slice(1).trim().split(/\s+/).filter(Boolean);
      for (let t = 0; t < tokens.length; t++) {
        const tok = tokens[t].toUpperCase();
        if (tok === 'HZ') unit = 'Hz';
        else if (tok === 'KHZ') unit = 'kHz';
        else if (tok === 'MHZ') unit = 'MHz';
        else if (tok === 'GHZ') unit = 'GHz';
        else if (tok === 'S' || tok === 'Y' || tok === 'Z' || tok === 'G' || tok === 'H') parameter = tok;
        else if (tok === 'RI' || tok === 'MA' || tok === 'DB') format = tok;
        else if (tok === 'R') {
          const r = Number(tokens[t + 1]);
          if (!(r > 0) || !Number.isFinite(r)) return fail(lineNo, `the reference impedance after R must be a positive number, found "${tokens[t + 1] ?? ''}".`);
          reference = r;
          t++;
        } else return fail(lineNo, `"${tokens[t]}" is not a frequency unit (Hz, kHz, MHz, GHz), parameter (S, Y, Z, G, H), format (RI, MA, DB) or R <ohms>.`);
      }
      continue;
    }

    if (line.startsWith('[')) {
      const m = /^\[([^\]]+)\]\s*(.*)$/.exec(line);
      if (!m) return fail(lineNo, `a keyword line must look like "[Keyword] value", found "${line}".`);
      const key = m[1].trim().toLowerCase();
      const value = m[2].trim();
      if (key === 'number of ports') {
        const n = Number(value);
        if (n !== 1 && n !== 2) return fail(lineNo, `only one- and two-port files are read; this one declares ${value} ports.`);
        if (nPorts !== undefined && nPorts !== n) return fail(lineNo, `the file declares ${n} ports but its name says ${nPorts}.`);
        nPorts = n;
      } else if (key === 'two-port data order') {
        if (value !== '12_21' && value !== '21_12') return fail(lineNo, `[Two-Port Data Order] must be 12_21 or 21_12, found "${value}".`);
        order = value;
      } else if (key === 'noise data') inNoise = true;
      else if (key === 'end') break;
      continue;
    }
    if (inNoise) continue;

    const tokens = line.split(/\s+/);
    const values: number[] = [];
    for (let c = 0; c < tokens.length; c++) {
      const v = Number(tokens[c]);
      if (!Number.isFinite(v) || tokens[c] === '') return fail(lineNo, `"${tokens[c]}" in column ${c + 1} is not a number.`);
      values.push(v);
    }
    if (nPorts === undefined) {
      if (values.length === 3) nPorts = 1;
      else if (values.length === 9) nPorts = 2;
      else return fail(lineNo, `a data row has ${values.length} numbers; expected 3 (one port) or 9 (two ports).`);
    }
    const f = values[0] * unitFactor(unit);
    const last = frequency.length ? frequency[frequency.length - 1] : -Infinity;
    if (nPorts === 2 && frequency.length > 0 && f <= last && values.length === 5) {
      inNoise = true; // version 1 noise parameters follow the network data
      continue;
    }
    const expected = nPorts === 1 ? 3 : 9;
    if (values.length !== expected) {
      return fail(
        lineNo,
        `expected ${expected} numbers (the frequency and ${nPorts === 1 ? 'one value pair' : 'four value pairs'}), found ${values.length}.`,
      );
    }
    if (values[0] < 0) return fail(lineNo, `the frequency ${tokens[0]} is negative.`);
    if (f <= last) return fail(lineNo, `the frequency ${tokens[0]} ${unit} does not increase on the row before.`);
    const pairs: Complex[] = [];
    for (let p = 1; p < values.length; p += 2) {
      const z = toComplex(values[p], values[p + 1], format);
      if (!z) return fail(lineNo, `the magnitude ${values[p]} in column ${p + 1} is negative (format MA).`);
      pairs.push(z);
    }
    if (nPorts === 2 && order === '12_21') [pairs[1], pairs[2]] = [pairs[2], pairs[1]];
    frequency.push(f);
    data.push(pairs);
  }

  if (frequency.length === 0) return fail(0, 'The file has no data rows (frequency and values).');
  if (frequency.length < 3) return fail(0, `The file has only ${frequency.length} data row(s); a sweep needs at least 3.`);
  return { ok: true, value: { ports: nPorts ?? 1, frequencyUnit: unit, parameter, format, reference, frequency, data } };
}

export function unitFactor(unit: FrequencyUnit): number {
  return { Hz: 1, kHz: 1e3, MHz: 1e6, GHz: 1e9 }[unit];
}

function toComplex(a: number, b: number, format: DataFormat): Complex | null {
  if (format === 'RI') return { re: a, im: b };
  const mag = format === 'MA' ? a : Math.pow(10, a / 20);
  if (mag < 0) return null;
  const rad = (b * Math.PI) / 180;
  return { re: mag * Math.cos(rad), im: mag * Math.sin(rad) };
}

export function magnitude(z: Complex): number {
  return Math.hypot(z.re, z.im);
}
