import { desc, eq } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import sharp from 'sharp';
import { database } from './database';
import { attachments } from '../db/schema';
import {
  INSTRUMENT_EXTENSIONS,
  INSTRUMENT_MAX_BYTES,
  PHOTO_MAX_BYTES,
  PHOTO_TYPES,
  type Attachment,
  type AttachmentListResponse,
  type SweepSummary,
  type UploadedAttachment,
} from '../../lib/api/contracts';
import type { SessionUser } from '../session';
import { ApiError } from '../http';
import { deleteObjects, getObject, putObject } from '../storage';
import { authorize } from './access';
import { findResonances, parseSweepFile, sweepFileKind } from '../../lib/touchstone';

export const THUMBNAIL_SIZE = 320;
/** Multipart framing around the file; a body beyond the largest file plus this is refused before it is read. */
const MULTIPART_OVERHEAD = 64 * 1024;

type PhotoType = (typeof PHOTO_TYPES)[number];

/** The image type the first bytes announce: JPEG FF D8 FF; PNG 89 50 4E 47 0D 0A 1A 0A; WebP "RIFF" size "WEBP". */
export function sniffImage(bytes: Uint8Array): PhotoType | null {
  const b = bytes;
  if (b.length >= 3 && b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff) return 'image/jpeg';
  const png = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
  if (b.length >= 8 && png.every((x, i) => b[i] === x)) return 'image/png';
  const ascii = (from: number, to: number) => String.fromCharCode(...b.subarray(from, to));
  if (b.length >= 12 && ascii(0, 4) === 'RIFF' && ascii(8, 12) === 'WEBP') return 'image/webp';
  return null;
}

const fileIssue = (message: string) => [{ path: 'file', message }];
const mb = (n: number) => `${n / (1024 * 1024)} MB`;

type Row = typeof attachments.$inferSelect;

function view(r: Row): Attachment {
  return {
    id: r.id,
    designId: r.designId,
    fileName: r.fileName,
    contentType: r.contentType,
    size: r.size,
    kind: r.kind,
    url: `/api/v1/attachments/${r.id}`,
    thumbnailUrl: r.thumbnailKey ? `/api/v1/attachments/${r.id}/thumbnail` : null,
    createdAt: r.createdAt.toISOString(),
  };
}

function safeFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? 'file';
  const clean = base.replace(/[^\w.\- ()]+/g, '_').slice(-120).trim();
  return clean || 'file';
}

function extensionOf(name: string): string {
  const m = /\.[^.]+$/.exec(name);
  return m ? m[0].toLowerCase() : '';
}

/** Reads the `file` field of a multipart upload, refusing an oversized body before reading it. */
async function readUpload(request: Request): Promise<File> {
  const len = Number(request.headers.get('content-length') ?? '0');
  if (len > PHOTO_MAX_BYTES + MULTIPART_OVERHEAD) {
    throw new ApiError('payload_too_large', `The file is larger than ${mb(PHOTO_MAX_BYTES)}.`, fileIssue(`Photos may be up to ${mb(PHOTO_MAX_BYTES)}, instrument files up to ${mb(INSTRUMENT_MAX_BYTES)}.`));
  }
  const type = request.headers.get('content-type') ?? '';
  if (!type.toLowerCase().startsWith('multipart/form-data')) {
    throw new ApiError('unsupported_media_type', 'Send the file as multipart/form-data in the field "file".', fileIssue('Send the file as multipart/form-data.'));
  }
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw new ApiError('validation_failed', 'The upload could not be read as multipart/form-data.', fileIssue('The upload could not be read.'));
  }
  const file = form.get('file');
  if (!(file instanceof File)) throw new ApiError('validation_failed', 'Attach the file in the field "file".', fileIssue('No file in the field "file".'));
  if (file.size === 0) throw new ApiError('validation_failed', 'The file is empty.', fileIssue('The file is empty.'));
  return file;
}

export async function listAttachments(u: SessionUser | null, designId: string): Promise<AttachmentListResponse> {
  await authorize(designId, u, 'read');
  return attachmentsOf(designId);
}

/** The photos and instrument files of a design already authorized, newest first. */
export async function attachmentsOf(designId: string): Promise<AttachmentListResponse> {
  const rows = await database().select().from(attachments).where(eq(attachments.designId, designId)).orderBy(desc(attachments.createdAt));
  return { attachments: rows.map(view) };
}

