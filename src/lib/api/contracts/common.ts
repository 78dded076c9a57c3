import { z } from 'zod';
import { designInputSchema, designNameSchema, type DesignInput } from '../../design/schema';
// request bodies are checked synchronously: the schema's unit reader gets mathjs for every text
import '../../format/units-mathjs';
import type { Result } from '../../../solver/types';
import { designRoles } from '../../permissions';

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** An instant as the API writes it: ISO 8601 in UTC, e.g. 2026-03-14T09:30:00.000Z. */
export const timestampSchema = z.iso.datetime({ offset: true });

export const designRoleSchema = z.enum(designRoles);

/** The name rule of a design, written once in the design schema. */
export { designNameSchema };

/** A revision message; optional on every save. */
export const revisionMessageSchema = z.string().max(500, 'Keep the message under 500 characters.');

/** The design input as the solver takes it (CONTRACT.md, Design). */
export { designInputSchema };

/**
 * A design as it was saved: the input exactly as given. A design saved before a schema change may no longer
 * validate, so responses carry it unchecked; its `result` is then null.
 */
export const storedDesignSchema = z.custom<DesignInput>(isRecord, { error: 'Expected a design object.' }).meta({
  id: 'StoredDesign',
  description: 'The design input exactly as saved (see components.schemas.Design).',
});

/**
 * The solver's result (CONTRACT.md, Result). Typed with the solver's own Result type rather than restated here;
 * the OpenAPI document refers to components.schemas.Result.
 */
export const resultSchema = z.custom<Result>(isRecord, { error: 'Expected a result object.' }).meta({
  id: 'Result',
  description: 'The solver’s result for the design, SI units (CONTRACT.md, Result).',
});

/** Key figures stored with each revision, so lists need not solve every design again. */
export const resultSummarySchema = z.object({
  loadedFrequency: z.number().nullable(),
  tapTurns: z.number().nullable(),
  k: z.number().nullable(),
  inductance: z.number().nullable(),
});

export type ResultSummary = z.infer<typeof resultSummarySchema>;
export type { DesignInput, Result };
