import type { z } from 'zod';
import { designInputSchema, resultSchema } from './common';

/** POST /api/v1/solve: the body is a design (CONTRACT.md, Design); no sign-in, rate limited. */
export const solveBodySchema = designInputSchema;

/** → 200 the solver's result. */
export const solveResponseSchema = resultSchema;

export type SolveBody = z.input<typeof solveBodySchema>;
export type SolveResponse = z.infer<typeof solveResponseSchema>;
