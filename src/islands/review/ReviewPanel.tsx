import { useState, type FormEvent } from 'react';
import { ApiFailure, failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import { useDecideReview, useRequestReview, useReview, useReviews, type ReviewListItem, type ReviewRecord } from '~/lib/api/queries/reviews';
import { useMembers } from '~/lib/api/queries/sharing';
import { useDesignGroup } from '~/lib/api/queries/groups';
import type { FindingStatus } from '~/lib/api/contracts';
import { FormMessage } from '~/components/ui/FormMessage';

type Props = {
  designId: string;
  revision: number;
  canWrite: boolean;
  myUserId: string;
  /** the review to open first (from the mailed link) */
  initialReviewId: string | null;
};

const stateWords: Record<ReviewListItem['state'], string> = { requested: 'Waiting for review', signed_off: 'Signed off', changes_requested: 'Changes requested' };
const day = (iso: string | null) => (iso ? iso.slice(0, 10) : '—');

/** Ask for a first-light review, see every review of the design, and work through the checklist as the reviewer. */
function ReviewPanel({ designId, revision, canWrite, myUserId, initialReviewId }: Props) {
  const reviews = useReviews(designId);
  const list = reviews.data ?? [];
  const [selected, setSelected] = useState<string | null>(initialReviewId);
  // kept here: the form itself goes away once a request is waiting
  const [notice, setNotice] = useState<string | null>(null);
  const open = list.find((r) => r.state === 'requested');
  const shown = selected ?? open?.id ?? null;
  return (
    <div className="space-y-8">
      {reviews.error && <p className="cw-alert" role="alert">{failureMessage(reviews.error)}</p>}
      <FormMessage success={notice} />
      {canWrite && !open && <RequestForm designId={designId} revision={revision} myUserId={myUserId} onRequested={(id, message) => { setSelected(id); setNotice(message); }} />}
      {open && <p className="cw-card" data-testid="open-request">Revision {open.revision} is waiting for review: asked by {open.requestedBy} on {day(open.requestedAt)}, of {open.askedOf === 'reviewer' ? open.reviewer : 'the group’s supervisors'}.</p>}
      <section aria-labelledby="reviews-title">
        <h2 id="reviews-title" className="text-xl">Reviews</h2>
        {list.length === 0 ? (
          <p className="mt-2 text-ink-soft">No review has been asked for yet.</p>
        ) : (
          <div className="mt-3 overflow-x-auto rounded-lg border border-rule bg-panel">
            <table className="w-full min-w-[36rem] border-collapse text-left" data-testid="reviews-table">
              <thead className="border-b border-rule text-sm text-ink-soft">
                <tr>
                  <th scope="col" className="px-3 py-2 font-medium">Revision</th>
                  <th scope="col" className="px-3 py-2 font-medium">State</th>
                  <th scope="col" className="px-3 py-2 font-medium">Asked by</th>
                  <th scope="col" className="px-3 py-2 font-medium">Reviewer</th>
                  <th scope="col" className="px-3 py-2"><span className="sr-only">Checklist</span></th>
                </tr>
              </thead>
              <tbody>
                {list.map((r) => (
                  <tr key={r.id} className="border-b border-rule last:border-b-0" data-review-id={r.id} data-state={r.state}>
                    <td className="px-3 py-2 tabular-nums">{r.revision}{!r.current && <span className="ml-1 text-sm text-ink-soft">(changed since)</span>}</td>
                    <td className="px-3 py-2">{stateWords[r.state]}{r.decidedAt && <span className="block text-sm text-ink-soft">{day(r.decidedAt)}</span>}</td>
                    <td className="px-3 py-2">{r.requestedBy}<span className="block text-sm text-ink-soft">{day(r.requestedAt)}</span></td>
                    <td className="px-3 py-2">{r.reviewer ?? 'The group’s supervisors'}</td>
                    <td className="px-3 py-2 text-right">
                      <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" aria-pressed={shown === r.id} onClick={() => setSelected(r.id)}>
                        Open checklist<span className="sr-only"> of revision {r.revision}</span>
                      </button>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
      {shown && <ReviewChecklist key={shown} designId={designId} reviewId={shown} />}
    </div>
  );
}

function RequestForm({ designId, revision, myUserId, onRequested }: { designId: string; revision: number; myUserId: string; onRequested: (id: string, message: string) => void }) {
  const members = useMembers(designId);
  const group = useDesignGroup(designId);
  const ask = useRequestReview(designId);
  const [rev, setRev] = useState(String(revision));
  const [reviewer, setReviewer] = useState('');
  const [note, setNote] = useState('');
  const [failure, setFailure] = useState<ApiFailure | null>(null);
  const supervisors = group.data?.groupId ? group.data.members.filter((m) => m.reviews && m.userId !== myUserId) : [];
  const people = new Map<string, string>();
  for (const p of members.data ?? []) if (p.userId !== myUserId) people.set(p.userId, p.name);
  for (const p of group.data?.members ?? []) if (p.userId !== myUserId) people.set(p.userId, p.name);
  const byPath = failure?.byPath ?? {};

  async function submit(e: FormEvent) {
    e.preventDefault();
    setFailure(null);
    if (!/^\d+$/.test(rev.trim())) {
      const message = 'Give the revision to review (a whole number).';
      return setFailure(new ApiFailure(400, 'validation_failed', message, [{ path: 'revision', message }]));
    }
    try {
      const r = await ask.mutateAsync({ revision: Number(rev.trim()), ...(reviewer ? { reviewerId: reviewer } : {}), ...(note.trim() ? { note: note.trim() } : {}) });
      onRequested(r.id, `Review of revision ${r.revision} requested; the reviewer${r.askedOf === 'supervisors' ? 's were' : ' was'} sent an e-mail.`);
    } catch (err) {
      setFailure(err instanceof ApiFailure ? err : new ApiFailure(0, 'unknown', failureMessage(err)));
    }
  }

  return (
    <section aria-labelledby="ask-title" className="cw-card">
      <h2 id="ask-title" className="text-xl">Ask for a first-light review</h2>
      <p className="mt-1 text-sm text-ink-soft">Someone experienced works through a checklist made from this design before the coil is first powered. The sign-off covers the revision you name; any later change needs a new review.</p>
      <form className="mt-3 grid gap-3 sm:grid-cols-2" onSubmit={(e) => void submit(e)} noValidate>
        <div>
          <label htmlFor="review-revision" className="cw-label">Revision to review</label>
          <input id="review-revision" className="cw-input" inputMode="numeric" value={rev} onChange={(e) => setRev(e.target.value)} aria-invalid={byPath.revision ? true : undefined} aria-describedby={byPath.revision ? 'review-revision-error' : 'review-revision-hint'} />
          {byPath.revision ? <p id="review-revision-error" className="cw-field-error">{byPath.revision}</p> : <p id="review-revision-hint" className="cw-hint">The latest is revision {revision}.</p>}
        </div>
        <div>
          <label htmlFor="review-reviewer" className="cw-label">Reviewer</label>
          <select id="review-reviewer" className="cw-input" value={reviewer} onChange={(e) => setReviewer(e.target.value)} aria-invalid={byPath.reviewerId ? true : undefined} aria-describedby={byPath.reviewerId ? 'review-reviewer-error' : undefined}>
            <option value="">{group.data?.groupName ? `The supervisors of ${group.data.groupName}${supervisors.length ? ` (${supervisors.map((s) => s.name).join(', ')})` : ''}` : 'The group’s supervisors (the design is in no group)'}</option>
            {[...people].map(([id, name]) => (
              <option key={id} value={id}>{name}</option>
            ))}
          </select>
          {byPath.reviewerId && <p id="review-reviewer-error" className="cw-field-error">{byPath.reviewerId}</p>}
        </div>
        <div className="sm:col-span-2">
          <label htmlFor="review-note" className="cw-label">Note for the reviewer (optional)</label>
          <textarea id="review-note" className="cw-input" rows={2} value={note} onChange={(e) => setNote(e.target.value)} aria-invalid={byPath.note ? true : undefined} />
          {byPath.note && <p className="cw-field-error">{byPath.note}</p>}
        </div>
        <div className="sm:col-span-2 flex flex-wrap items-center gap-3">
          <button type="submit" className="cw-btn cw-btn-primary" disabled={ask.isPending}>{ask.isPending ? 'Asking…' : 'Ask for review'}</button>
        </div>
        <div className="sm:col-span-2"><FormMessage error={failure ? failure.message : null} /></div>
      </form>
    </section>
  );
}

const statusWords: Record<FindingStatus, string> = { ok: 'Checked', change: 'Needs a change', not_applicable: 'Does not apply' };

function ReviewChecklist({ designId, reviewId }: { designId: string; reviewId: string }) {
  const review = useReview(designId, reviewId);
  if (review.error) return <p className="cw-alert" role="alert">{failureMessage(review.error)}</p>;
  if (!review.data) return <p className="text-ink-soft">Loading the checklist…</p>;
  return <ChecklistForm designId={designId} review={review.data} />;
}

function ChecklistForm({ designId, review }: { designId: string; review: ReviewRecord }) {
  const decide = useDecideReview(designId, review.id);
  const recorded = new Map(review.findings.map((f) => [f.item, f]));
  const [status, setStatus] = useState<Record<string, FindingStatus | ''>>(() => Object.fromEntries(review.checklist.map((i) => [i.key, recorded.get(i.key)?.status ?? ''])));
  const [notes, setNotes] = useState<Record<string, string>>(() => Object.fromEntries(review.checklist.map((i) => [i.key, recorded.get(i.key)?.note ?? ''])));
  const [note, setNote] = useState('');
  const [failure, setFailure] = useState<ApiFailure | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const editable = review.canDecide;
  const sent = review.checklist.filter((i) => status[i.key]);
  const itemErrors: Record<string, string> = {};
  for (const issue of failure?.issues ?? []) {
    const m = issue.path.match(/^findings\.(\d+)\./);
    if (m && sent[Number(m[1])]) itemErrors[sent[Number(m[1])].key] = issue.message;
  }
  const listErrors = (failure?.issues ?? []).filter((i) => i.path === 'findings').map((i) => i.message);

  async function submit(decision: 'signed_off' | 'changes_requested') {
    setFailure(null);
    setDone(null);
    try {
      await decide.mutateAsync({ decision, findings: sent.map((i) => ({ item: i.key, status: status[i.key] as FindingStatus, note: notes[i.key] ?? '' })), ...(note.trim() ? { note: note.trim() } : {}) });
      setDone(decision === 'signed_off' ? `Revision ${review.revision} is signed off for first light.` : `Changes requested on revision ${review.revision}; the builder was sent an e-mail.`);
    } catch (err) {
      if (err instanceof ApiFailure) setFailure(err);
    }
  }

  return (
    <section aria-labelledby="checklist-title" className="cw-card" data-testid="checklist" data-review-id={review.id}>
      <h2 id="checklist-title" className="text-xl">First-light checklist: revision {review.revision}</h2>
      <p className="mt-1 text-sm text-ink-soft">
        {review.family === 'solid-state' ? 'A solid-state coil' : 'A spark-gap coil'}, from the design as saved at revision {review.revision}. {stateWords[review.state]}
        {review.reviewer ? ` · ${review.reviewer}` : ''}{review.decidedAt ? ` · ${day(review.decidedAt)}` : ''}.
        {!review.current && ' The design has changed since this revision.'}
      </p>
      {review.note && <p className="mt-2">Note: {review.note}</p>}
      <ol className="mt-4 space-y-4">
        {review.checklist.map((item) => (
          <li key={item.key} className="border-t border-rule pt-3" data-item={item.key}>
            <fieldset aria-describedby={`item-${item.key}-detail`}>
              <legend className="font-semibold">{item.title}</legend>
              <p id={`item-${item.key}-detail`} className="text-sm text-ink-soft">{item.detail}</p>
              {editable ? (
                <div className="mt-2 flex flex-wrap gap-4">
                  {(Object.keys(statusWords) as FindingStatus[]).map((s) => (
                    <label key={s} className="flex items-center gap-2 text-sm">
                      <input type="radio" name={`finding-${item.key}`} value={s} checked={status[item.key] === s} onChange={() => setStatus((x) => ({ ...x, [item.key]: s }))} />
                      {statusWords[s]}
                    </label>
                  ))}
                </div>
              ) : (
                <p className="mt-1 text-sm" data-finding={recorded.get(item.key)?.status ?? 'open'}>
                  <strong>{recorded.get(item.key) ? statusWords[recorded.get(item.key)!.status] : 'Not recorded'}</strong>
                  {recorded.get(item.key)?.note ? `: ${recorded.get(item.key)!.note}` : ''}
                </p>
              )}
              {editable && (
                <div className="mt-2">
                  <label htmlFor={`note-${item.key}`} className="cw-label text-sm">Finding for “{item.title}”</label>
                  <input id={`note-${item.key}`} className="cw-input" value={notes[item.key] ?? ''} onChange={(e) => setNotes((x) => ({ ...x, [item.key]: e.target.value }))} aria-invalid={itemErrors[item.key] ? true : undefined} aria-describedby={itemErrors[item.key] ? `note-${item.key}-error` : undefined} />
                  {itemErrors[item.key] && <p id={`note-${item.key}-error`} className="cw-field-error">{itemErrors[item.key]}</p>}
                </div>
              )}
            </fieldset>
          </li>
        ))}
      </ol>
      {editable && (
        <div className="mt-4 space-y-3 border-t border-rule pt-3">
          <div>
            <label htmlFor="decision-note" className="cw-label">Note with the decision (optional)</label>
            <textarea id="decision-note" className="cw-input" rows={2} value={note} onChange={(e) => setNote(e.target.value)} />
          </div>
          {listErrors.length > 0 && (
            <ul className="cw-alert list-disc pl-6" aria-label="What is missing">
              {listErrors.map((m) => <li key={m}>{m}</li>)}
            </ul>
          )}
          <div className="flex flex-wrap gap-2">
            <button type="button" className="cw-btn cw-btn-primary" disabled={decide.isPending} onClick={() => void submit('signed_off')}>Sign off revision {review.revision}</button>
            <button type="button" className="cw-btn cw-btn-quiet" disabled={decide.isPending} onClick={() => void submit('changes_requested')}>Request changes</button>
          </div>
        </div>
      )}
      <div className="mt-3"><FormMessage error={failure ? failure.message : null} success={done} /></div>
    </section>
  );
}

export default withApi(ReviewPanel);
