type Props = {
  /** endpoints in drawing units (x right, y down) */
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  label: string;
  font: number;
  /** which side of the line the label sits on */
  side?: 'before' | 'after';
  id?: string;
};

/** A dimension line with arrowheads and its value, the way a drawing office marks a size. */
export function Dimension({ x1, y1, x2, y2, label, font, side = 'after', id }: Props) {
  const vertical = Math.abs(x2 - x1) < Math.abs(y2 - y1);
  const mx = (x1 + x2) / 2;
  const my = (y1 + y2) / 2;
  const off = font * 0.5;
  const a = font * 0.45;
  const ux = vertical ? 0 : Math.sign(x2 - x1) || 1;
  const uy = vertical ? Math.sign(y2 - y1) || 1 : 0;
  const arrow = (x: number, y: number, dir: 1 | -1) =>
    `M${x},${y} l${dir * (ux * a - uy * a * 0.4)},${dir * (uy * a - ux * a * 0.4)} M${x},${y} l${dir * (ux * a + uy * a * 0.4)},${dir * (uy * a + ux * a * 0.4)}`;
  return (
    <g className="text-ink-soft" data-dimension={id}>
      <line x1={x1} y1={y1} x2={x2} y2={y2} stroke="currentColor" strokeWidth={font * 0.06} />
      <path d={`${arrow(x1, y1, 1)} ${arrow(x2, y2, -1)}`} stroke="currentColor" strokeWidth={font * 0.06} fill="none" />
      {vertical ? (
        <text
          x={side === 'after' ? mx + off : mx - off}
          y={my}
          fontSize={font}
          textAnchor={side === 'after' ? 'start' : 'end'}
          dominantBaseline="middle"
          fill="currentColor"
        >
          {label}
        </text>
      ) : (
        <text x={mx} y={side === 'after' ? my + off + font * 0.7 : my - off} fontSize={font} textAnchor="middle" fill="currentColor">
          {label}
        </text>
      )}
    </g>
  );
}
