import { z } from 'zod';
import { timestampSchema } from './common';

export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;
export const INSTRUMENT_MAX_BYTES = 2 * 1024 * 1024;
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export const INSTRUMENT_EXTENSIONS = ['.s1p', '.s2p', '.csv', '.txt'] as const;

export const ATTACHMENT_KINDS = ['photo', 'instrument'] as const;
export const attachmentKindSchema = z.enum(ATTACHMENT_KINDS);

/** A stored file of a design; `url` and `thumbnailUrl` stream it through a role check. */
export const attachmentSchema = z.object({
  id: z.string(),
  designId: z.string(),
  fileName: z.string(),
  contentType: z.string(),
  size: z.number().int(),
  kind: attachmentKindSchema,
  url: z.string(),
  thumbnailUrl: z.string().nullable(),
  createdAt: timestampSchema,
});

/** GET /api/v1/designs/:id/attachments, newest first. */
export const attachmentListResponseSchema = z.object({ attachments: z.array(attachmentSchema) });

export const resonanceSchema = z.object({
  kind: z.enum(['peak', 'dip']),
  /** interpolated centre frequency, Hz */
  frequency: z.number(),
  magnitude: z.number(),
  levelDb: z.number(),
  lowerHalfPower: z.number().nullable(),
  upperHalfPower: z.number().nullable(),
  q: z.number().nullable(),
});

/** What an uploaded sweep file held: its resonances, or why it could not be read. */
export const sweepSummarySchema = z.discriminatedUnion('ok', [
  z.object({ ok: z.literal(true), label: z.string(), points: z.number().int(), resonances: z.array(resonanceSchema) }),
  z.object({ ok: z.literal(false), message: z.string() }),
]);

/** POST /api/v1/designs/:id/attachments (multipart/form-data, field `file`) → 201 */
export const uploadedAttachmentSchema = attachmentSchema.extend({ sweep: sweepSummarySchema.optional() });

export type AttachmentKind = z.infer<typeof attachmentKindSchema>;
export type Attachment = z.infer<typeof attachmentSchema>;
export type AttachmentListResponse = z.infer<typeof attachmentListResponseSchema>;
export type SweepSummary = z.infer<typeof sweepSummarySchema>;
export type UploadedAttachment = z.infer<typeof uploadedAttachmentSchema>;

/** The multipart form of an upload: one file in the field `file`. */
export const uploadFormSchema = z.object({ file: z.file() });