export async function uploadAttachment(u: SessionUser, designId: string, request: Request): Promise<UploadedAttachment> {
  await authorize(designId, u, 'write');
  const db = database();
  const file = await readUpload(request);
  const fileName = safeFileName(file.name || 'upload');
  const ext = extensionOf(fileName);
  const declared = (file.type || '').toLowerCase().split(';')[0].trim();
  const isInstrument = (INSTRUMENT_EXTENSIONS as readonly string[]).includes(ext);
  const claimsPhoto = (PHOTO_TYPES as readonly string[]).includes(declared) || ['.jpg', '.jpeg', '.png', '.webp'].includes(ext);
  const accepted = 'Accepted: photos (JPEG, PNG, WebP) and instrument files (.s1p, .s2p, .csv, .txt).';

  if (!isInstrument && !claimsPhoto) {
    throw new ApiError('unsupported_media_type', `${fileName} is not an accepted kind of file. ${accepted}`, fileIssue(accepted));
  }
  const limit = isInstrument ? INSTRUMENT_MAX_BYTES : PHOTO_MAX_BYTES;
  if (file.size > limit) {
    const what = isInstrument ? 'Instrument files' : 'Photos';
    throw new ApiError('payload_too_large', `${what} may be up to ${mb(limit)}; ${fileName} is ${(file.size / (1024 * 1024)).toFixed(1)} MB.`, fileIssue(`${what} may be up to ${mb(limit)}.`));
  }
  const bytes = new Uint8Array(await file.arrayBuffer());
  const id = randomUUID();
  const prefix = `designs/${designId}/${id}`;
  let contentType: string;
  let thumbnail: Uint8Array | null = null;
  let sweep: SweepSummary | null = null;

  if (isInstrument) {
    if (bytes.subarray(0, 8192).includes(0)) {
      throw new ApiError('unsupported_media_type', `${fileName} is not a text file; instrument files are Touchstone or CSV text.`, fileIssue('Instrument files must be text.'));
    }
    contentType = ext === '.csv' ? 'text/csv' : 'text/plain';
    const text = new TextDecoder().decode(bytes);
    if (sweepFileKind(fileName)) {
      const parsed = parseSweepFile(fileName, text);
      sweep = parsed.ok
        ? { ok: true, label: parsed.value.label, points: parsed.value.frequency.length, resonances: findResonances(parsed.value).resonances }
        : { ok: false, message: parsed.error.message };
    }
  } else {
    const sniffed = sniffImage(bytes);
    if (!sniffed) throw new ApiError('unsupported_media_type', `${fileName} is not a JPEG, PNG or WebP image.`, fileIssue('The file’s content is not a JPEG, PNG or WebP image.'));
    if ((PHOTO_TYPES as readonly string[]).includes(declared) && declared !== sniffed) {
      throw new ApiError('unsupported_media_type', `${fileName} says it is ${declared} but its content is ${sniffed}.`, fileIssue('The declared type does not match the content.'));
    }
    contentType = sniffed;
    try {
      thumbnail = new Uint8Array(
        await sharp(bytes).rotate().resize(THUMBNAIL_SIZE, THUMBNAIL_SIZE, { fit: 'inside', withoutEnlargement: true }).webp({ quality: 80 }).toBuffer(),
      );
    } catch {
      throw new ApiError('unsupported_media_type', `${fileName} could not be read as an image.`, fileIssue('The image is damaged or incomplete.'));
    }
  }

  const storageKey = `${prefix}/${fileName}`;
  const thumbnailKey = thumbnail ? `${prefix}/thumbnail.webp` : null;
  await putObject(storageKey, bytes, contentType);
  try {
    if (thumbnail && thumbnailKey) await putObject(thumbnailKey, thumbnail, 'image/webp');
    await db.insert(attachments).values({
      id,
      designId,
      fileName,
      contentType,
      size: bytes.length,
      kind: isInstrument ? 'instrument' : 'photo',
      storageKey,
      thumbnailKey,
      uploadedBy: u.id,
    });
  } catch (e) {
    // Nothing half-stored: the objects go if the row could not be written.
    await deleteObjects([storageKey, ...(thumbnailKey ? [thumbnailKey] : [])]).catch(() => undefined);
    throw e;
  }
  const row = await db.query.attachments.findFirst({ where: eq(attachments.id, id) });
  return { ...view(row!), ...(sweep ? { sweep } : {}) };
}

/** The stored bytes of an attachment or its thumbnail, for callers with a role on its design; everyone else gets 404. */
export async function readAttachment(u: SessionUser | null, id: string, which: 'file' | 'thumbnail') {
  const row = await database().query.attachments.findFirst({ where: eq(attachments.id, id) });
  if (!row) throw new ApiError('not_found', 'No such file.');
  try {
    await authorize(row.designId, u, 'read');
  } catch (e) {
    if (e instanceof ApiError) throw new ApiError('not_found', 'No such file.');
    throw e;
  }
  const key = which === 'file' ? row.storageKey : row.thumbnailKey;
  if (!key) throw new ApiError('not_found', 'This file has no thumbnail.');
  const obj = await getObject(key);
  if (!obj) throw new ApiError('not_found', 'The stored file is missing.');
  return { row, body: obj.body, contentType: which === 'file' ? row.contentType : 'image/webp' };
}

export async function deleteAttachment(u: SessionUser, id: string): Promise<void> {
  const db = database();
  const row = await db.query.attachments.findFirst({ where: eq(attachments.id, id) });
  if (!row) throw new ApiError('not_found', 'No such file.');
  await authorize(row.designId, u, 'write');
  await deleteObjects([row.storageKey, ...(row.thumbnailKey ? [row.thumbnailKey] : [])]);
  await db.delete(attachments).where(eq(attachments.id, id));
}

/** Removes every stored file of a design; called by deleteDesign before the design's row goes. */
export async function deleteAttachmentsOf(designId: string): Promise<void> {
  const db = database();
  const rows = await db.select().from(attachments).where(eq(attachments.designId, designId));
  const keys = rows.flatMap((r) => [r.storageKey, ...(r.thumbnailKey ? [r.thumbnailKey] : [])]);
  for (let i = 0; i < keys.length; i += 1000) await deleteObjects(keys.slice(i, i + 1000));
  await db.delete(attachments).where(eq(attachments.designId, designId));
}

/** The HTTP answer for a stored file: never sniffed by the browser, images inline, instrument files as downloads. */
export function fileResponse(file: Awaited<ReturnType<typeof readAttachment>>, which: 'file' | 'thumbnail'): Response {
  const inline = which === 'thumbnail' || file.row.kind === 'photo';
  const name = which === 'thumbnail' ? 'thumbnail.webp' : file.row.fileName;
  return new Response(new Uint8Array(file.body), {
    status: 200,
    headers: {
      'content-type': file.contentType,
      'content-length': String(file.body.length),
      'content-disposition': `${inline ? 'inline' : 'attachment'}; filename="${name.replace(/"/g, '')}"`,
      'x-content-type-options': 'nosniff',
      'cache-control': 'private, max-age=300',
    },
  });
}
