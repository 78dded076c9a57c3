import { useId, type ReactNode } from 'react';
import { safetyNotes, SAFETY_PAGE, type SafetyKind } from '../lib/content/safety-notes';

type Props = {
  kind: SafetyKind;
  className?: string;
  /** Extra lines about the number this note sits beside, e.g. the stored energy in joules. */
  children?: ReactNode;
};

export function SafetyNote({ kind, className, children }: Props) {
  const note = safetyNotes[kind];
  const titleId = useId();
  return (
    <aside
      className={`flex gap-3 rounded-lg border border-l-4 border-caution-edge bg-caution-bg p-3 text-caution-ink ${className ?? ''}`}
      aria-labelledby={titleId}
      data-safety={kind}
    >
      <svg className="mt-0.5 h-5 w-5 shrink-0" viewBox="0 0 20 20" aria-hidden="true" focusable="false">
        <path d="M10 2 L19 18 H1 Z" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinejoin="round" />
        <path d="M10 8 V12.5 M10 15 V15.2" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      </svg>
      <div className="text-sm leading-relaxed">
        <p>
          <strong id={titleId} className="font-semibold">
            {note.title}.
          </strong>{' '}
          {note.body}
        </p>
        {children}
        <p className="mt-1">
          <a href={SAFETY_PAGE} className="font-medium text-caution-ink underline">
            Safety guidance
          </a>
        </p>
      </div>
    </aside>
  );
}

export default SafetyNote;
