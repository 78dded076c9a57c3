import type { ReactNode } from 'react';
import { useFeedbackValue } from './field-context';

type Props = {
  id: string;
  title: string;
  /** design paths whose messages belong to the part as a whole (e.g. "tank", "secondary.wire") */
  ownPaths: string[];
  children: ReactNode;
  action?: ReactNode;
};

/** One part of the coil (secondary, topload…) as a fieldset, with messages about the part as a whole on top. */
export function Part({ id, title, ownPaths, children, action }: Props) {
  const warnings = useFeedbackValue((f) => ownPaths.flatMap((p) => f.warningsFor(p)));
  const errors = useFeedbackValue((f) => ownPaths.map((p) => f.errorFor(p)).filter((e): e is string => Boolean(e)));
  return (
    <fieldset id={id} className="cw-card space-y-3" aria-describedby={`${id}-notes`}>
      <legend className="float-left mb-2 flex w-full items-center justify-between gap-3 text-lg font-semibold">
        <span>{title}</span>
        {action}
      </legend>
      <div id={`${id}-notes`} className="clear-both space-y-1" aria-live="polite">
        {errors.map((e) => (
          <p key={e} className="cw-field-error">
            {e}
          </p>
        ))}
        {warnings.map((w) => (
          <p key={`${w.code}-${w.message}`} className="rounded-md border-l-4 border-caution-edge bg-caution-bg px-2 py-1 text-sm text-caution-ink" data-warning={w.code} data-warning-for={w.path}>
            <span className="font-semibold">Check: </span>
            {w.message}
          </p>
        ))}
      </div>
      {children}
    </fieldset>
  );
}
