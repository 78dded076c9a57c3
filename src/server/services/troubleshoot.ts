import type { SessionUser } from '../session';
import { parseQuery } from '../http';
import { authorize } from './access';
import { measurementRows } from './measurements';
import { requireSolved, solvedRow, type SolvedDesign } from './solve';
import { readCalibration } from '../../lib/buildsheet';
import { troubleshootQuerySchema, type TroubleshootQuery, type TroubleshootResponse } from '../../lib/api/contracts';
import { QUESTIONS, SYMPTOMS, SYMPTOM_LABELS, benchValues, diagnose, questionsFor, type Answers, type QuestionId, type Symptom } from '../../lib/troubleshoot';

export function parseTroubleshootQuery(url: URL): TroubleshootQuery {
  return parseQuery(url, troubleshootQuerySchema);
}

/** The guided check for one symptom (or all four), against the design, its bench log and the answers given. */
export async function troubleshootDesign(u: SessionUser | null, designId: string, q: TroubleshootQuery): Promise<TroubleshootResponse> {
  const { row } = await authorize(designId, u, 'read');
  return troubleshootOf(solvedRow(row), q);
}

/** The guided check of a design already authorized, from its solved result. */
export async function troubleshootOf(d: SolvedDesign, q: TroubleshootQuery): Promise<TroubleshootResponse> {
  const { design, result } = requireSolved(d);
  const answers: Answers = {};
  for (const id of Object.keys(QUESTIONS) as QuestionId[]) {
    const a = q[id];
    if (a === 'yes') answers[id] = true;
    else if (a === 'no') answers[id] = false;
  }
  const rows = await measurementRows(d.id);
  const ctx = {
    design,
    result,
    bench: benchValues(rows.map((r) => ({ kind: r.kind, value: r.value, measuredAt: r.measuredAt }))),
    answers,
    calibration: readCalibration(d.calibration),
  };
  const list: Symptom[] = q.symptom ? [q.symptom] : [...SYMPTOMS];
  return {
    questions: questionsFor(design.supply?.kind).map((id) => ({ id, text: QUESTIONS[id], answer: answers[id] ?? null })),
    symptoms: list.map((symptom) => ({ symptom, label: SYMPTOM_LABELS[symptom], causes: diagnose(symptom, ctx) })),
  };
}
