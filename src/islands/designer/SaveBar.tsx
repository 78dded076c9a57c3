type Props = { signedIn: boolean; editing: boolean; readOnly: boolean; saving: boolean; dirty: boolean; revision: number | null; signInHref: string };

/** The save button and what is saved, or why this person cannot save here. */
export function SaveBar({ signedIn, editing, readOnly, saving, dirty, revision, signInHref }: Props) {
  if (readOnly) return <p className="text-sm text-ink-soft">You can view this design; ask its owner for edit access to change it.</p>;
  if (!signedIn) {
    return (
      <p className="text-sm">
        Your draft is kept in this browser. <a href={signInHref} className="font-semibold">Sign in to save it</a> to your account and share it.
      </p>
    );
  }
  return (
    <div className="flex flex-wrap items-center gap-3">
      <button type="submit" className="cw-btn cw-btn-primary" disabled={saving} aria-busy={saving}>
        {saving ? 'Saving…' : editing ? 'Save' : 'Save design'}
      </button>
      <span className="text-sm text-ink-soft" data-testid="save-state">
        {dirty ? 'Unsaved changes' : editing ? `All changes saved${revision ? ` (revision ${revision})` : ''}` : 'Not saved yet'}
        <span className="sr-only">. Ctrl+S or Cmd+S also saves.</span>
      </span>
    </div>
  );
}
