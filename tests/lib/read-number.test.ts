import { describe, expect, it } from 'vitest';
import { canonicalNumberText, decimalMarkOf, readNumberText } from '../../src/lib/format/read-number';
import { parseQuantityQuick } from '../../src/lib/format/units';
import { parseQuantity } from '../../src/lib/format/units-mathjs';

const value = (text: string, mark: '.' | ',' = '.') => {
  const r = readNumberText(text, mark);
  return r && r.ok ? r.value : r;
};

describe('the one number rule', () => {
  it('reads a thousands comma as grouping, never as a decimal point that cuts 1,000 to 1', () => {
    expect(value('1,000')).toBe(1000);
    expect(value('12,500')).toBe(12500);
    expect(value('1,000,000')).toBe(1e6);
    expect(value('1 000')).toBe(1000);
    expect(value('1\u202f000')).toBe(1000);
    expect(value("1'000")).toBe(1000);
  });
  it('reads a decimal comma that cannot be grouping as a decimal mark in any locale', () => {
    expect(value('0,5')).toBe(0.5);
    expect(value('12,25')).toBe(12.25);
    expect(value('-0,75')).toBe(-0.75);
    expect(value('2,5', ',')).toBe(2.5);
  });
  it('takes the last of a comma and a point as the decimal mark', () => {
    expect(value('1,234.5')).toBe(1234.5);
    expect(value('1.234,5')).toBe(1234.5);
  });
  it('reads one mark before exactly three digits by the locale', () => {
    expect(decimalMarkOf('en-US')).toBe('.');
    expect(decimalMarkOf('de-DE')).toBe(',');
    expect(decimalMarkOf('fr-FR')).toBe(',');
    expect(value('1.000', '.')).toBe(1);
    expect(value('1,000', '.')).toBe(1000);
    expect(value('1,000', ',')).toBe(1);
    expect(value('1.000', ',')).toBe(1000);
    // a leading zero cannot start a group of thousands
    expect(value('0,125', '.')).toBe(0.125);
  });
  it('refuses text that reads two ways, and says why', () => {
    for (const t of ['1,00,0', '12,34,567', '1.2.3', '1,2.3.4']) {
      const r = readNumberText(t);
      expect(r, t).not.toBeNull();
      expect(r!.ok, t).toBe(false);
    }
  });
  it('keeps exponents and signs', () => {
    expect(value('1.5e3')).toBe(1500);
    expect(value('-12')).toBe(-12);
    expect(value('.5')).toBe(0.5);
  });
  it('is not a number for words', () => {
    expect(readNumberText('abc')).toBeNull();
    expect(readNumberText('12 mm')).toBeNull();
  });
  it('rewrites the number of a quantity plainly', () => {
    expect(canonicalNumberText('1,000 mm')).toBe('1000 mm');
    expect(canonicalNumberText('0,5 in')).toBe('0.5 in');
    expect(canonicalNumberText('2.500 mm', ',')).toBe('2500 mm');
    expect(canonicalNumberText('20 nF')).toBe('20 nF');
  });
  it('gives quantities the same rule, in the fast reader and in mathjs', () => {
    const quick = parseQuantityQuick('1,000 mm', 'length');
    expect(quick).toEqual({ ok: true, value: 1 });
    expect(parseQuantity('1,5 in', 'length')).toEqual({ ok: true, value: 1.5 * 0.0254 });
    const refused = parseQuantityQuick('1,00,0 mm', 'length');
    expect(refused?.ok).toBe(false);
    const bare = parseQuantityQuick('5', 'length');
    expect(bare?.ok).toBe(false);
    if (bare && !bare.ok) expect(bare.message).toContain('without a unit');
  });
});

describe('messages in the builder\'s unit system', () => {
  it('says metric lengths of a message in inches and feet in imperial, and leaves metric alone', async () => {
    const { lengthsInSystem } = await import('../../src/lib/format/convert');
    expect(lengthsInSystem('must be between 5 mm and 10 m, got "1 mm"', 'imperial')).toBe('must be between 0.197 in and 32.8 ft, got "0.0394 in"');
    expect(lengthsInSystem('Height of z = 0 over the ground plane; empty for 0.5 m', 'imperial')).toBe('Height of z = 0 over the ground plane; empty for 19.7 in');
    expect(lengthsInSystem('between −5 m and 5 m', 'imperial')).toBe('between −16.4 ft and 16.4 ft');
    expect(lengthsInSystem('between 5 mm and 10 m', 'metric')).toBe('between 5 mm and 10 m');
    expect(lengthsInSystem('expected a mass such as 3 kg', 'imperial')).toBe('expected a mass such as 3 kg');
  });
});
