import { useFieldWarnings } from './field-context';

/** The solver's warnings about one field (or one part), shown right where the builder can act on them. */
export function FieldWarnings({ path, id, exact = true }: { path: string; id?: string; exact?: boolean }) {
  const list = useFieldWarnings(exact ? path : `${path}`);
  return (
    <div id={id} aria-live="polite">
      {list.map((w) => (
        <p key={`${w.code}-${w.message}`} className="mt-1 rounded-md border-l-4 border-caution-edge bg-caution-bg px-2 py-1 text-sm text-caution-ink" data-warning={w.code} data-warning-for={w.path}>
          <span className="font-semibold">Check: </span>
          {w.message}
        </p>
      ))}
    </div>
  );
}
