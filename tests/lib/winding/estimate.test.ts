import { describe, expect, it } from 'vitest';
import { analyseReadings, checkCount, maxHeight, turnsFromHeight } from '~/lib/winding';
import { assertClose } from '../../helpers/assertClose';

// Hand-computed cases: a 0.5 mm pitch, a 38.1 mm (1.5 in) bare start of the form.
const PITCH = 0.5e-3;
const OFFSET = 0.0381;

describe('turnsFromHeight(height, datum, startOffset, pitch)', () => {
  it('turnsFromHeight from the first turn is height / pitch: 100 mm at 0.5 mm holds 200 turns', () => {
    const e = turnsFromHeight(0.1, 'first-turn', OFFSET, PITCH);
    assertClose(e.windingHeight, 0.1, 1e-12, 'winding height');
    assertClose(e.turns, 200, 1e-12, 'turns');
  });

  it('turnsFromHeight from the form end subtracts the start offset first: 138.1 mm − 38.1 mm = 100 mm = 200 turns', () => {
    const e = turnsFromHeight(0.1381, 'form-end', OFFSET, PITCH);
    assertClose(e.windingHeight, 0.1, 1e-9, 'winding height');
    assertClose(e.turns, 200, 1e-9, 'turns');
  });

  it('turnsFromHeight gives the same count from either datum for the same mark', () => {
    const a = turnsFromHeight(0.25 + OFFSET, 'form-end', OFFSET, 0.6e-3);
    const b = turnsFromHeight(0.25, 'first-turn', OFFSET, 0.6e-3);
    assertClose(a.turns, b.turns, 1e-9, 'both datums');
    assertClose(b.turns, 0.25 / 0.6e-3, 1e-12, '250 mm at 0.6 mm');
  });

  it('turnsFromHeight states its tolerance: (1 mm + 1 % of the height) / pitch + 1 turn', () => {
    // (1 mm + 1 mm) / 0.5 mm + 1 = 5 turns at 100 mm
    assertClose(turnsFromHeight(0.1, 'first-turn', OFFSET, PITCH).tolerance, 5, 1e-12, 'tolerance at 100 mm');
    // (1 mm + 3 mm) / 0.5 mm + 1 = 9 turns at 300 mm
    assertClose(turnsFromHeight(0.3, 'first-turn', OFFSET, PITCH).tolerance, 9, 1e-12, 'tolerance at 300 mm');
  });

  it('turnsFromHeight refuses a pitch that is not above 0', () => {
    expect(() => turnsFromHeight(0.1, 'first-turn', OFFSET, 0)).toThrow(RangeError);
  });
});

describe('checkCount(counter, estimate)', () => {
  const at200 = turnsFromHeight(0.1, 'first-turn', OFFSET, PITCH); // 200 ± 5 turns

  it('checkCount accepts a counter within the tolerance of the height', () => {
    expect(checkCount(196, at200)).toBeNull();
    expect(checkCount(205, at200)).toBeNull();
  });

  it('checkCount flags a counter 10 turns behind the height as missing counts, with the corrected count', () => {
    const f = checkCount(190, at200)!;
    expect(f.direction).toBe('counter-low');
    expect(f.correctedCount).toBe(200);
    assertClose(f.difference, -10, 1e-12, 'difference');
    expect(f.cause).toMatch(/missing counts/);
    expect(f.advice).toMatch(/Slow the winder down|dwell/);
  });

  it('checkCount flags a counter ahead of the height as counting twice', () => {
    const f = checkCount(207, at200)!;
    expect(f.direction).toBe('counter-high');
    expect(f.correctedCount).toBe(200);
  });
});

describe('analyseReadings(readings, startOffset, pitch)', () => {
  it('analyseReadings carries the offset a height found to later readings without a height', () => {
    const out = analyseReadings(
      [
        { counter: 100, height: 0.05, datum: 'first-turn' }, // 100 turns: agrees
        { counter: 188, height: 0.1381, datum: 'form-end' }, // 200 turns: counter 12 behind
        { counter: 290, height: null, datum: null }, // still 12 behind
      ],
      OFFSET,
      PITCH,
    );
    expect(out[0].flag).toBeNull();
    expect(out[0].bestTurns).toBe(100);
    expect(out[1].flag?.correctedCount).toBe(200);
    expect(out[2].estimate).toBeNull();
    expect(out[2].bestTurns).toBe(302);
  });
});

describe('maxHeight(datum, formLength, startOffset)', () => {
  it('maxHeight is the form length from the form end and the form less the offset from the first turn', () => {
    expect(maxHeight('form-end', 0.6, OFFSET)).toBe(0.6);
    assertClose(maxHeight('first-turn', 0.6, OFFSET), 0.6 - OFFSET, 1e-12, 'from the first turn');
  });
});
