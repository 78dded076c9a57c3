type Props = {
  draftNote: string | null;
  onStartOver: () => void;
  hasSetAside: boolean;
  onBringBack: () => void;
  onDiscard: () => void;
};

/** A restored draft of a new design, and a version of mine set aside after a conflict. */
export function DraftNotes({ draftNote, onStartOver, hasSetAside, onBringBack, onDiscard }: Props) {
  return (
    <>
      {draftNote && (
        <p className="text-sm text-ink-soft">
          {draftNote}{' '}
          <button type="button" className="font-medium text-arc underline" onClick={onStartOver}>
            Start over
          </button>
        </p>
      )}
      {hasSetAside && (
        <div className="rounded-lg border border-arc p-3 text-sm" data-testid="set-aside">
          <p>A version of yours that was not saved is kept in this browser.</p>
          <div className="mt-2 flex flex-wrap gap-2">
            <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={onBringBack}>
              Bring back my version
            </button>
            <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={onDiscard}>
              Discard it
            </button>
          </div>
        </div>
      )}
    </>
  );
}
