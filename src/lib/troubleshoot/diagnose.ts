import { RULES } from './rules';
import type { Diagnosis, Rule, RuleStatus, Symptom, TroubleshootContext } from './types';

const ORDER: Record<RuleStatus, number> = { triggered: 0, unknown: 1, clear: 2, 'not-applicable': 3 };

export function evaluateRule(rule: Rule, ctx: TroubleshootContext): Diagnosis {
  let outcome;
  try {
    outcome = rule.evaluate(ctx);
  } catch {
    outcome = { status: 'unknown' as const, finding: 'This check could not be computed for the design.' };
  }
  return {
    ruleId: rule.id,
    cause: rule.cause,
    threshold: rule.threshold,
    source: rule.source,
    nextCheck: rule.nextCheck,
    question: rule.question ?? null,
    status: outcome.status,
    finding: outcome.finding,
  };
}

/** The likely causes of a symptom, tested against the design and bench log: triggered first, then undecided, then clear. */
export function diagnose(symptom: Symptom, ctx: TroubleshootContext, rules: readonly Rule[] = RULES): Diagnosis[] {
  return rules
    .filter((r) => r.symptoms.includes(symptom))
    .map((r) => evaluateRule(r, ctx))
    .sort((a, b) => ORDER[a.status] - ORDER[b.status]);
}
