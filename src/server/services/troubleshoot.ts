import { z } from 'zod';
import type { Db } from '../db/client';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { authorize } from './designs';
import { measurementRows } from './measurements';
import { requireSolved, solvedRow, type SolvedDesign } from './solve';
import { readCalibration } from '../../lib/buildsheet';
import { QUESTIONS, SYMPTOMS, SYMPTOM_LABELS, benchValues, diagnose, type Answers, type QuestionId, type Symptom } from '../../lib/troubleshoot';

const answer = z.enum(['yes', 'no', ''], { error: 'Answer yes, no, or leave it empty.' }).optional();

export const troubleshootQuerySchema = z.object({
  symptom: z.enum(SYMPTOMS, { error: `symptom must be one of: ${SYMPTOMS.join(', ')}.` }).optional(),
  rfGround: answer,
  strikeRail: answer,
  breakoutPoint: answer,
  groundFaultProtection: answer,
});
export type TroubleshootQuery = z.output<typeof troubleshootQuerySchema>;

export function parseTroubleshootQuery(url: URL): TroubleshootQuery {
  const raw: Record<string, string> = {};
  for (const key of ['symptom', ...Object.keys(QUESTIONS)]) {
    const v = url.searchParams.get(key);
    if (v !== null && v !== '') raw[key] = v;
  }
  const r = troubleshootQuerySchema.safeParse(raw);
  if (!r.success) throw new ApiError('validation_failed', 'Some parameters need attention.', r.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })));
  return r.data;
}

export const diagnosisSchema = z.object({
  ruleId: z.string(),
  cause: z.string(),
  threshold: z.string(),
  source: z.string(),
  nextCheck: z.string(),
  question: z.string().nullable(),
  status: z.enum(['triggered', 'clear', 'unknown', 'not-applicable']),
  finding: z.string(),
});

export const troubleshootResponseSchema = z.object({
  questions: z.array(z.object({ id: z.string(), text: z.string(), answer: z.boolean().nullable() })),
  symptoms: z.array(z.object({ symptom: z.enum(SYMPTOMS), label: z.string(), causes: z.array(diagnosisSchema) })),
});

/** The guided check for one symptom (or all four), against the design, its bench log and the answers given. */
export async function troubleshootDesign(db: Db, u: SessionUser | null, designId: string, q: TroubleshootQuery) {
  const { row } = await authorize(db, designId, u, 'read');
  return troubleshootOf(db, solvedRow(row), q);
}

/** The guided check of a design already authorized, from its solved result. */
export async function troubleshootOf(db: Db, d: SolvedDesign, q: TroubleshootQuery) {
  const { design, result } = requireSolved(d);
  const answers: Answers = {};
  for (const id of Object.keys(QUESTIONS) as QuestionId[]) {
    const a = q[id];
    if (a === 'yes') answers[id] = true;
    else if (a === 'no') answers[id] = false;
  }
  const rows = await measurementRows(db, d.id);
  const ctx = {
    design,
    result,
    bench: benchValues(rows.map((r) => ({ kind: r.kind, value: r.value, measuredAt: r.measuredAt }))),
    answers,
    calibration: readCalibration(d.calibration),
  };
  const list: Symptom[] = q.symptom ? [q.symptom] : [...SYMPTOMS];
  return {
    questions: (Object.keys(QUESTIONS) as QuestionId[]).map((id) => ({ id, text: QUESTIONS[id], answer: answers[id] ?? null })),
    symptoms: list.map((symptom) => ({ symptom, label: SYMPTOM_LABELS[symptom], causes: diagnose(symptom, ctx) })),
  };
}
