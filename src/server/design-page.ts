import type { AstroGlobal } from 'astro';
import type { Result } from '../solver';
import type { DesignSI } from '../lib/design';
import { designCan, type DesignRole } from '../lib/permissions';
import { getDb, type Db } from './db';
import { requirePageUser } from './guard';
import { ApiError } from './http';
import type { SessionUser } from './session';
import { authorize, getRevision, listRevisions } from './services/designs';
import { compareRevisions } from './services/revisions';
import { solvedRow, type SolvedDesign } from './services/solve';
import { calibrationOf, measurementsOf } from './services/measurements';
import { attachmentsOf } from './services/attachments';
import { troubleshootOf, type TroubleshootQuery } from './services/troubleshoot';
import { buildSheetOf } from './services/build-sheet';
import type { BuildSheetQuery } from '../lib/buildsheet';

/**
 * One design as the pages under /designs/[id] see it: authorized once and solved at most once per request,
 * with the reads those pages need answered from that one load.
 */
export type DesignPage = {
  user: SessionUser;
  id: string;
  name: string;
  revision: number;
  role: DesignRole;
  canWrite: boolean;
  updatedAt: string;
  /** The design as stored: the user's input, units and all. */
  input: unknown;
  /** The stored design parsed, and its result solved on first read. */
  solved: SolvedDesign;
  /** Shorthand for `solved.result`: null when the stored design no longer parses. */
  readonly result: Result | null;
  /** The design in SI, or null when it no longer parses. */
  readonly si: DesignSI | null;
  measurements(): ReturnType<typeof measurementsOf>;
  calibration(): ReturnType<typeof calibrationOf>;
  attachments(): ReturnType<typeof attachmentsOf>;
  troubleshoot(query: TroubleshootQuery): ReturnType<typeof troubleshootOf>;
  buildSheet(query: BuildSheetQuery): ReturnType<typeof buildSheetOf>;
  revisions(): ReturnType<typeof listRevisions>;
  /** One saved revision, or null when there is no such revision. */
  readRevision(n: number): Promise<Awaited<ReturnType<typeof getRevision>> | null>;
  /** Two revisions compared, or null when either does not exist. */
  compare(from: number, to: number): Promise<Awaited<ReturnType<typeof compareRevisions>> | null>;
};

export type DesignPageOptions = {
  /** The database; the app's own unless a test brings one. */
  db?: Db;
  /** The solver to run; the real one unless a test counts its calls. */
  solver?: (design: DesignSI) => Result;
};

/** "No such thing" (or no role on the design) becomes null so the page can answer 404. */
async function orNull<T>(load: () => Promise<T>): Promise<T | null> {
  try {
    return await load();
  } catch (e) {
    if (e instanceof ApiError && (e.code === 'not_found' || e.code === 'forbidden')) return null;
    throw e;
  }
}

/**
 * Authorizes `user` to read design `id` and prepares it for a page; null when the design does not exist or the
 * user has no role on it (the two look the same, so a stranger learns nothing).
 */
export async function openDesignPage(db: Db, user: SessionUser, id: string, options: DesignPageOptions = {}): Promise<DesignPage | null> {
  const found = await orNull(() => authorize(db, id, user, 'read'));
  if (!found) return null;
  const { row, role } = found;
  const solved = solvedRow(row, options.solver);
  const base = { name: row.name, revision: row.revision, role };
  return {
    user,
    id: row.id,
    ...base,
    canWrite: designCan(role, 'write'),
    updatedAt: row.updatedAt.toISOString(),
    input: row.design,
    solved,
    get result() {
      return solved.result;
    },
    get si() {
      return solved.parsed.ok ? solved.parsed.design : null;
    },
    measurements: () => measurementsOf(db, solved),
    calibration: () => calibrationOf(solved),
    attachments: () => attachmentsOf(db, row.id),
    troubleshoot: (query) => troubleshootOf(db, solved, query),
    buildSheet: (query) => buildSheetOf({ ...base, solved }, query),
    revisions: () => listRevisions(db, user, row.id),
    readRevision: (n) => (Number.isInteger(n) && n >= 1 ? orNull(() => getRevision(db, user, row.id, n)) : Promise.resolve(null)),
    compare: (from, to) =>
      Number.isInteger(from) && Number.isInteger(to) && from >= 1 && to >= 1 ? orNull(() => compareRevisions(db, user, row.id, from, to)) : Promise.resolve(null),
  };
}

const loaded = new WeakMap<Request, Promise<DesignPage | null>>();

/**
 * The design of the current /designs/[id] request, loaded once per request however many times a page, its layout
 * or its parts ask. A visitor who is not signed in is sent to sign in; a design that does not exist, or that the
 * user has no role on, is the 404 page.
 */
export async function loadDesignPage(Astro: AstroGlobal, options: DesignPageOptions = {}): Promise<DesignPage | Response> {
  const user = requirePageUser(Astro);
  if (user instanceof Response) return user;
  let load = loaded.get(Astro.request);
  if (!load) {
    load = openDesignPage(options.db ?? getDb(), user, Astro.params.id ?? '', options);
    loaded.set(Astro.request, load);
  }
  const page = await load;
  return page ?? Astro.rewrite('/404');
}
