import { describe, expect, it } from 'vitest';
import { referenceCases } from '~/lib/validation/cases';
import { methodNoteFor, methodNotes } from '~/lib/content/methods';

describe('methodNotes', () => {
  it('methodNoteFor(case.method) finds a note on /methods for every reference case', () => {
    const missing = [...new Set(referenceCases.map((c) => c.method))].filter((m) => methodNoteFor(m) === undefined);
    expect(missing, `methods with no note on /methods: ${missing.join(', ')}`).toEqual([]);
  });

  it('methodNotes anchors are unique, including aliases', () => {
    const anchors = methodNotes.flatMap((n) => [n.id, ...n.aliases]);
    expect(new Set(anchors).size).toBe(anchors.length);
  });

  it('methodNotes each give a formula, accuracy, range, references with a provenance mark and what is not modelled', () => {
    for (const n of methodNotes) {
      expect(n.formulas.length, n.id).toBeGreaterThan(0);
      expect(n.accuracy.length, n.id).toBeGreaterThan(10);
      expect(n.range.length, n.id).toBeGreaterThan(5);
      expect(n.references.length, n.id).toBeGreaterThan(0);
      expect(n.notModelled.length, n.id).toBeGreaterThan(0);
      for (const r of n.references) expect(r.mark.length, `${n.id}: ${r.text}`).toBeGreaterThan(0);
    }
  });
});
