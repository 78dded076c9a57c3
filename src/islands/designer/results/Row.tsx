import type { ReactNode } from 'react';
import type { Result } from '~/solver';
import { figureOf, resultFigure, type ResultFigureId } from '~/lib/design/figures';
import { formatQuantity, type UnitSystem } from '~/lib/format';

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

type FigureProps = { result: Result; system: UnitSystem; figure: ResultFigureId; value?: string; note?: ReactNode; strong?: boolean };

/** A result figure of the registry: its label, and its value formatted by its kind unless one is given. */
export function FigureRow({ result, system, figure, value, note, strong }: FigureProps) {
  const f = resultFigure(figure);
  return <Row id={f.path} label={f.label} value={value ?? formatQuantity(figureOf(result, f), f.kind, { system })} note={note} strong={strong} />;
}
