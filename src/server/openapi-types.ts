import type { ZodType } from 'zod';

/** A success answer: JSON described by a contract schema, or another media type (a file, a PDF, text). */
export type ResponseDoc = { description: string; schema: ZodType } | { description: string; media: string };

export type RouteDoc = {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: string;
  summary: string;
  body?: ZodType;
  /** the body may be left out entirely */
  bodyOptional?: boolean;
  /** default application/json */
  bodyMedia?: string;
  query?: ZodType;
  auth?: boolean;
  /** success codes with their contract schema; error codes (≥ 400) with a description, answered with the Error schema */
  responses: Record<number, ResponseDoc | string>;
};

export const json = (schema: ZodType, description: string): ResponseDoc => ({ schema, description });
export const media = (type: string, description: string): ResponseDoc => ({ media: type, description });
export const noContent = (description: string) => description;
