import { afterEach, describe, expect, it, vi } from 'vitest';
import fc from 'fast-check';
import { parseQuantityQuick, SIMPLE_UNITS } from '~/lib/format/units';
import { parseQuantity as parseQuantityWithMathjs, parseWithMathjs } from '~/lib/format/units-mathjs';
import { FullReaderNeeded, hasFullReader, parseQuantity, setFullReader, withFullReader, type FullReader } from '~/lib/format/units-reader';
import { parseDesign } from '~/lib/design/parse';
import { exampleDesigns } from '~/lib/design/examples';
import { runRequestLoading } from '~/workers/solver-tasks';
import { solveRequestLoading } from '~/workers/solve-task';

// every test starts and ends with mathjs as the full reader, as the server and the other tests have it
afterEach(() => setFullReader(parseWithMathjs));

const UNITS = [...SIMPLE_UNITS.entries()];

/** Numbers as people type them: whole, with decimals, with an exponent, negative, with a leading point. */
const numberText = fc.oneof(
  fc.double({ min: -1e7, max: 1e7, noNaN: true, noDefaultInfinity: true }).map((n) => String(n)),
  fc.tuple(fc.double({ min: 0, max: 1e5, noNaN: true, noDefaultInfinity: true }), fc.integer({ min: 0, max: 6 })).map(([n, d]) => n.toFixed(d)),
  fc.tuple(fc.integer({ min: 1, max: 999 }), fc.integer({ min: -12, max: 12 })).map(([m, e]) => `${m}e${e}`),
  fc.integer({ min: 1, max: 99999 }).map((d) => `.${d}`),
);

describe('the table-driven reader of plain quantities against mathjs', () => {
  it('gives exactly the SI value mathjs gives, for every unit of the table and any number (fast-check)', () => {
    for (const [unit, spec] of UNITS) {
      fc.assert(
        fc.property(numberText, fc.constantFrom('', ' '), (n, gap) => {
          const text = `${n}${gap}${unit}`;
          const quick = parseQuantityQuick(text, spec.kind);
          const full = parseWithMathjs(text, spec.kind);
          expect(quick, `${text} as ${spec.kind}`).not.toBeNull();
          expect(full.ok, `${text}: mathjs reads it`).toBe(true);
          expect(quick).toEqual(full);
          if (quick?.ok && full.ok) expect(Object.is(quick.value, full.value), `${text}: ${quick.value} vs ${full.value}`).toBe(true);
        }),
        { numRuns: 150 },
      );
    }
  });

  it('covers the units the design fields are written in', () => {
    for (const unit of ['in', 'mm', 'cm', 'm', 'ft', 'nF', 'pF', 'uF', 'uH', 'mH', 'kV', 'V', 'mA', 'A', 'Hz', 'kHz', 'MHz', 'us', 'ms', 'deg', 'rad']) {
      expect(SIMPLE_UNITS.has(unit), unit).toBe(true);
    }
    expect(parseQuantityQuick('4.5 in', 'length')).toEqual(parseWithMathjs('4.5 in', 'length'));
    expect(parseQuantityQuick('20 nF', 'capacitance')).toEqual(parseWithMathjs('20 nF', 'capacitance'));
    expect(parseQuantityQuick('0.25 mm', 'length')).toEqual(parseWithMathjs('0.25 mm', 'length'));
    expect(parseQuantityQuick('120 kHz', 'frequency')).toEqual(parseWithMathjs('120 kHz', 'frequency'));
  });
});

describe('parseQuantity: the plain forms without mathjs, everything else through the full reader', () => {
  const OTHER = [
    ['1/4 in', 'length'],
    ['5 ft + 3 in', 'length'],
    ['2 yd', 'length'],
    ['3 kg', 'length'],
    ['12 kV', 'length'],
    ['20 nF', 'inductance'],
    ['2 * 10 nF', 'capacitance'],
    ['4 inch^1', 'length'],
    ['abc', 'current'],
    ['60 hz', 'frequency'],
  ] as const;

  it('hands every text the table does not cover to the full reader, and no plain form (fast-check)', () => {
    const spy = vi.fn<FullReader>(parseWithMathjs);
    setFullReader(spy);
    for (const [text, kind] of OTHER) {
      spy.mockClear();
      expect(parseQuantity(text, kind), text).toEqual(parseQuantityWithMathjs(text, kind));
      expect(spy, text).toHaveBeenCalledOnce();
    }
    spy.mockClear();
    fc.assert(
      fc.property(numberText, fc.constantFrom(...UNITS), (n, [unit, spec]) => {
        parseQuantity(`${n} ${unit}`, spec.kind);
      }),
      { numRuns: 500 },
    );
    expect(spy).not.toHaveBeenCalled();
  });

  it('keeps the messages for bare numbers and empty text without the full reader', () => {
    setFullReader(null);
    for (const [text, kind] of [['12', 'length'], ['  ', 'voltage'], ['1,2,3 mm', 'length'], ['0,5 in', 'length']] as const) {
      expect(parseQuantity(text, kind), text).toEqual(parseQuantityWithMathjs(text, kind));
    }
    expect(parseQuantity('12', 'length')).toMatchObject({ ok: false, message: expect.stringContaining('a number without a unit') });
  });

  it('without the full reader a text that needs it throws FullReaderNeeded; withFullReader loads mathjs and answers as mathjs does', async () => {
    setFullReader(null);
    expect(hasFullReader()).toBe(false);
    expect(() => parseQuantity('1/4 in', 'length')).toThrow(FullReaderNeeded);
    expect(await withFullReader(() => parseQuantity('1/4 in', 'length'))).toEqual(parseWithMathjs('1/4 in', 'length'));
    expect(hasFullReader()).toBe(true);
  });

  it('a design read without mathjs up front gives the issues, naming the field, that it gives with mathjs', async () => {
    const ex = exampleDesigns[0].design;
    const bad = { ...ex, secondary: { ...ex.secondary, formDiameter: '3 kg' } };
    const withMathjs = parseDesign(bad);
    expect(withMathjs.ok).toBe(false);
    setFullReader(null);
    const lazily = await withFullReader(() => parseDesign(bad));
    expect(lazily).toEqual(withMathjs);
    expect(!lazily.ok && lazily.issues.some((i) => i.path === 'secondary.formDiameter' && /length/.test(i.message))).toBe(true);
  });

  it('the solver worker’s requests read designs with expressions by loading mathjs on their first need', async () => {
    const ex = exampleDesigns[0].design;
    // yards are not in the table: the diameter is read by mathjs
    const quarter = { ...ex, secondary: { ...ex.secondary, formDiameter: '0.1 yd' } };
    setFullReader(parseWithMathjs);
    const expected = await solveRequestLoading(1, quarter);
    expect(expected.ok).toBe(true);
    setFullReader(null);
    const got = await solveRequestLoading(1, quarter);
    expect(got.ok && expected.ok && got.reply.type === 'solve' && expected.reply.type === 'solve' ? got.reply.data.result : null).toEqual(
      expected.ok && expected.reply.type === 'solve' ? expected.reply.data.result : 'no result',
    );
    setFullReader(null);
    const goal = await runRequestLoading(2, { type: 'goal', input: quarter, goal: { kind: 'frequency', hz: 250e3 } });
    expect(goal.ok).toBe(true);
  });
});
