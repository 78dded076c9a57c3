/**
 * The first-light state of a design in one line, for the design page, the build sheet and the event sheet.
 * A decision is bound to the revision reviewed: once the design has a newer revision, a sign-off reads as out of date.
 */
import type { ReviewListItem } from '../api/contracts/reviews';

export type ReviewStatusKind = 'signed_off' | 'changed_since' | 'changes_requested' | 'requested' | 'none';

export type ReviewStatus = {
  kind: ReviewStatusKind;
  /** the headline, e.g. "Signed off revision 3; changed since" */
  text: string;
  /** who decided and when, or what is pending */
  detail: string | null;
};

type Row = Pick<ReviewListItem, 'revision' | 'state' | 'reviewer' | 'decidedAt' | 'requestedAt' | 'requestedBy'>;

const day = (iso: string | null) => (iso ? iso.slice(0, 10) : '');

/** Reduces a design's reviews (any order) at its current revision to the one state people see. */
export function reviewStatus(reviews: readonly Row[], currentRevision: number): ReviewStatus {
  const decided = reviews.filter((r) => r.state !== 'requested' && r.decidedAt).sort((a, b) => b.decidedAt!.localeCompare(a.decidedAt!));
  const open = reviews.filter((r) => r.state === 'requested').sort((a, b) => b.requestedAt.localeCompare(a.requestedAt))[0];
  const pending = open ? `Review of revision ${open.revision} requested by ${open.requestedBy} on ${day(open.requestedAt)}.` : null;
  const last = decided[0];
  if (last?.state === 'signed_off') {
    const by = `${last.reviewer ?? 'a reviewer'} on ${day(last.decidedAt)}`;
    if (last.revision === currentRevision) return { kind: 'signed_off', text: `Signed off for first light: revision ${last.revision}`, detail: `By ${by}.` };
    return { kind: 'changed_since', text: `Signed off revision ${last.revision}; changed since`, detail: pending ?? `Signed off by ${by}; revision ${currentRevision} has not been reviewed.` };
  }
  if (last?.state === 'changes_requested') {
    return { kind: 'changes_requested', text: `Changes requested on revision ${last.revision}`, detail: pending ?? `By ${last.reviewer ?? 'a reviewer'} on ${day(last.decidedAt)}.` };
  }
  if (open) return { kind: 'requested', text: `First-light review requested: revision ${open.revision}`, detail: pending };
  return { kind: 'none', text: 'Not reviewed for first light', detail: null };
}
