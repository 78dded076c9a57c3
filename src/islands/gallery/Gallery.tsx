import { useRef, useState, type FormEvent } from 'react';
import { failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import { useAttachments, useDeleteAttachment, useUploadAttachment, type AttachmentItem } from '~/lib/api/queries/bench';

type Props = { designId: string; canWrite: boolean; initial: AttachmentItem[] };

const sizeText = (b: number) => (b >= 1024 * 1024 ? `${(b / (1024 * 1024)).toFixed(1)} MB` : `${Math.max(1, Math.round(b / 1024))} kB`);

/** Photos and instrument files of a design: upload, view, delete. Limits are checked again on the server. */
function Gallery({ designId, canWrite, initial }: Props) {
  const { data: items } = useAttachments(designId, initial);
  const uploading = useUploadAttachment(designId);
  const deleting = useDeleteAttachment(designId);
  const [error, setError] = useState<string | null>(null);
  const [status, setStatus] = useState<string | null>(null);
  const busy = uploading.isPending;
  const input = useRef<HTMLInputElement>(null);

  async function upload(e: FormEvent) {
    e.preventDefault();
    const file = input.current?.files?.[0];
    if (!file) {
      setError('Choose a file first.');
      return;
    }
    setError(null);
    let item: AttachmentItem;
    try {
      item = await uploading.mutateAsync(file);
    } catch (err) {
      setError(failureMessage(err));
      return;
    }
    setStatus(`Uploaded ${item.fileName}.`);
    if (input.current) input.current.value = '';
  }

  async function remove(item: AttachmentItem) {
    if (!window.confirm(`Delete ${item.fileName}?`)) return;
    try {
      await deleting.mutateAsync(item.id);
      setStatus(`Deleted ${item.fileName}.`);
    } catch (err) {
      setError(failureMessage(err));
    }
  }

  const photos = items.filter((i) => i.kind === 'photo');
  const files = items.filter((i) => i.kind === 'instrument');

  return (
    <div className="space-y-4">
      {canWrite && (
        <form onSubmit={upload} className="cw-card flex flex-wrap items-end gap-3" noValidate>
          <div>
            <label htmlFor="gallery-file" className="cw-label">
              Photo or instrument file
            </label>
            <input
              id="gallery-file"
              ref={input}
              type="file"
              name="file"
              accept="image/jpeg,image/png,image/webp,.s1p,.s2p,.csv,.txt"
              className="cw-input"
              aria-describedby="gallery-hint"
              aria-invalid={error ? true : undefined}
            />
            <p id="gallery-hint" className="cw-hint">
              Photos: JPEG, PNG or WebP up to 10 MB. Instrument files: .s1p, .s2p, .csv, .txt up to 2 MB.
            </p>
          </div>
          <button type="submit" className="cw-btn cw-btn-primary" disabled={busy}>
            {busy ? 'Uploading…' : 'Upload'}
          </button>
          {error && (
            <p className="cw-field-error w-full" role="alert">
              {error}
            </p>
          )}
        </form>
      )}
      <p role="status" aria-live="polite" className="text-sm">
        {status}
      </p>
      {photos.length === 0 ? (
        <p className="text-ink-soft">No photos yet.</p>
      ) : (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-4" aria-label="Photos" data-testid="gallery">
          {photos.map((p) => (
            <li key={p.id} className="cw-card p-2">
              <a href={p.url} target="_blank" rel="noopener">
                <img src={p.thumbnailUrl ?? p.url} alt={p.fileName} loading="lazy" className="aspect-[4/3] w-full rounded object-cover" />
              </a>
              <div className="mt-1 flex items-center justify-between gap-2 text-xs">
                <span className="truncate" title={p.fileName}>
                  {p.fileName}
                </span>
                {canWrite && (
                  <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={() => remove(p)} aria-label={`Delete ${p.fileName}`}>
                    Delete
                  </button>
                )}
              </div>
            </li>
          ))}
        </ul>
      )}
      {files.length > 0 && (
        <ul className="text-sm" aria-label="Instrument files">
          {files.map((f) => (
            <li key={f.id} className="flex items-center gap-3 border-b border-rule py-1">
              <a href={f.url}>{f.fileName}</a>
              <span className="text-ink-soft">{sizeText(f.size)}</span>
              {canWrite && (
                <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={() => remove(f)} aria-label={`Delete ${f.fileName}`}>
                  Delete
                </button>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

/** Photos and instrument files of a design: upload, view, delete. */
export default withApi(Gallery);
