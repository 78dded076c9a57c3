import type { DesignSI, Result } from '../../solver';
import type { Calibration } from '../buildsheet/calibration';

export const SYMPTOMS = ['short-sparks', 'racing-sparks', 'primary-strikes', 'supply-trips'] as const;
export type Symptom = (typeof SYMPTOMS)[number];

export const SYMPTOM_LABELS: Record<Symptom, string> = {
  'short-sparks': 'Short sparks, or none',
  'racing-sparks': 'Racing sparks along the secondary',
  'primary-strikes': 'Strikes to the primary',
  'supply-trips': 'The supply trips or fails',
};

/** Yes/no questions about the build that no number can answer. */
export const QUESTIONS = {
  rfGround: 'Is the secondary base connected to a dedicated RF ground (heavy cable to ground rods), separate from the mains safety earth?',
  strikeRail: 'Is there a grounded strike rail just above and outside the primary, with a gap so it is not a closed ring?',
  breakoutPoint: 'Does the topload have a breakout point (a short rod or sharp point) where sparks can start?',
  groundFaultProtection: 'Does the transformer have built-in secondary ground-fault protection (labelled GFI or SCGFP)?',
  phaseLead: "Does the driver's feedback have phase-lead compensation (or a measured feedback delay under 5 % of a primary period)?",
} as const;
export type QuestionId = keyof typeof QUESTIONS;

/** Questions that belong to one kind of coil only: a bridge has no transformer, a spark gap no feedback. */
const QUESTION_FAMILY: Partial<Record<QuestionId, 'spark-gap' | 'solid-state'>> = {
  groundFaultProtection: 'spark-gap',
  phaseLead: 'solid-state',
};

/** The questions to ask about a design with this kind of supply. */
export function questionsFor(supplyKind: 'transformer' | 'solid-state' | null | undefined): QuestionId[] {
  const family = supplyKind === 'solid-state' ? 'solid-state' : 'spark-gap';
  return (Object.keys(QUESTIONS) as QuestionId[]).filter((q) => (QUESTION_FAMILY[q] ?? family) === family);
}
export type Answers = Partial<Record<QuestionId, boolean>>;

/** The latest bench measurement of each kind, SI units. */
export interface BenchValues {
  secondaryInductance?: number;
  bareFrequency?: number;
  loadedFrequency?: number;
  primaryInductance?: number;
  coupling?: number;
  sparkLength?: number;
  tapTurns?: number;
  woundTurns?: number;
  windingLength?: number;
  primaryRingFrequency?: number;
  peakPrimaryCurrent?: number;
  tripSetting?: number;
}

export interface TroubleshootContext {
  design: DesignSI;
  result: Result;
  bench: BenchValues;
  answers: Answers;
  calibration: Calibration;
}

/** triggered: this cause fits the design or bench log; clear: it does not; unknown: the data to decide is missing; not-applicable: the rule is for another kind of coil. */
export type RuleStatus = 'triggered' | 'clear' | 'unknown' | 'not-applicable';

export interface RuleOutcome {
  status: RuleStatus;
  /** what was found, with this design's numbers */
  finding: string;
}

export interface Rule {
  id: string;
  symptoms: readonly Symptom[];
  /** the likely cause, in a few words */
  cause: string;
  /** the threshold the rule applies, in words */
  threshold: string;
  /** where the rule and its threshold come from, or "common practice" / "our threshold" */
  source: string;
  /** the check to make next when the rule is triggered */
  nextCheck: string;
  /** the question the rule asks, when it depends on one */
  question?: QuestionId;
  evaluate(ctx: TroubleshootContext): RuleOutcome;
}

export interface Diagnosis {
  ruleId: string;
  cause: string;
  threshold: string;
  source: string;
  nextCheck: string;
  question: QuestionId | null;
  status: RuleStatus;
  finding: string;
}
