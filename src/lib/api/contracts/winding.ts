import { z } from 'zod';
import { HEIGHT_DATUMS, MAX_COATS, MAX_DRYING_HOURS, PAUSE_REASON_IDS } from '../../winding';
import { designRecordSchema } from './designs';
import { revisionMessageSchema, timestampSchema } from './common';

/**
 * The labels the winding page shows for each field; every message below names its field by these words, so a
 * refusal reads the same on the page and from the API.
 */
export const WINDING_FIELD_LABELS = {
  rpm: 'Winder speed',
  spoolLength: 'Wire on the spool',
  startOffset: 'Bare form below the first turn',
  formLength: 'Form length',
  counter: 'Counter reading',
  height: 'Measured height',
  datum: 'Height measured',
  reason: 'Reason for the pause',
  woundTurns: 'Turns wound',
  windingLength: 'Winding length, measured',
  coats: 'Coats',
  dryingHours: 'Drying time between coats',
} as const;
const L = WINDING_FIELD_LABELS;

const instant = (what: string) => timestampSchema.refine((t) => Date.parse(t) < Date.now() + 36 * 3600e3, `The ${what} is in the future.`);
const metres = (label: string, max: number, maxText: string) =>
  z
    .number({ error: `${label}: give a length in metres.` })
    .finite(`${label}: give a finite length.`)
    .positive(`${label} must be above 0.`)
    .max(max, `${label} above ${maxText} is surely a slip of the unit.`);

/** Session ids and reading ids are UUIDs; anything else names nothing (404). */
export const windingIdParamSchema = z.uuid();

/** POST /api/v1/designs/:id/winding: start a session at a winder speed. Lengths in metres. */
export const startWindingBodySchema = z
  .object({
    rpm: z.number({ error: `${L.rpm}: give the speed in revolutions per minute.` }).positive(`${L.rpm} must be above 0 rpm.`).max(3000, `${L.rpm} above 3000 rpm is not a winding jig.`),
    spoolLength: metres(L.spoolLength, 100_000, '100 km').nullable().optional(),
    startOffset: z.number({ error: `${L.startOffset}: give a length in metres.` }).min(0, `${L.startOffset} cannot be negative.`).max(1, `${L.startOffset} above 1 m is surely a slip of the unit.`).optional(),
    formLength: metres(L.formLength, 10, '10 m').optional(),
    startedAt: instant('start time').optional(),
  })
  .strict();

/** POST /api/v1/designs/:id/winding/:sessionId/readings: `id` is made by the client so a reading sent twice is stored once. */
export const windingReadingBodySchema = z
  .object({
    id: z.uuid({ error: 'id: give the reading a UUID made on this device.' }),
    at: instant('reading time'),
    counter: z.number({ error: `${L.counter}: give the number the counter shows.` }).int(`${L.counter} must be a whole number of turns.`).min(0, `${L.counter} cannot be negative.`).max(100_000, `${L.counter} above 100 000 turns is not plausible.`),
    height: z.number({ error: `${L.height}: give a length in metres.` }).finite().positive(`${L.height} must be above 0.`).nullable().optional(),
    datum: z.enum(HEIGHT_DATUMS, { error: `${L.datum}: from the form end or from the first turn.` }).nullable().optional(),
  })
  .strict()
  .superRefine((b, ctx) => {
    if (b.height != null && b.datum == null) ctx.addIssue({ code: 'custom', path: ['datum'], message: `${L.datum}: say whether the height is from the form end or from the first turn.` });
  });

/** POST …/:sessionId/pause */
export const windingPauseBodySchema = z
  .object({
    id: z.uuid({ error: 'id: give the pause a UUID made on this device.' }).optional(),
    reason: z.enum(PAUSE_REASON_IDS, { error: `${L.reason}: one of ${PAUSE_REASON_IDS.join(', ')}.` }),
    note: z.string().trim().max(500, 'Keep the note under 500 characters.').optional(),
    at: instant('pause time'),
  })
  .strict();

/** POST …/:sessionId/resume */
export const windingResumeBodySchema = z.object({ at: instant('resume time') }).strict();

/** POST …/:sessionId/finish: what was actually wound; both go into the bench log. */
export const windingFinishBodySchema = z
  .object({
    at: instant('finish time'),
    woundTurns: z.number({ error: `${L.woundTurns}: give the turns on the form.` }).int(`${L.woundTurns} must be a whole number.`).min(1, `${L.woundTurns} must be at least 1.`).max(100_000, `${L.woundTurns} above 100 000 is not plausible.`),
    windingLength: metres(L.windingLength, 10, '10 m'),
    notes: z.string().trim().max(2000, 'Keep the notes under 2000 characters.').optional(),
  })
  .strict();

/** POST …/:sessionId/adopt: the wound turns and winding length saved as a new revision of the design. */
export const windingAdoptBodySchema = z
  .object({
    revision: z.number({ error: 'Give the latest revision you saw (a whole number).' }).int().min(1).optional(),
    message: revisionMessageSchema.optional(),
  })
  .strict()
  .optional();

