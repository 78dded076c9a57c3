export { SYMPTOMS, SYMPTOM_LABELS, QUESTIONS, questionsFor, type Symptom, type QuestionId, type Answers, type BenchValues, type TroubleshootContext, type Rule, type RuleOutcome, type RuleStatus, type Diagnosis } from './types';
export { RULES } from './rules';
export { diagnose, evaluateRule } from './diagnose';
export { MEASUREMENT_KINDS, MEASUREMENT_KIND_IDS, predictionFor, relativeError, benchValues, type MeasurementKind } from './bench';
