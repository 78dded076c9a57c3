import { CartesianGrid, Label, Line, LineChart, ReferenceArea, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatSignificant } from '~/lib/format';
import { dashOf, type Band, type ChartSeries, type RefLine } from './chart-types';

type Props = ChartSeries & {
  refs: RefLine[];
  bands: Band[];
  dots: boolean;
  yDomain: [number | 'auto', number | 'auto'];
  xDomain: [number | 'dataMin', number | 'dataMax'];
  xTick: (v: number) => string;
  yTick: (v: number) => string;
  name: string;
};

/** The plot of a ChartFrame: the part drawn with recharts, filling the box the frame gives it. */
export default function ChartPlot({ data, xKey, xLabel, yLabel, lines, refs, bands, dots, yDomain: domain, xDomain, xTick, yTick, name }: Props) {
  return (
    <ResponsiveContainer width="100%" height="100%">
      <LineChart data={data as Array<Record<string, number | null>>} margin={{ top: 12, right: 16, bottom: 28, left: 16 }} accessibilityLayer={false} role="img" aria-label={name}>
        <CartesianGrid stroke="var(--color-rule)" strokeDasharray="3 3" />
        <XAxis dataKey={xKey} type="number" domain={xDomain} allowDataOverflow={typeof xDomain[0] === 'number'} tickFormatter={xTick} stroke="var(--color-ink-soft)" tick={{ fill: 'var(--color-ink-soft)', fontSize: 12 }}>
          <Label value={xLabel} position="insideBottom" offset={-16} fill="var(--color-ink)" fontSize={13} />
        </XAxis>
        <YAxis domain={domain} allowDataOverflow={domain[0] !== 'auto' && domain[1] !== 'auto'} tickFormatter={yTick} stroke="var(--color-ink-soft)" tick={{ fill: 'var(--color-ink-soft)', fontSize: 12 }} width={64}>
          <Label value={yLabel} angle={-90} position="insideLeft" style={{ textAnchor: 'middle' }} fill="var(--color-ink)" fontSize={13} offset={0} />
        </YAxis>
        <Tooltip
          formatter={(v) => (typeof v === 'number' ? formatSignificant(v, 4) : String(v))}
          labelFormatter={(v) => `${xLabel}: ${typeof v === 'number' ? formatSignificant(v, 4) : String(v)}`}
          contentStyle={{ background: 'var(--color-panel)', borderColor: 'var(--color-rule)', color: 'var(--color-ink)' }}
        />
        {bands.map((b) => (
          <ReferenceArea key={`${b.x1}-${b.x2}`} x1={b.x1} x2={b.x2} fill="var(--color-fault)" fillOpacity={0.12} stroke="var(--color-fault)" strokeDasharray="2 2" label={{ value: b.label, fill: 'var(--color-fault)', fontSize: 11, position: 'insideTop' }} ifOverflow="hidden" />
        ))}
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
            strokeDasharray={dashOf(l)}
            dot={dots ? { r: 2.5 } : false}
            connectNulls={false}
            isAnimationActive={false}
          />
        ))}
      </LineChart>
    </ResponsiveContainer>
  );
}
