import { useEffect, useId, useRef } from 'react';

type Props = { onReload: () => void; onCopy: () => void; onClose: () => void };

/** Someone saved a newer revision: keep theirs and set mine aside, or save mine as a copy. Nothing is lost either way. */
export function ConflictDialog({ onReload, onCopy, onClose }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  const title = useId();
  const desc = useId();
  useEffect(() => {
    const d = ref.current;
    if (d && !d.open) d.showModal();
    return () => d?.close();
  }, []);
  return (
    <dialog
      ref={ref}
      aria-labelledby={title}
      aria-describedby={desc}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      className="m-auto max-w-lg rounded-xl border border-rule bg-panel p-5 text-ink backdrop:bg-black/40"
    >
      <h2 id={title} className="text-lg font-semibold">
        Someone saved a newer revision
      </h2>
      <p id={desc} className="mt-2 text-sm">
        This design was changed elsewhere after you opened it, so your save did not overwrite it. Choose how to go on; both
        versions are kept either way.
      </p>
      <div className="mt-4 flex flex-wrap gap-3">
        <button type="button" className="cw-btn cw-btn-primary" onClick={onReload}>
          Reload the latest
        </button>
        <button type="button" className="cw-btn cw-btn-quiet" onClick={onCopy}>
          Save mine as a copy
        </button>
        <button type="button" className="cw-btn cw-btn-quiet" onClick={onClose}>
          Cancel
        </button>
      </div>
      <p className="mt-3 text-xs text-ink-soft">“Reload the latest” keeps your version in this browser so you can bring it back.</p>
    </dialog>
  );
}
