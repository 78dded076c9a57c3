import { describe, expect, it } from 'vitest';
import { referenceCases } from '../../src/lib/validation/cases';
import { physicsCases } from '../../src/lib/validation/cases-physics';
import { assertClose } from '../helpers/assertClose';

describe('referenceCases', () => {
  it.each(referenceCases.map((c) => [c.id, c] as const))('%s agrees with its reference within tolerance', (_id, c) => {
    assertClose(c.compute(), c.reference, c.tolerance, `${c.id} (${c.quantity}, ${c.unit}) inputs ${JSON.stringify(c.inputs)}, source: ${c.source}`);
  });

  it('referenceCases has unique ids, a source for every case and at most 3 cases per quantity', () => {
    const ids = referenceCases.map((c) => c.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const c of referenceCases) {
      expect(c.source.length).toBeGreaterThan(10);
      expect(c.tolerance).toBeGreaterThan(0);
      expect(c.tolerance).toBeLessThanOrEqual(0.1);
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
