import { describe, expect, it } from 'vitest';
import { referenceCases } from '../../src/lib/validation/cases';
import { physicsCases } from '../../src/lib/validation/cases-physics';
import { FIELD_WINDING_ACCURACY } from '../../src/solver/field/model';

describe('referenceCases', () => {
  it.each(referenceCases.map((c) => [c.id, c] as const))('%s agrees with its reference within tolerance', (_id, c) => {
    const got = c.compute();
    const err = Math.abs(got - c.reference) / Math.abs(c.reference);
    if (!Number.isFinite(got) || !(err <= c.tolerance)) {
      throw new Error(
        `${c.id} (${c.quantity}) inputs ${JSON.stringify(c.inputs)}: got ${got} ${c.unit}, expected ${c.reference} ${c.unit}, ` +
          `relative error ${err.toExponential(3)} > tolerance ${c.tolerance} — source: ${c.source}`,
      );
    }
  });

  it('referenceCases has unique ids, a source for every case and at most 3 cases per quantity', () => {
    const ids = referenceCases.map((c) => c.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const c of referenceCases) {
      expect(c.source.length).toBeGreaterThan(10);
      expect(c.tolerance).toBeGreaterThan(0);
      // the field model's self-capacitance rows carry its stated ±30 % against Medhurst's table (field/model.ts)
      expect(c.tolerance).toBeLessThanOrEqual(c.id.startsWith('field-medhurst-') ? FIELD_WINDING_ACCURACY : 0.1);
    }
    const perQuantity = new Map<string, number>();
    for (const c of physicsCases) perQuantity.set(c.quantity, (perQuantity.get(c.quantity) ?? 0) + 1);
    for (const [quantity, count] of perQuantity) expect(count, `${quantity} has ${count} cases`).toBeLessThanOrEqual(3);
  });

  it('physicsCases covers at least 25 cases over 8 quantities, 10 of them published tables or closed forms', () => {
    expect(physicsCases.length).toBeGreaterThanOrEqual(25);
    expect(new Set(physicsCases.map((c) => c.method)).size).toBeGreaterThanOrEqual(6);
    expect(new Set(physicsCases.map((c) => c.quantity)).size).toBeGreaterThanOrEqual(8);
    expect(physicsCases.filter((c) => c.kind === 'published-table' || c.kind === 'closed-form').length).toBeGreaterThanOrEqual(10);
  });
});
