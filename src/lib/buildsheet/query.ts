import { z } from 'zod';

const num = (name: string, hint: string) =>
  z
    .string()
    .trim()
    .regex(/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/, `${name} must be a number (${hint}).`)
    .transform(Number);

/** Query of the build sheet page and PDF; each parameter optional, each error naming it. */
export const buildSheetQuerySchema = z.object({
  rpm: num('rpm', 'winder speed in revolutions per minute')
    .pipe(z.number().gt(0, 'rpm must be above 0.').max(10000, 'rpm above 10 000 is not a winder speed.'))
    .default(60),
  margin: num('margin', 'extra wire as a fraction, e.g. 0.1 for 10 %')
    .pipe(z.number().min(0, 'margin cannot be negative.').max(2, 'margin above 2 (200 % extra) is surely a typo; give a fraction such as 0.1.'))
    .default(0.1),
  every: num('every', 'turns between checkpoints')
    .pipe(z.number().int('every must be a whole number of turns.').min(1, 'every must be at least 1 turn.').max(100000, 'every is too large.'))
    .default(100),
});

export type BuildSheetQuery = z.output<typeof buildSheetQuerySchema>;
