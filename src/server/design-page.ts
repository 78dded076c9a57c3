import type { AstroGlobal } from 'astro';
import type { Result } from '../solver';
import type { DesignSI } from '../lib/design';
import { designCan, type DesignRole } from '../lib/permissions';
import { requirePageUser } from './guard';
import { ApiError } from './http';
import type { SessionUser } from './session';
import { authorize, type DesignRow } from './services/access';
import { compareOf, revisionOf, revisionsOf } from './services/revisions';
import { solvedRow, type SolvedDesign } from './services/solve';
import { calibrationOf, measurementsOf } from './services/measurements';
import { attachmentsOf } from './services/attachments';
import { troubleshootOf } from './services/troubleshoot';
import type { TroubleshootQuery } from '../lib/api/contracts';
import { buildSheetOf } from './services/build-sheet';
import type { BuildSheetQuery } from '../lib/buildsheet';
import { reviewsOf } from './services/reviews';
import { reviewStatus, type ReviewStatus } from '../lib/review/status';
import type { GroupRole } from '../lib/permissions';
import { renderKey } from './render-cache';

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
  /** the design's group, and the viewer's role in it (null when not in it) */
  groupId: string | null;
  groupRole: GroupRole | null;
  /** The design as stored: the user's input, units and all. */
  input: DesignRow['design'];
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
  revisions(): ReturnType<typeof revisionsOf>;
  /** First-light reviews, newest first, each marked current or not against this revision. */
  reviews(): ReturnType<typeof reviewsOf>;
  /** The first-light state in one line (read once per request). */
  reviewStatus(): Promise<ReviewStatus>;
  /** One saved revision, or null when there is no such revision. */
  readRevision(n: number): Promise<Awaited<ReturnType<typeof revisionOf>> | null>;
  /** Two revisions compared, or null when either does not exist. */
  compare(from: number, to: number): Promise<Awaited<ReturnType<typeof compareOf>> | null>;
};

export type DesignPageOptions = {
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
export async function openDesignPage(user: SessionUser, id: string, options: DesignPageOptions = {}): Promise<DesignPage | null> {
  const found = await orNull(() => authorize(id, user, 'read'));
  if (!found) return null;
  const { row, role, groupRole } = found;
  const solved = solvedRow(row, options.solver);
  let reviews: ReturnType<typeof reviewsOf> | undefined;
  const loadReviews = () => (reviews ??= reviewsOf(row.id, row.revision));
  const base = { name: row.name, revision: row.revision, role };
  return {
    user,
    id: row.id,
    ...base,
    canWrite: designCan(role, 'write'),
    updatedAt: row.updatedAt.toISOString(),
    groupId: row.groupId,
    groupRole,
    input: row.design,
    solved,
    get result() {
      return solved.result;
    },
    get si() {
      return solved.parsed.ok ? solved.parsed.design : null;
    },
    measurements: () => measurementsOf(solved),
    calibration: () => calibrationOf(solved),
    attachments: () => attachmentsOf(row.id),
    troubleshoot: (query) => troubleshootOf(solved, query),
    buildSheet: (query) => buildSheetOf({ ...base, solved }, query),
    revisions: () => revisionsOf(row.id),
    reviews: loadReviews,
    reviewStatus: async () => reviewStatus(await loadReviews(), row.revision),
    readRevision: (n) => (Number.isInteger(n) && n >= 1 ? orNull(() => revisionOf(row.id, n)) : Promise.resolve(null)),
    compare: (from, to) =>
      Number.isInteger(from) && Number.isInteger(to) && from >= 1 && to >= 1 ? orNull(() => compareOf(row.id, from, to)) : Promise.resolve(null),
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
    load = openDesignPage(user, Astro.params.id ?? '', options);
    loaded.set(Astro.request, load);
  }
  const page = await load;
  return page ?? Astro.rewrite('/404');
}

/**
 * The render-cache key of the design page (/designs/[id]) for this viewer at this address: everything the page
 * and its layout read (the header reads the viewer and the address; the rest is the design, its stored
 * calibration and its review state). The page and the front server's fast read both use it.
 */
export async function designPageKey(page: DesignPage, address: string): Promise<string> {
  const review = await page.reviewStatus();
  return renderKey('design-page', address, page.user, page.id, page.name, page.revision, page.role, page.updatedAt, page.groupId, page.groupRole, page.input, page.solved.calibration, review);
}
