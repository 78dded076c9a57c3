import type { ReactNode } from 'react';
import { CartesianGrid, Label, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatSignificant } from '~/lib/format';

export interface LineSpec {
  key: string;
  name: string;
  color: string;
  dashed?: boolean;
}

export interface RefLine {
  x?: number;
  y?: number;
  label: string;
  color?: string;
}

type Props = {
  data: ReadonlyArray<Record<string, number | null>>;
  xKey: string;
  xLabel: string;
  yLabel: string;
  lines: LineSpec[];
  refs?: RefLine[];
  dots?: boolean;
  height?: number;
  yDomain?: [number | 'auto', number | 'auto'];
  caption?: ReactNode;
  testId?: string;
};

const tick = (v: number) => formatSignificant(v, 3);

/** A line chart with labelled axes (units in the labels), a tooltip and optional reference lines. */
export function ChartFrame({ data, xKey, xLabel, yLabel, lines, refs = [], dots = false, height = 260, yDomain = ['auto', 'auto'], caption, testId }: Props) {
  return (
    <figure data-testid={testId} className="w-full">
      <div style={{ width: '100%', height }}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data as Array<Record<string, number | null>>} margin={{ top: 12, right: 16, bottom: 28, left: 16 }}>
            <CartesianGrid stroke="var(--color-rule)" strokeDasharray="3 3" />
            <XAxis dataKey={xKey} type="number" domain={['dataMin', 'dataMax']} tickFormatter={tick} stroke="var(--color-ink-soft)" tick={{ fill: 'var(--color-ink-soft)', fontSize: 12 }}>
              <Label value={xLabel} position="insideBottom" offset={-16} fill="var(--color-ink)" fontSize={13} />
            </XAxis>
            <YAxis domain={yDomain} allowDataOverflow={yDomain[0] !== 'auto' && yDomain[1] !== 'auto'} tickFormatter={tick} stroke="var(--color-ink-soft)" tick={{ fill: 'var(--color-ink-soft)', fontSize: 12 }} width={64}>
              <Label value={yLabel} angle={-90} position="insideLeft" style={{ textAnchor: 'middle' }} fill="var(--color-ink)" fontSize={13} offset={0} />
            </YAxis>
            <Tooltip
              formatter={(v) => (typeof v === 'number' ? tick(v) : String(v))}
              labelFormatter={(v) => `${xLabel}: ${typeof v === 'number' ? tick(v) : String(v)}`}
              contentStyle={{ background: 'var(--color-panel)', borderColor: 'var(--color-rule)', color: 'var(--color-ink)' }}
            />
            {lines.length > 1 && <Legend verticalAlign="top" height={30} wrapperStyle={{ fontSize: 13 }} />}
            {refs.map((r) => (
              <ReferenceLine
                key={`${r.label}-${r.x ?? ''}-${r.y ?? ''}`}
                x={r.x}
                y={r.y}
                stroke={r.color ?? 'var(--color-arc)'}
                strokeDasharray="5 4"
                label={{ value: r.label, fill: r.color ?? 'var(--color-arc)', fontSize: 12, position: r.x !== undefined ? 'insideTopLeft' : 'insideTopRight' }}
              />
            ))}
            {lines.map((l) => (
              <Line
                key={l.key}
                dataKey={l.key}
                name={l.name}
                type="monotone"
                stroke={l.color}
                strokeWidth={2}
                strokeDasharray={l.dashed ? '6 4' : undefined}
                dot={dots ? { r: 2.5 } : false}
                connectNulls={false}
                isAnimationActive={false}
              />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
      {caption && <figcaption className="mt-1 text-xs text-ink-soft">{caption}</figcaption>}
    </figure>
  );
}
