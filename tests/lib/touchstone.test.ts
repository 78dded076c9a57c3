import { describe, expect, it } from 'vitest';
import { findResonances, parseSweepCsv, parseSweepFile, parseTouchstone } from '~/lib/touchstone';
import { frequencies, loadedQ, resonantFrequency, touchstoneRlc, type Format, type Rlc, type Unit } from '../fixtures/workbench/rlc-sweep';
import { assertClose } from '../helpers/assertClose';


// f0 = 503.29 kHz, between grid points of the sweep on purpose.
const rlc: Rlc = { R: 10, L: 1e-3, C: 100e-12 };
const f0 = resonantFrequency(rlc);
const grid = frequencies(400e3, 600e3, 401);
const units: Unit[] = ['Hz', 'kHz', 'MHz', 'GHz'];
const formats: Format[] = ['RI', 'MA', 'DB'];

describe('parseSweepFile + findResonances on closed-form series RLC sweeps', () => {
  for (const unit of units) {
    for (const format of formats) {
      it(`finds the S11 dip of a .s1p in ${unit} ${format} within 0.5 %`, () => {
        const parsed = parseSweepFile('coil.s1p', touchstoneRlc(rlc, 1, unit, format, grid));
        if (!parsed.ok) throw new Error(parsed.error.message);
        const { mode, resonances } = findResonances(parsed.value);
        expect(mode).toBe('dip');
        assertClose(resonances[0].frequency, f0, 0.005, 'dip frequency');
        assertClose(resonances[0].q!, loadedQ(rlc, 1), 0.02, 'loaded Q of the dip');
      });

      it(`finds the S21 peak of a .s2p in ${unit} ${format} within 0.5 %`, () => {
        const parsed = parseSweepFile('coil.s2p', touchstoneRlc(rlc, 2, unit, format, grid));
        if (!parsed.ok) throw new Error(parsed.error.message);
        expect(parsed.value.label).toBe('S21');
        const { mode, resonances } = findResonances(parsed.value);
        expect(mode).toBe('peak');
        assertClose(resonances[0].frequency, f0, 0.005, 'peak frequency');
        assertClose(resonances[0].q!, loadedQ(rlc, 2), 0.02, 'loaded Q of the peak');
      });
    }
  }

  it('findResonances interpolates the centre far closer than the sample step', () => {
    const coarse = frequencies(450e3, 560e3, 23); // 5 kHz steps
    const parsed = parseSweepFile('coil.s2p', touchstoneRlc(rlc, 2, 'kHz', 'RI', coarse));
    if (!parsed.ok) throw new Error(parsed.error.message);
    const r = findResonances(parsed.value).resonances[0];
    expect(Math.abs(r.frequency - f0)).toBeLessThan(1.5e3);
  });

  it('findResonances reports two split peaks of a sum of resonators, strongest first', () => {
    const f = frequencies(100e3, 300e3, 801);
    const lorentz = (fc: number, q: number) => (x: number) => 1 / Math.sqrt(1 + (q * (x / fc - fc / x)) ** 2);
    const a = lorentz(150e3, 40);
    const b = lorentz(230e3, 40);
    const sweep = { frequency: f, magnitude: f.map((x) => a(x) + 0.6 * b(x)), label: 'amplitude', passive: false };
    const { resonances } = findResonances(sweep, { mode: 'peak' });
    expect(resonances).toHaveLength(2);
    assertClose(resonances[0].frequency, 150e3, 0.005, 'first peak');
    assertClose(resonances[1].frequency, 230e3, 0.005, 'second peak');
  });

  it('findResonances gives q null when the trace ends before half power', () => {
    const f = frequencies(500e3, 510e3, 41);
    const parsed = parseSweepFile('coil.s2p', touchstoneRlc(rlc, 2, 'Hz', 'MA', f));
    if (!parsed.ok) throw new Error(parsed.error.message);
    const r = findResonances(parsed.value).resonances[0];
    expect(r.q).toBeNull();
  });
});

