import { json, media, type RouteDoc } from './openapi-types';
import {
  startWindingBodySchema,
  windingAdoptBodySchema,
  windingAdoptResponseSchema,
  windingChecklistBodySchema,
  windingFinishBodySchema,
  windingPauseBodySchema,
  windingReadingBodySchema,
  windingReadingResponseSchema,
  windingResumeBodySchema,
  windingSessionListResponseSchema,
  windingSessionSchema,
} from '../lib/api/contracts';

const noRole = 'No such design or session, or no role on it (nothing about it is revealed).';
const writers = 'Owners and editors.';
const base = '/api/v1/designs/{id}/winding';
const one = `${base}/{sessionId}`;

/** Winding sessions at the jig: readings, pauses, the finish into the bench log, adoption into a revision. */
export const windingRoutes: RouteDoc[] = [
  { method: 'get', path: base, summary: 'Winding sessions, newest first: every session for owners and editors, finished ones for viewers.', responses: { 200: json(windingSessionListResponseSchema, 'The sessions with readings, pauses and flags.'), 404: noRole } },
  { method: 'post', path: base, summary: `Start a winding session at a winder speed (rpm), with the spool length and the bare form below the first turn (m). The plan (turns, pitch, wire) is taken from the design now. ${writers}`, body: startWindingBodySchema, responses: { 201: json(windingSessionSchema, 'The new session.'), 400: 'Invalid field (error.issues names it); nothing saved.', 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: noRole, 409: 'A session is already under way (error.sessionId).' } },
  { method: 'get', path: one, summary: 'One session; a session under way only for owners and editors.', responses: { 200: json(windingSessionSchema, 'The session.'), 404: noRole } },
  { method: 'post', path: `${one}/readings`, summary: `Record a counter reading and, when measured, the height (m, from the form end or the first turn). The id is made by the client: the same id sent again stores nothing (200, stored: false). The height gives the turns on the form (height / pitch, ± the stated tolerance) and a flag with the likely cause and the corrected count when the counter disagrees. ${writers}`, body: windingReadingBodySchema, responses: { 201: json(windingReadingResponseSchema, 'Stored.'), 200: json(windingReadingResponseSchema, 'Already stored; nothing added.'), 400: 'A count below the last one, a height beyond the form, or another invalid field (error.issues names it); nothing saved.', 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: noRole, 409: 'The session is finished.' } },
  { method: 'post', path: `${one}/pause`, summary: `Pause the clock with a reason (guide, splice, break). ${writers}`, body: windingPauseBodySchema, responses: { 200: json(windingSessionSchema, 'The paused session.'), 400: 'Invalid field.', 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: noRole, 409: 'Already paused, or finished.' } },
  { method: 'post', path: `${one}/resume`, summary: `Start the clock again. ${writers}`, body: windingResumeBodySchema, responses: { 200: json(windingSessionSchema, 'The running session.'), 400: 'Invalid field.', 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: noRole, 409: 'Not paused, or finished.' } },
  { method: 'post', path: `${one}/finish`, summary: `Finish with the turns wound and the measured winding length (m); both become bench-log measurements (wound-turns, winding-length). ${writers}`, body: windingFinishBodySchema, responses: { 200: json(windingSessionSchema, 'The finished session.'), 400: 'Invalid field; nothing saved.', 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: noRole, 409: 'Already finished.' } },
  { method: 'post', path: `${one}/adopt`, summary: `Save the wound turns and winding length as a new revision of the design (once per session). ${writers}`, body: windingAdoptBodySchema, bodyOptional: true, responses: { 200: json(windingAdoptResponseSchema, 'The session and the design at its new revision.'), 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: noRole, 409: 'Not finished, already adopted, or a stale revision (error.latestRevision).' } },
  { method: 'put', path: `${one}/checklist`, summary: `The finishing checklist: ends fastened, coating, number of coats and drying time. Absent keeps, null clears. ${writers}`, body: windingChecklistBodySchema, responses: { 200: json(windingSessionSchema, 'The session with its checklist.'), 400: 'Invalid field.', 401: 'Not signed in.', 403: 'Viewer or admin: cannot write.', 404: noRole } },
  { method: 'get', path: `${one}/export.csv`, summary: 'The session as CSV: the plan, then each reading and pause in time order.', responses: { 200: media('text/csv', 'The session.'), 404: noRole } },
  { method: 'get', path: '/api/v1/shared/{token}/winding', summary: 'The finished winding sessions of a shared design, without sign-in.', auth: false, responses: { 200: json(windingSessionListResponseSchema, 'The finished sessions.'), 404: 'Unknown or revoked token.' } },
];
