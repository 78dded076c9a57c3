import { describe, expect, it } from 'vitest';
import { RESULT_FIGURES } from '../../src/lib/design/figures';
import { DRIVE_FIGURES, LEAD_FIGURES, RESULT_GROUPS, UNGROUPED_FIGURES } from '../../src/lib/design/figure-groups';

describe('result groups', () => {
  it('place every figure of the registry exactly once: in the lead, in one group, in the drive panel, or among the comparisons kept off the panel', () => {
    const placed = [...LEAD_FIGURES, ...RESULT_GROUPS.flatMap((g) => g.figures), ...DRIVE_FIGURES, ...UNGROUPED_FIGURES];
    const keys = RESULT_FIGURES.map((f) => f.key);
    expect([...placed].sort()).toEqual([...keys].sort());
    expect(new Set(placed).size).toBe(placed.length);
  });
  it('are ordered by what the builder does: buy, set, measure, what can hurt', () => {
    expect(RESULT_GROUPS.map((g) => g.title)).toEqual(['What to buy', 'What to set', 'What to expect when measuring', 'What can hurt']);
  });
});
