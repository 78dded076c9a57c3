import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';

export type ChartPoint = { kHz: number; dB: number };

type Props = {
  points: ChartPoint[];
  predictedKHz: number | null;
  calibratedKHz: number | null;
  peaksKHz: number[];
  label: string;
};

/** Measured response in dB against frequency, with the predicted (and adopted) frequency marked. */
export default function SweepChart({ points, predictedKHz, calibratedKHz, peaksKHz, label }: Props) {
  return (
    <div className="h-72 w-full" role="img" aria-label={`Measured ${label} against frequency, with the predicted frequency marked`}>
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={points} margin={{ top: 10, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid strokeDasharray="3 3" stroke="var(--color-rule)" />
          <XAxis dataKey="kHz" type="number" domain={['dataMin', 'dataMax']} tickFormatter={(v: number) => v.toFixed(0)} label={{ value: 'kHz', position: 'insideBottom', offset: -12 }} />
          <YAxis dataKey="dB" tickFormatter={(v: number) => v.toFixed(0)} label={{ value: `${label} (dB)`, angle: -90, position: 'insideLeft' }} width={64} />
          <Tooltip formatter={(v) => `${Number(v).toFixed(2)} dB`} labelFormatter={(v) => `${Number(v).toFixed(2)} kHz`} />
          <Line type="monotone" dataKey="dB" stroke="var(--color-copper)" dot={false} isAnimationActive={false} />
          {predictedKHz !== null && <ReferenceLine x={predictedKHz} stroke="var(--color-arc)" strokeDasharray="6 3" label={{ value: 'predicted', position: 'top' }} />}
          {calibratedKHz !== null && <ReferenceLine x={calibratedKHz} stroke="var(--color-sound)" strokeDasharray="2 2" label={{ value: 'adopted', position: 'insideTopRight' }} />}
          {peaksKHz.map((p) => (
            <ReferenceLine key={p} x={p} stroke="var(--color-fault)" />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
