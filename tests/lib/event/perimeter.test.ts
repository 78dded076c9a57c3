import { describe, expect, it } from 'vitest';
import { PERIMETER_MARGIN, chooseSparkLength, eventPerimeter } from '~/lib/event/perimeter';
import { parseSparkParam } from '~/lib/event/spark-param';

describe('eventPerimeter', () => {
  it('eventPerimeter(spark, topload) adds the topload radius, the arc and a 10 ft margin', () => {
    const p = eventPerimeter({ sparkLength: 1.366, toploadRadius: 0.375 });
    expect(PERIMETER_MARGIN).toBeCloseTo(3.048, 12);
    expect(p.arcReach).toBeCloseTo(1.741, 12);
    expect(p.radius).toBeCloseTo(1.741 + 3.048, 12);
    expect(p.diameter).toBeCloseTo(2 * (1.741 + 3.048), 12);
    expect(p.circumference).toBeCloseTo(2 * Math.PI * 4.789, 12);
    expect(p.area).toBeCloseTo(Math.PI * 4.789 * 4.789, 10);
  });

  it('eventPerimeter(spark) without a topload measures from the axis, and a stated margin replaces 10 ft', () => {
    expect(eventPerimeter({ sparkLength: 2 }).radius).toBeCloseTo(5.048, 12);
    expect(eventPerimeter({ sparkLength: 2, margin: 5 }).radius).toBeCloseTo(7, 12);
  });

  it('eventPerimeter rejects negative and non-finite lengths naming the quantity', () => {
    expect(() => eventPerimeter({ sparkLength: -1 })).toThrow(/spark length/);
    expect(() => eventPerimeter({ sparkLength: Number.NaN })).toThrow(/spark length/);
    expect(() => eventPerimeter({ sparkLength: 1, toploadRadius: Number.POSITIVE_INFINITY })).toThrow(/topload radius/);
    expect(() => eventPerimeter({ sparkLength: 1, margin: -3 })).toThrow(/margin/);
  });
});

describe('chooseSparkLength', () => {
  it('chooseSparkLength prefers a stated length, then the estimate, then the design streamer length', () => {
    expect(chooseSparkLength({ stated: 1.2, estimate: 1.4, design: 0.8 })).toEqual({ length: 1.2, origin: 'stated' });
    expect(chooseSparkLength({ stated: null, estimate: 1.4, design: 0.8 })).toEqual({ length: 1.4, origin: 'estimate' });
    expect(chooseSparkLength({ stated: null, estimate: null, design: 0.8 })).toEqual({ length: 0.8, origin: 'design' });
    expect(chooseSparkLength({ stated: null, estimate: null, design: null })).toBeNull();
  });
});

describe('parseSparkParam', () => {
  it('parseSparkParam reads metric and imperial lengths into metres', () => {
    const cases: Array<[string, number]> = [
      ['1.2 m', 1.2],
      ['1.2m', 1.2],
      ['120 cm', 1.2],
      ['1500 mm', 1.5],
      ['4 ft', 1.2192],
      ["4'", 1.2192],
      ['48 in', 1.2192],
    ];
    for (const [raw, metres] of cases) {
      const r = parseSparkParam(raw);
      expect(r.ok, raw).toBe(true);
      if (r.ok) expect(r.value, raw).toBeCloseTo(metres, 12);
    }
  });

  it('parseSparkParam treats an absent or empty parameter as not given', () => {
    expect(parseSparkParam(null)).toEqual({ ok: true, value: null });
    expect(parseSparkParam('  ')).toEqual({ ok: true, value: null });
  });

  it('parseSparkParam rejects bad input with a message naming the field', () => {
    for (const raw of ['abc', '3 kg', '-1 m', '0 m', '1e9 m', 'NaN', '5']) {
      const r = parseSparkParam(raw);
      expect(r.ok, raw).toBe(false);
      if (!r.ok) expect(r.message, raw).toMatch(/^Longest arc:/);
    }
    // a bare number is refused by the designer's own rule, not read as metres
    const bare = parseSparkParam('5');
    if (!bare.ok) expect(bare.message).toContain('a number alone is refused: give its unit');
  });
});
