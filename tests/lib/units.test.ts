import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatDate, formatSi, parseQuantityLazy, parseQuantityQuick, QUANTITY_KINDS, readSimpleQuantity, SIMPLE_UNITS, siFactor, type QuantityKind } from '~/lib/format';
import { parseQuantity, parseWithMathjs } from '~/lib/format/units-mathjs';
import { parseSparkParam } from '~/lib/event/spark-param';

const KINDS = Object.keys(QUANTITY_KINDS) as QuantityKind[];
const UNIT_NAMES = [...SIMPLE_UNITS.keys()];

const digits = fc.stringMatching(/^[0-9]{1,6}$/);
const numberText = fc
  .tuple(fc.boolean(), digits, fc.option(fc.stringMatching(/^[0-9]{0,6}$/)), fc.option(fc.tuple(fc.constantFrom('e', 'E'), fc.constantFrom('', '-', '+'), fc.integer({ min: 0, max: 30 }))))
  .map(([negative, whole, frac, exp]) => `${negative ? '-' : ''}${whole}${frac === null ? '' : `.${frac}`}${exp === null ? '' : `${exp[0]}${exp[1]}${exp[2]}`}`);
const leadingDot = fc.stringMatching(/^[0-9]{1,5}$/).map((d) => `.${d}`);
const quantityText = fc.tuple(fc.oneof(numberText, leadingDot), fc.constantFrom('', ' ', '  ', '\t'), fc.constantFrom(...UNIT_NAMES), fc.constantFrom('', ' ')).map(([n, gap, u, pad]) => `${pad}${n}${gap}${u}${pad}`);

describe('parseQuantity (fast path for plain forms, mathjs for the rest)', () => {
  it('parseQuantity reads every plain form exactly as mathjs does, for every kind asked (fast-check, 3000 runs)', () => {
    fc.assert(
      fc.property(quantityText, fc.constantFrom(...KINDS), (text, kind) => {
        expect(parseQuantity(text, kind), `${JSON.stringify(text)} as ${kind}`).toEqual(parseWithMathjs(text, kind));
      }),
      { numRuns: 3000 },
    );
  });

  it('parseQuantityQuick answers the plain forms itself and leaves the rest to mathjs', () => {
    expect(parseQuantityQuick('12 mm', 'length')).toEqual({ ok: true, value: 0.012 });
    expect(parseQuantityQuick('4.5 in', 'length')).toEqual({ ok: true, value: 4.5 * 0.0254 });
    expect(parseQuantityQuick('20 nF', 'capacitance')).toEqual({ ok: true, value: 20e-9 });
    expect(parseQuantityQuick('30 deg', 'angle')).toEqual(parseWithMathjs('30 deg', 'angle'));
    for (const text of ['1/4 in', '5 ft + 3 in', '3 kg', '12 kV']) expect(parseQuantityQuick(text, 'length'), text).toBeNull();
  });

  it('parseQuantity keeps the messages for numbers without units, empty text and wrong dimensions', () => {
    expect(parseQuantity('12', 'length')).toEqual({ ok: false, message: 'expected a length such as "4 in" or "0.1 m", got a number without a unit; a bare number is read in no unit, so write it with one, e.g. "12 mm"' });
    expect(parseQuantity('  ', 'voltage')).toEqual({ ok: false, message: 'expected a voltage such as "12 kV" or "340 V", got an empty text' });
    expect(parseQuantity('3 kg', 'length')).toEqual({ ok: false, message: 'expected a length such as "4 in" or "0.1 m", got a mass' });
    expect(parseQuantity('20 nF', 'length')).toEqual({ ok: false, message: 'expected a length such as "4 in" or "0.1 m", got a capacitance' });
    expect(parseQuantity(Number.NaN, 'length').ok).toBe(false);
    expect(parseQuantity('1/4 in', 'length')).toEqual(parseWithMathjs('1/4 in', 'length'));
    expect(parseQuantity('0,6 m', 'length')).toEqual({ ok: true, value: 0.6 });
  });

  it('parseQuantityLazy gives what parseQuantity gives, loading mathjs only for the rest', async () => {
    for (const [text, kind] of [['12 mm', 'length'], ['4.5 inch', 'length'], ['2 yd', 'length'], ['3 kg', 'length'], ['60 Hz', 'frequency'], ['abc', 'current']] as const) {
      expect(await parseQuantityLazy(text, kind), text).toEqual(parseQuantity(text, kind));
    }
  });

  it('readSimpleQuantity names the unit system of a length, and siFactor the size of a unit', () => {
    expect(readSimpleQuantity('4 in')?.unit.system).toBe('imperial');
    expect(readSimpleQuantity('0,6 m')).toMatchObject({ value: 0.6, unit: { system: 'metric' } });
    expect(readSimpleQuantity('4 i')).toBeNull();
    expect(siFactor('µH')).toBe(1e-6);
    expect(siFactor('in')).toBe(0.0254);
    expect(siFactor('parsec')).toBeUndefined();
  });

  it('parseSparkParam reads the feet and inch marks and "metres" through the same reader', () => {
    expect(parseSparkParam('48"')).toEqual({ ok: true, value: 48 * 0.0254 });
    expect(parseSparkParam('2 metres')).toEqual({ ok: true, value: 2 });
    expect(parseSparkParam('1.5 M')).toEqual({ ok: true, value: 1.5 });
  });
});

describe('formatSi (the one SI formatter)', () => {
  it('formatSi chooses the prefix after rounding to the digits shown', () => {
    expect(formatSi(999_600, 'Hz', 3)).toBe('1 MHz');
    expect(formatSi(999_600, 'Hz', 4)).toBe('999.6 kHz');
    expect(formatSi(312_400, 'Hz', 3)).toBe('312 kHz');
  });

  it('formatSi puts no prefix on counts, turns, percentages and kilograms, and none above unity on metres', () => {
    expect(formatSi(1234, '', 3)).toBe('1230');
    expect(formatSi(12.5, 'turns', 3)).toBe('12.5 turns');
    expect(formatSi(2500, 'kg', 3)).toBe('2500 kg');
    expect(formatSi(1234, 'm', 3)).toBe('1230 m');
    expect(formatSi(0.0123, 'm', 3)).toBe('12.3 mm');
    expect(formatSi(4700, 'Ω', 3)).toBe('4.7 kΩ');
  });

  it('formatSi keeps 1 ≤ |value| < 1000 for any value between 1 pF and 1 GHz (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-12, max: 1e11, noNaN: true }), fc.integer({ min: 2, max: 6 }), (x, d) => {
        const text = formatSi(x, 'Hz', d);
        const shown = Number(text.split(' ')[0]);
        expect(shown, text).toBeGreaterThanOrEqual(1);
        expect(shown, text).toBeLessThan(1000);
      }),
      { numRuns: 500 },
    );
  });
});

describe('formatDate (the one date format)', () => {
  it('formatDate shows the day, with the time when asked, and a dash for a missing date', () => {
    const iso = '2026-03-14T15:09:00Z';
    const day = formatDate(iso);
    expect(day).toMatch(/2026/);
    expect(day).not.toMatch(/\d{2}:\d{2}/);
    expect(formatDate(iso, true)).toMatch(/\d{1,2}:\d{2}/);
    expect(formatDate('')).toBe('—');
    expect(formatDate('not a date')).toBe('—');
  });
});
