import type { ZodType } from 'zod';

export type RouteDoc = {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: string;
  summary: string;
  body?: ZodType;
  query?: ZodType;
  auth?: boolean;
  responses: Record<number, string>;
};
