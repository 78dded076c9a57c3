import { z } from 'zod';
import { QUESTIONS, SYMPTOMS } from '../../troubleshoot/types';

export { buildSheetQuerySchema, type BuildSheetQuery } from '../../buildsheet/query';

/** GET /api/v1/designs/:id/summary and /api/v1/shared/:token/summary: text/plain or text/markdown. */
export const summaryQuerySchema = z.object({ format: z.enum(['text', 'markdown'], { error: 'Choose text or markdown.' }).default('text') });

const answer = z.enum(['yes', 'no', ''], { error: 'Answer yes, no, or leave it empty.' }).optional();

/** GET /api/v1/designs/:id/troubleshoot: one symptom (or all four) and the yes/no answers given so far. */
export const troubleshootQuerySchema = z.object({
  symptom: z.enum(SYMPTOMS, { error: `symptom must be one of: ${SYMPTOMS.join(', ')}.` }).optional(),
  rfGround: answer,
  strikeRail: answer,
  breakoutPoint: answer,
  groundFaultProtection: answer,
  phaseLead: answer,
});

const questionIds = Object.keys(QUESTIONS) as [keyof typeof QUESTIONS, ...(keyof typeof QUESTIONS)[]];

export const diagnosisSchema = z.object({
  ruleId: z.string(),
  cause: z.string(),
  threshold: z.string(),
  source: z.string(),
  nextCheck: z.string(),
  question: z.enum(questionIds).nullable(),
  status: z.enum(['triggered', 'clear', 'unknown', 'not-applicable']),
  finding: z.string(),
});

export const troubleshootResponseSchema = z.object({
  questions: z.array(z.object({ id: z.enum(questionIds), text: z.string(), answer: z.boolean().nullable() })),
  symptoms: z.array(z.object({ symptom: z.enum(SYMPTOMS), label: z.string(), causes: z.array(diagnosisSchema) })),
});

export type SummaryQuery = z.output<typeof summaryQuerySchema>;
export type TroubleshootQuery = z.output<typeof troubleshootQuerySchema>;
export type Diagnosis = z.infer<typeof diagnosisSchema>;
export type TroubleshootResponse = z.infer<typeof troubleshootResponseSchema>;
