import { json, media, type RouteDoc } from './openapi-types';
import {
  attachmentListResponseSchema,
  buildSheetQuerySchema,
  calibrationBodySchema,
  calibrationResponseSchema,
  measurementBodySchema,
  measurementListResponseSchema,
  measurementSchema,
  troubleshootQuerySchema,
  troubleshootResponseSchema,
  uploadedAttachmentSchema,
  uploadFormSchema,
} from '../lib/api/contracts';

const noRole = 'No such design, or no role on it (nothing about it is revealed).';

/** Build sheet, bench log, calibration, uploads and troubleshooting routes, merged into /api/v1/openapi.json. */
export const workbenchRoutes: RouteDoc[] = [
  { method: 'get', path: '/api/v1/designs/{id}/build-sheet.pdf', summary: 'The build sheet as a PDF: wire to buy with margin, mass and spool, form length, winding time = turns / rpm, checkpoints, primary tap, bank layout with bleeders, protection notes and a safety checklist.', query: buildSheetQuerySchema, responses: { 200: media('application/pdf', 'The build sheet.'), 400: 'rpm, margin or every invalid (error.issues names it), or the stored design no longer validates.', 404: noRole } },
  { method: 'get', path: '/api/v1/designs/{id}/measurements', summary: 'The bench log, each measurement beside its prediction with the error in percent.', responses: { 200: json(measurementListResponseSchema, 'The bench log.'), 404: noRole } },
  { method: 'post', path: '/api/v1/designs/{id}/measurements', summary: 'Record a measurement (value in SI: H, Hz, m, turns; k as a number). Editors and owners.', body: measurementBodySchema, responses: { 201: json(measurementSchema, 'The measurement with predicted and errorPercent.'), 400: 'Invalid field (error.issues names it).', 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: noRole } },
  { method: 'delete', path: '/api/v1/designs/{id}/measurements/{measurementId}', summary: 'Remove a measurement. Editors and owners.', responses: { 204: 'Removed.', 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: 'No such measurement, or no role.' } },
  { method: 'get', path: '/api/v1/designs/{id}/calibration', summary: 'Adopted measured values and the tap they give, beside the prediction.', responses: { 200: json(calibrationResponseSchema, 'Adopted values, prediction and the calibrated tap.'), 404: noRole } },
  { method: 'put', path: '/api/v1/designs/{id}/calibration', summary: 'Adopt measured values in place of predictions (a number sets, null clears, absent keeps). The tap is solved again for the adopted frequency. Editors and owners.', body: calibrationBodySchema, responses: { 200: json(calibrationResponseSchema, 'As GET.'), 400: 'Invalid field.', 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: noRole } },
  { method: 'get', path: '/api/v1/designs/{id}/attachments', summary: 'Photos and instrument files of a design, newest first.', responses: { 200: json(attachmentListResponseSchema, 'The files.'), 404: noRole } },
  { method: 'post', path: '/api/v1/designs/{id}/attachments', summary: 'Upload a file as multipart/form-data in the field `file`: a photo (JPEG, PNG, WebP by content, ≤ 10 MB; a 320 px WebP thumbnail is made) or an instrument file (.s1p, .s2p, .csv, .txt, ≤ 2 MB; sweeps are parsed and their resonances returned). Editors and owners.', body: uploadFormSchema, bodyMedia: 'multipart/form-data', responses: { 201: json(uploadedAttachmentSchema, 'The attachment; for sweep files also its sweep summary.'), 400: 'unsupported_media_type (wrong kind or content) or validation_failed (no file); issues name `file`. Nothing is stored.', 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: noRole, 413: 'payload_too_large; issues name `file`. Nothing is stored.' } },
  { method: 'get', path: '/api/v1/attachments/{id}', summary: 'The stored file, streamed through a role check.', responses: { 200: media('application/octet-stream', 'The file with its own content type.'), 404: 'No such file, or the caller (signed in or not) has no role on its design.' } },
  { method: 'get', path: '/api/v1/attachments/{id}/thumbnail', summary: 'The 320 px WebP thumbnail of a photo.', responses: { 200: media('image/webp', 'The thumbnail.'), 404: 'No such file or thumbnail, or no role on its design.' } },
  { method: 'delete', path: '/api/v1/attachments/{id}', summary: 'Delete a file and its thumbnail. Editors and owners.', responses: { 204: 'Deleted.', 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: 'No such file, or no role on its design.' } },
  { method: 'get', path: '/api/v1/designs/{id}/troubleshoot', summary: 'Guided check of a complaint: each likely cause is a rule with a threshold and a source, tested against the design, its bench log, its calibration and the yes/no answers given.', query: troubleshootQuerySchema, responses: { 200: json(troubleshootResponseSchema, 'The questions and each symptom’s causes.'), 400: 'Unknown symptom or answer.', 404: noRole } },
];