/** PUT …/:sessionId/checklist: absent keeps, null clears. */
export const windingChecklistBodySchema = z
  .object({
    baseEndFastened: z.boolean().optional(),
    topEndFastened: z.boolean().optional(),
    coating: z.string().trim().max(120, 'Keep the coating under 120 characters.').nullable().optional(),
    coats: z.number({ error: `${L.coats}: give a whole number.` }).int(`${L.coats} must be a whole number.`).min(0, `${L.coats} cannot be negative.`).max(MAX_COATS, `${L.coats} above ${MAX_COATS} is surely a typo.`).nullable().optional(),
    dryingHours: z.number({ error: `${L.dryingHours}: give hours.` }).min(0, `${L.dryingHours} cannot be negative.`).max(MAX_DRYING_HOURS, `${L.dryingHours} above ${MAX_DRYING_HOURS} h is surely a typo.`).nullable().optional(),
    notes: z.string().trim().max(2000, 'Keep the notes under 2000 characters.').nullable().optional(),
  })
  .strict();

export const countFlagSchema = z.object({
  direction: z.enum(['counter-low', 'counter-high']),
  difference: z.number(),
  tolerance: z.number(),
  cause: z.string(),
  advice: z.string(),
  correctedCount: z.number().int(),
});

export const windingReadingSchema = z.object({
  id: z.string(),
  at: timestampSchema,
  /** s of winding before this reading, pauses excluded */
  elapsed: z.number(),
  /** turns the winder speed gives at that time */
  expectedTurns: z.number(),
  counter: z.number().int(),
  height: z.number().nullable(),
  datum: z.enum(HEIGHT_DATUMS).nullable(),
  estimatedTurns: z.number().nullable(),
  tolerance: z.number().nullable(),
  flag: countFlagSchema.nullable(),
  bestTurns: z.number(),
});

export const windingPauseSchema = z.object({
  id: z.string(),
  reason: z.enum(PAUSE_REASON_IDS),
  note: z.string().nullable(),
  startedAt: timestampSchema,
  endedAt: timestampSchema.nullable(),
});

export const windingChecklistSchema = z.object({
  baseEndFastened: z.boolean(),
  topEndFastened: z.boolean(),
  coating: z.string().nullable(),
  coats: z.number().int().nullable(),
  dryingHours: z.number().nullable(),
  notes: z.string().nullable(),
});

export const windingSessionSchema = z.object({
  id: z.string(),
  designId: z.string(),
  designName: z.string(),
  revision: z.number().int(),
  status: z.enum(['running', 'paused', 'finished']),
  startedBy: z.string().nullable(),
  rpm: z.number(),
  spoolLength: z.number().nullable(),
  startOffset: z.number(),
  formLength: z.number(),
  plan: z.object({
    turns: z.number().int(),
    pitch: z.number(),
    pitchSource: z.enum(['insulated-diameter', 'design-spacing']),
    windingDiameter: z.number(),
    insulatedDiameter: z.number(),
    windingLength: z.number(),
    wireLength: z.number(),
  }),
  startedAt: timestampSchema,
  finishedAt: timestampSchema.nullable(),
  woundTurns: z.number().int().nullable(),
  windingLength: z.number().nullable(),
  notes: z.string().nullable(),
  adoptedRevision: z.number().int().nullable(),
  /** the tolerance the count check uses, in words */
  tolerance: z.string(),
  /** best count of the turns on the form at the last reading */
  bestTurns: z.number().nullable(),
  readings: z.array(windingReadingSchema),
  pauses: z.array(windingPauseSchema),
  checklist: windingChecklistSchema,
});

/** GET /api/v1/designs/:id/winding (and /api/v1/shared/:token/winding: finished sessions only) */
export const windingSessionListResponseSchema = z.object({ sessions: z.array(windingSessionSchema) });

/** POST …/readings: `stored` is false when the reading was already there (sent before) and nothing was added. */
export const windingReadingResponseSchema = z.object({ stored: z.boolean(), reading: windingReadingSchema, session: windingSessionSchema });

/** POST …/adopt */
export const windingAdoptResponseSchema = z.object({ session: windingSessionSchema, design: designRecordSchema });

export type StartWindingBody = z.input<typeof startWindingBodySchema>;
export type WindingReadingBody = z.input<typeof windingReadingBodySchema>;
export type WindingPauseBody = z.input<typeof windingPauseBodySchema>;
export type WindingResumeBody = z.input<typeof windingResumeBodySchema>;
export type WindingFinishBody = z.input<typeof windingFinishBodySchema>;
export type WindingAdoptBody = z.input<typeof windingAdoptBodySchema>;
export type WindingChecklistBody = z.input<typeof windingChecklistBodySchema>;
export type WindingReading = z.infer<typeof windingReadingSchema>;
export type WindingPause = z.infer<typeof windingPauseSchema>;
export type WindingChecklist = z.infer<typeof windingChecklistSchema>;
export type WindingSession = z.infer<typeof windingSessionSchema>;
export type WindingSessionListResponse = z.infer<typeof windingSessionListResponseSchema>;
export type WindingReadingResponse = z.infer<typeof windingReadingResponseSchema>;
export type WindingAdoptResponse = z.infer<typeof windingAdoptResponseSchema>;
