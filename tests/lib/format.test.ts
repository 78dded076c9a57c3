import { describe, expect, it } from 'vitest';
import {
  convertLengthText,
  readLength,
  formatFixed,
  formatLength,
  formatQuantity,
  formatSi,
  formatSignificant,
  lengthInputText,
  MISSING,
  siParts,
} from '~/lib/format';
import { parseQuantity } from '~/lib/design';
import { assertClose } from '../helpers/assertClose';

// Exact conversion factors: the international inch and foot (1959 agreement), NIST SP 811 (2008),
// Appendix B.8: 1 in = 0.0254 m, 1 ft = 0.3048 m exactly; the avoirdupois pound 0.453 592 37 kg exactly.
const INCH = 0.0254;

describe('formatSignificant', () => {
  it('formatSignificant(x, 4) rounds to four significant figures and drops trailing zeros', () => {
    expect(formatSignificant(1234.567, 4)).toBe('1235');
    expect(formatSignificant(0.0123, 4)).toBe('0.0123');
    expect(formatSignificant(101.6, 4)).toBe('101.6');
    expect(formatSignificant(-2.5, 3)).toBe('-2.5');
  });

  it('formatSignificant never prints NaN or Infinity', () => {
    expect(formatSignificant(Number.NaN)).toBe(MISSING);
    expect(formatSignificant(Number.POSITIVE_INFINITY)).toBe(MISSING);
  });

  it('formatFixed drops the sign of a rounded negative zero', () => {
    expect(formatFixed(-0.0001, 2)).toBe('0.00');
    expect(formatFixed(-1.234, 2)).toBe('-1.23');
  });
});

describe('formatSi', () => {
  it('formatSi picks the engineering prefix that puts the value in [1, 1000)', () => {
    expect(formatSi(253_400, 'Hz')).toBe('253.4 kHz');
    expect(formatSi(0.02563, 'H')).toBe('25.63 mH');
    expect(formatSi(12.3e-12, 'F')).toBe('12.3 pF');
    expect(formatSi(20e-9, 'F')).toBe('20 nF');
    expect(formatSi(1.5e6, 'V')).toBe('1.5 MV');
  });

  it('formatSi carries a value that rounds up to 1000 into the next prefix', () => {
    expect(formatSi(999_960, 'Hz')).toBe('1 MHz');
    expect(siParts(999_960).prefix).toBe('M');
  });

  it('formatSi shows a missing value as a dash', () => {
    expect(formatSi(null, 'Hz')).toBe(MISSING);
    expect(formatSi(Number.NaN, 'Hz')).toBe(MISSING);
  });
});

describe('formatLength', () => {
  it('formatLength shows 4.5 in as 114.3 mm in metric and 4.5 in in imperial (1 in = 25.4 mm exactly, NIST SP 811)', () => {
    expect(formatLength(4.5 * INCH, 'metric')).toBe('114.3 mm');
    expect(formatLength(4.5 * INCH, 'imperial')).toBe('4.5 in');
  });

  it('formatLength uses metres above 1 m and feet above 10 ft', () => {
    expect(formatLength(1.25, 'metric')).toBe('1.25 m');
    expect(formatLength(12 * 0.3048, 'imperial')).toBe('12 ft');
  });

  it('formatLength of a wire run uses metres or feet', () => {
    expect(formatQuantity(236.2, 'wireLength', { system: 'metric' })).toBe('236.2 m');
    expect(formatQuantity(236.2, 'wireLength', { system: 'imperial' })).toBe('774.9 ft');
  });
});

describe('lengthInputText', () => {
  it('lengthInputText writes text the schema parses back to the same length', () => {
    for (const m of [0.1143, 0.00635, 0.5, 0.0254 * 23, 1.8, 12.5]) {
      for (const system of ['metric', 'imperial'] as const) {
        const text = lengthInputText(m, system);
        const back = parseQuantity(text, 'length');
        expect(back.ok, `${m} m in ${system} gave "${text}"`).toBe(true);
        if (back.ok) assertClose(back.value, m, 1e-5, `"${text}" read back`);
      }
    }
  });

  it('lengthInputText never uses exponent notation', () => {
    expect(lengthInputText(1e-5, 'metric')).toBe('0.01 mm');
    expect(lengthInputText(0.0254, 'imperial')).toBe('1 in');
  });
});

describe('convertLengthText', () => {
  it('convertLengthText rewrites "4 in" as "101.6 mm" and back', () => {
    expect(convertLengthText('4 in', 'metric')).toBe('101.6 mm');
    expect(convertLengthText('101.6 mm', 'imperial')).toBe('4 in');
  });

  it('convertLengthText gives back exactly the text typed when switched there and back', () => {
    const there = convertLengthText('0.6 m', 'imperial');
    expect(there).toBe('23.62 in');
    expect(convertLengthText(there, 'metric')).toBe('0.6 m');
  });

  it('convertLengthText rounds to the precision entered or a builder\'s step, never to six figures', () => {
    expect(convertLengthText('100 mm', 'imperial')).toBe('3.94 in');
    expect(convertLengthText('450 mm', 'imperial')).toBe('17.72 in');
    expect(convertLengthText('114.3 mm', 'imperial')).toBe('4.5 in');
    expect(convertLengthText('4.5 in', 'metric')).toBe('114.3 mm');
    expect(convertLengthText('6.6 in', 'metric')).toBe('167.64 mm');
    expect(convertLengthText('0.0201 in', 'metric')).toBe('0.5105 mm');
  });

  it('convertLengthText leaves text already in the target system as typed', () => {
    expect(convertLengthText('0.6 m', 'metric')).toBe('0.6 m');
    expect(convertLengthText('2 ft', 'imperial')).toBe('2 ft');
  });

  it('convertLengthText reads comma decimals and long unit names as the design schema does', () => {
    for (const text of ['0,6 m', '23 inches', '2.5 cm', '.5 ft', '1e-3 m']) {
      const ours = readLength(text);
      const schema = parseQuantity(text, 'length');
      expect(schema.ok, text).toBe(true);
      if (schema.ok) assertClose(ours!.metres, schema.value, 1e-12, `readLength("${text}")`);
    }
    expect(convertLengthText('0.25 in', 'metric')).toBe('6.35 mm');
  });

  it('convertLengthText leaves invalid text untouched so nothing typed is lost', () => {
    expect(convertLengthText('4 i', 'metric')).toBe('4 i');
    expect(convertLengthText('3 kg', 'imperial')).toBe('3 kg');
    expect(convertLengthText('4 in + 2', 'metric')).toBe('4 in + 2');
  });
});

describe('formatQuantity', () => {
  it('formatQuantity formats each result kind with its unit', () => {
    expect(formatQuantity(0.1534, 'coupling')).toBe('0.153');
    expect(formatQuantity(1.2346, 'energy')).toBe('1.235 J');
    expect(formatQuantity(Math.PI / 6, 'angle')).toBe('30°');
    expect(formatQuantity(0.45359237, 'mass', { system: 'imperial' })).toBe('1 lb');
    expect(formatQuantity(0.25, 'mass', { system: 'metric' })).toBe('250 g');
  });

  it('formatQuantity limits capacitance to pF…F and inductance to nH…H', () => {
    expect(formatQuantity(1e-15, 'capacitance')).toBe('0.001 pF');
    expect(formatQuantity(2e3, 'inductance')).toBe('2000 H');
  });
});
