import { z } from 'zod';
import { timestampSchema } from './common';

export const REVIEW_STATES = ['requested', 'signed_off', 'changes_requested'] as const;
export const reviewStateSchema = z.enum(REVIEW_STATES);

export const FINDING_STATUSES = ['ok', 'change', 'not_applicable'] as const;
export const findingStatusSchema = z.enum(FINDING_STATUSES, { error: 'Choose checked, needs a change or does not apply.' });

export const CHECKLIST_FAMILIES = ['spark-gap', 'solid-state'] as const;
export const checklistFamilySchema = z.enum(CHECKLIST_FAMILIES);

/** A review's id in a path. */
export const reviewIdParamSchema = z.string().regex(/^[A-Za-z0-9-]{8,64}$/);

/** One row of GET /api/v1/designs/:id/reviews, newest first. */
export const reviewListItemSchema = z.object({
  id: z.string(),
  revision: z.number().int().min(1),
  state: reviewStateSchema,
  /** the named reviewer, or who decided; null while the group's supervisors are asked */
  reviewer: z.string().nullable(),
  reviewerId: z.string().nullable(),
  /** 'reviewer' when one person was named, 'supervisors' when any supervisor of the design's group may decide */
  askedOf: z.enum(['reviewer', 'supervisors']),
  requestedBy: z.string(),
  requestedById: z.string().nullable(),
  requestedAt: timestampSchema,
  decidedAt: timestampSchema.nullable(),
  /** false once the design has a revision newer than the reviewed one */
  current: z.boolean(),
  note: z.string().nullable(),
});
export const reviewListResponseSchema = z.object({ reviews: z.array(reviewListItemSchema) });

/** POST /api/v1/designs/:id/reviews */
export const requestReviewBodySchema = z.object({
  revision: z.number({ error: 'Give the revision to review (a whole number).' }).int('Give the revision to review (a whole number).').min(1, 'Give the revision to review (a whole number).'),
  /** a person with a role on the design; left out, the design's group supervisors are asked */
  reviewerId: z.string().min(1, 'Choose a reviewer.').optional(),
  note: z.string().trim().max(1000, 'Keep the note under 1000 characters.').optional(),
});

export const checklistItemSchema = z.object({
  key: z.string(),
  /** which family the item belongs to; 'both' for items every coil needs */
  family: z.enum(['spark-gap', 'solid-state', 'both']),
  title: z.string(),
  detail: z.string(),
});

export const findingSchema = z.object({
  item: z.string().min(1, 'Name the checklist item.'),
  status: findingStatusSchema,
  note: z.string().trim().max(1000, 'Keep the note under 1000 characters.').default(''),
});

/** GET /api/v1/designs/:id/reviews/:reviewId: the review with its checklist and findings. */
export const reviewRecordSchema = reviewListItemSchema.extend({
  family: checklistFamilySchema,
  checklist: z.array(checklistItemSchema),
  findings: z.array(findingSchema.extend({ note: z.string() })),
  /** true when the signed-in person may decide this review now */
  canDecide: z.boolean(),
});

/** POST /api/v1/designs/:id/reviews/:reviewId/decision */
export const decideReviewBodySchema = z.object({
  decision: z.enum(['signed_off', 'changes_requested'], { error: 'Choose signed off or changes requested.' }),
  findings: z.array(findingSchema).max(100),
  note: z.string().trim().max(2000, 'Keep the note under 2000 characters.').optional(),
});

export type ReviewState = z.infer<typeof reviewStateSchema>;
export type FindingStatus = z.infer<typeof findingStatusSchema>;
export type ChecklistFamily = z.infer<typeof checklistFamilySchema>;
export type ChecklistItem = z.infer<typeof checklistItemSchema>;
export type Finding = z.output<typeof findingSchema>;
export type ReviewListItem = z.infer<typeof reviewListItemSchema>;
export type ReviewListResponse = z.infer<typeof reviewListResponseSchema>;
export type RequestReviewBody = z.input<typeof requestReviewBodySchema>;
export type ReviewRecord = z.infer<typeof reviewRecordSchema>;
export type DecideReviewBody = z.input<typeof decideReviewBodySchema>;
