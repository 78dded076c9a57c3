import { lazy, Suspense, useId, useRef, type ReactNode } from 'react';
import { formatSignificant } from '~/lib/format';
import { useNearViewport } from '../designer/WhenVisible';
import { dashOf, lineStyleName, type Band, type ChartSeries, type RefLine } from './chart-types';

export { lineStyleName, type Band, type LineSpec, type RefLine } from './chart-types';

// the plotting library loads when a chart's box comes near the screen; the box keeps its size meanwhile
const ChartPlot = lazy(() => import('./ChartPlot'));

type Props = ChartSeries & {
  refs?: RefLine[];
  bands?: Band[];
  dots?: boolean;
  height?: number;
  yDomain?: [number | 'auto', number | 'auto'];
  xDomain?: [number | 'dataMin', number | 'dataMax'];
  caption?: ReactNode;
  testId?: string;
  /** the chart's accessible name; defaults to "<y> against <x>" */
  title?: string;
  /** draw at once rather than when the chart comes near the screen (a chart the builder has just asked for) */
  eager?: boolean;
};

/**
 * Tick labels with as many digits as the axis's span needs, so that ticks on a nearly flat series do not
 * repeat ("1.000, 1.001, 1.002" rather than "1, 1, 1"), and plain figures otherwise.
 */
export function tickFormatterFor(values: readonly number[]): (v: number) => string {
  const finite = values.filter((v) => Number.isFinite(v));
  if (finite.length === 0) return (v) => formatSignificant(v, 3);
  const span = Math.max(...finite) - Math.min(...finite);
  const size = Math.max(...finite.map(Math.abs));
  if (!(span > 0) || size === 0) return (v) => formatSignificant(v, 3);
  const decimals = Math.max(0, Math.min(9, Math.ceil(-Math.log10(span / 5)) + 1));
  const digits = Math.ceil(Math.log10(size / span)) + 2;
  if (digits <= 3) return (v) => formatSignificant(v, 3);
  return (v) => (Number.isFinite(v) ? Number(v.toFixed(decimals)).toString() : '');
}

/** A series that does not change gets a small band around it, so its axis shows one clear value. */
function flatDomain(values: readonly number[]): [number, number] | null {
  const finite = values.filter((v) => Number.isFinite(v));
  if (finite.length === 0) return null;
  const lo = Math.min(...finite);
  const hi = Math.max(...finite);
  if (hi - lo > 1e-9 * Math.max(Math.abs(hi), 1e-300)) return null;
  const pad = Math.abs(hi) > 0 ? Math.abs(hi) * 0.1 : 1;
  return [lo - pad, hi + pad];
}

/**
 * A line chart with labelled axes (units in the labels), a tooltip, optional reference lines and shaded bands,
 * a legend outside the plot that names each line's style, an accessible name, and the data as a table.
 */
export function ChartFrame({ data, xKey, xLabel, yLabel, lines, refs = [], bands = [], dots = false, height = 260, yDomain = ['auto', 'auto'], xDomain = ['dataMin', 'dataMax'], caption, testId, title, eager = false }: Props) {
  const box = useRef<HTMLDivElement>(null);
  const near = useNearViewport(box, eager);
  const name = title ?? `${yLabel} against ${xLabel}`;
  const tableId = useId();
  const yValues = data.flatMap((r) => lines.map((l) => r[l.key]).filter((v): v is number => typeof v === 'number'));
  const xValues = data.map((r) => r[xKey]).filter((v): v is number => typeof v === 'number');
  const flat = yDomain[0] === 'auto' && yDomain[1] === 'auto' ? flatDomain(yValues) : null;
  const domain = flat ?? yDomain;
  const yTick = tickFormatterFor(flat ?? yValues);
  const xTick = tickFormatterFor(xValues);
  const cell = (v: number | null | undefined) => (typeof v === 'number' && Number.isFinite(v) ? formatSignificant(v, 4) : '—');
  return (
    <figure data-testid={testId} className="w-full" aria-label={name} role="group">
      {lines.length > 1 && (
        <ul className="mb-1 flex flex-wrap gap-x-4 gap-y-1 text-xs" aria-label="Legend">
          {lines.map((l) => (
            <li key={l.key} className="flex items-center gap-1.5">
              <svg width="28" height="8" aria-hidden="true">
                <line x1="0" y1="4" x2="28" y2="4" stroke={l.color} strokeWidth="2" strokeDasharray={dashOf(l)} />
              </svg>
              {l.name} ({lineStyleName(l)})
            </li>
          ))}
        </ul>
      )}
      <div ref={box} style={{ width: '100%', height }} data-chart-plot={near ? 'loaded' : 'waiting'}>
        {near && (
          <Suspense fallback={null}>
            <ChartPlot data={data} xKey={xKey} xLabel={xLabel} yLabel={yLabel} lines={lines} refs={refs} bands={bands} dots={dots} yDomain={domain} xDomain={xDomain} xTick={xTick} yTick={yTick} name={name} />
          </Suspense>
        )}
      </div>
      {caption && <figcaption className="mt-1 text-xs text-ink-soft">{caption}</figcaption>}
      <details className="mt-1 text-xs">
        <summary className="cursor-pointer text-ink-soft">Data table: {name}</summary>
        <div className="max-h-64 overflow-auto">
          <table className="w-full tabular-nums" aria-labelledby={tableId}>
            <caption id={tableId} className="sr-only">
              {name}
            </caption>
            <thead>
              <tr>
                <th scope="col" className="text-left">
                  {xLabel}
                </th>
                {lines.map((l) => (
                  <th key={l.key} scope="col" className="text-right">
                    {l.name}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {data.map((r, i) => (
                <tr key={i}>
                  <td>{cell(r[xKey])}</td>
                  {lines.map((l) => (
                    <td key={l.key} className="text-right">
                      {cell(r[l.key])}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </details>
    </figure>
  );
}
