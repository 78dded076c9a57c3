import { useState } from 'react';
import { failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import { useFetchSummary } from '~/lib/api/queries/designs';
import { copyText } from './copy-text';

type Props = { /** e.g. /api/v1/designs/ID/summary or /api/v1/shared/TOKEN/summary */ endpoint: string };

/** One-click copy of the review summary, as plain text or Markdown, for a forum post. */
function SummaryCopy({ endpoint }: Props) {
  const [status, setStatus] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [preview, setPreview] = useState<string | null>(null);
  const summary = useFetchSummary();

  async function copy(format: 'text' | 'markdown') {
    setStatus(null);
    setError(null);
    let text: string;
    try {
      text = await summary.mutateAsync({ endpoint, format });
    } catch (e) {
      return setError(failureMessage(e));
    }
    setPreview(text);
    const done = await copyText(text);
    if (done) setStatus(format === 'markdown' ? 'Markdown summary copied.' : 'Plain-text summary copied.');
    else setError('Your browser did not allow copying; select the text below and copy it by hand.');
  }

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap gap-2">
        <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={() => void copy('text')}>
          Copy summary (plain text)
        </button>
        <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={() => void copy('markdown')}>
          Copy summary (Markdown)
        </button>
      </div>
      <div role="status" aria-live="polite" className={status ? 'text-sm text-sound' : undefined}>
        {status}
      </div>
      <div role="alert" className={error ? 'cw-alert' : undefined}>
        {error}
      </div>
      {preview && (
        <details>
          <summary className="cursor-pointer text-sm">Show the copied text</summary>
          <pre className="mt-2 max-h-80 overflow-auto rounded-lg border border-rule bg-panel p-3 text-xs">{preview}</pre>
        </details>
      )}
    </div>
  );
}

export default withApi(SummaryCopy);
