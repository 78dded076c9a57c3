import type { ReactNode } from 'react';

type Props = { label: ReactNode; value: string; id: string; note?: ReactNode; strong?: boolean };

/** One result: what it is, its value with unit, and an optional one-line explanation. */
export function Row({ label, value, id, note, strong }: Props) {
  return (
    <div className="grid grid-cols-[1fr_auto] items-baseline gap-x-3 border-b border-rule py-1.5 last:border-b-0">
      <dt className="text-sm text-ink-soft">{label}</dt>
      <dd className={`text-right tabular-nums ${strong ? 'text-lg font-semibold' : 'font-medium'}`} data-result={id}>
        {value}
      </dd>
      {note && <dd className="col-span-2 text-xs text-ink-soft">{note}</dd>}
    </div>
  );
}

export function Group({ title, children, id }: { title: string; children: ReactNode; id: string }) {
  return (
    <section className="cw-card" aria-labelledby={id}>
      <h3 id={id} className="mb-2 text-base font-semibold">
        {title}
      </h3>
      {children}
    </section>
  );
}