describe('parseTouchstone', () => {
  it('parseTouchstone uses the defaults GHz S MA R 50 without an option line', () => {
    const r = parseTouchstone('1 0.5 0\n2 0.4 90\n3 0.3 180\n', 1);
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.frequency).toEqual([1e9, 2e9, 3e9]);
    expect(r.value.reference).toBe(50);
    expect(r.value.data[1][0].im).toBeCloseTo(0.4, 12);
  });

  it('parseTouchstone reads version 2 keywords and the 12_21 order', () => {
    const text = [
      '[Version] 2.0',
      '# MHz S RI R 75',
      '[Number of Ports] 2',
      '[Two-Port Data Order] 12_21',
      '[Number of Frequencies] 3',
      '[Network Data]',
      '1 0.1 0 0.2 0 0.3 0 0.4 0',
      '2 0.1 0 0.2 0 0.3 0 0.4 0',
      '3 0.1 0 0.2 0 0.3 0 0.4 0',
      '[End]',
    ].join('\n');
    const r = parseTouchstone(text);
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.ports).toBe(2);
    expect(r.value.reference).toBe(75);
    // stored as 11, 21, 12, 22: the file's third pair (N21) comes second
    expect(r.value.data[0].map((z) => z.re)).toEqual([0.1, 0.3, 0.2, 0.4]);
  });

  it('parseTouchstone stops at version 1 noise data', () => {
    const row = (f: number) => `${f} 0.1 0 0.9 0 0.9 0 0.1 0`;
    const r = parseTouchstone(['# kHz S MA R 50', row(1), row(2), row(3), '1 2.0 0.5 20 0.3', '2 2.1 0.5 22 0.3'].join('\n'), 2);
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.frequency).toHaveLength(3);
  });

  it('parseTouchstone names the line of a value that is not a number', () => {
    const r = parseTouchstone('! sweep\n# kHz S RI R 50\n1 0.1 0.2\n2 0.1 abc\n3 0.1 0.2\n', 1);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.line).toBe(4);
    expect(r.error.message).toMatch(/^Line 4: "abc" in column 3 is not a number/);
  });

  it('parseTouchstone names the line of a row with too few values', () => {
    const r = parseTouchstone('# Hz S DB R 50\n1 -3 0\n2 -3 0 7\n', 1);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/^Line 3: expected 3 numbers/);
  });

  it('parseTouchstone names the line where the frequency stops increasing', () => {
    const r = parseTouchstone('# Hz S DB R 50\n1 -3 0\n3 -3 0\n2 -3 0\n', 1);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/^Line 4: .*does not increase/);
  });

  it('parseTouchstone refuses an unknown option and a file of more than two ports', () => {
    const a = parseTouchstone('# Hz S XY R 50\n1 0 0\n', 1);
    expect(a.ok || a.error.message).toMatch(/^Line 1: "XY" is not/);
    const b = parseTouchstone('[Number of Ports] 4\n');
    expect(b.ok || b.error.message).toMatch(/^Line 1: only one- and two-port files/);
  });

  it('parseTouchstone says so when there is no data', () => {
    const r = parseTouchstone('! nothing here\n# MHz S RI R 50\n', 1);
    expect(r.ok || r.error.message).toMatch(/no data rows/);
  });
});

describe('parseSweepCsv', () => {
  it('parseSweepCsv reads a header with the unit and dB amplitudes', () => {
    const f = frequencies(150, 350, 201); // kHz
    const q = 30;
    const fc = 251.3;
    const rows = f.map((x) => `${x},${(-10 * Math.log10(1 + (q * (x / fc - fc / x)) ** 2)).toFixed(4)}`);
    const r = parseSweepCsv(['Frequency (kHz),Amplitude (dB)', ...rows].join('\n'));
    if (!r.ok) throw new Error(r.error.message);
    const res = findResonances(r.value).resonances[0];
    assertClose(res.frequency, fc * 1e3, 0.005, 'csv peak');
    assertClose(res.q!, q, 0.03, 'csv Q');
  });

  it('parseSweepCsv reads semicolons, no header, linear volts', () => {
    const r = parseSweepCsv('100000;0.1\n200000;0.9\n300000;0.2\n');
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.frequency).toEqual([1e5, 2e5, 3e5]);
    expect(r.value.magnitude).toEqual([0.1, 0.9, 0.2]);
  });

  it('parseSweepCsv names the line of a bad cell', () => {
    const r = parseSweepCsv('freq,amp\n1,2\n2,x\n3,4\n');
    expect(r.ok || r.error.message).toBe('Line 3: "x" in column 2 is not a number.');
  });
});
