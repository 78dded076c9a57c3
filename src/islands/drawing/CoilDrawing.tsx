import { memo, useEffect, useId, useState } from 'react';
import type { DesignInput } from '~/lib/design';
import type { DesignSI, Result } from '~/solver';
import { formatLength, type UnitSystem } from '~/lib/format';
import { coilSection } from './geometry';
import { Dimension } from './Dimension';

type Props = {
  /** a design as stored (strings with units) or already resolved into SI */
  design: DesignSI | DesignInput;
  result?: Result | null;
  system?: UnitSystem;
  className?: string;
};

function isDesignSI(d: DesignSI | DesignInput): d is DesignSI {
  const w = d.secondary.wire as Record<string, unknown>;
  return 'awg' in w && 'diameter' in w && typeof d.secondary.formDiameter === 'number' && 'tuning' in d && typeof (d as DesignSI).groundClearance === 'number';
}

const MM = 1000; // drawing units: millimetres, so stroke widths and fonts stay well above rounding

/**
 * To-scale side cross-section through the coil's axis: ground, the primary reference plane (z = 0),
 * the primary's conductors (the turns up to the tap in the accent colour), the secondary winding on
 * its form and the topload, with the key dimensions. Read-only; works from a stored design too.
 */
function CoilDrawingView({ design, result, system = 'metric', className }: Props) {
  const titleId = useId();
  const given = isDesignSI(design) ? design : null;
  const [parsed, setParsed] = useState<DesignSI | null>(null);
  useEffect(() => {
    if (given) return;
    let live = true;
    // a stored design is resolved with the schema's unit parser, loaded only for this case
    void Promise.all([import('~/lib/design/parse'), import('~/lib/format/units-reader')]).then(async ([{ parseDesign }, { withFullReader }]) => {
      const p = await withFullReader(() => parseDesign(design));
      if (live) setParsed(p.ok ? p.design : null);
    });
    return () => {
      live = false;
    };
  }, [design, given]);
  const si = given ?? parsed;
  if (!si) return <p className="text-sm text-ink-soft">The drawing appears once the design is complete and valid.</p>;

  const g = coilSection(si);
  const tap = result?.tuning?.tapTurns ?? null;
  // one datum, one number: the drawing gives the primary's outside diameter the results table gives
  const primaryOuter = result?.primary?.outerDiameter ?? 2 * (g.primary?.outerRadius ?? 0);
  const L = (m: number) => formatLength(m, system, 3);

  const w = g.box.rMax * MM;
  const top = g.box.zMax * MM;
  const bottom = g.box.zMin * MM;
  const height = top - bottom;
  const span = Math.max(2 * w, height);
  const font = span * 0.032;
  const pad = font * 1.2;
  // room for the dimension labels on both sides
  const side = font * 9;
  const vbX = -w - side;
  const vbY = -top - pad - font * 2;
  const vbW = 2 * w + 2 * side;
  const vbH = height + 2 * pad + font * 4.2;
  const y = (z: number) => -z * MM;
  const line = font * 0.07;

  const wr = g.windingRadius * MM;
  const fr = g.formRadius * MM;
  const wire = Math.max(g.wireRadius * MM * 2, line * 3);
  const label = `Side section: secondary ${L(2 * g.windingRadius)} across and ${L(g.zTop - g.zBottom)} tall, bottom ${L(g.zBottom)} above the primary plane`;

  return (
    <figure className={className}>
      <svg viewBox={`${vbX} ${vbY} ${vbW} ${vbH}`} role="img" aria-labelledby={titleId} className="h-auto w-full text-ink" data-testid="coil-drawing" preserveAspectRatio="xMidYMid meet">
        <title id={titleId}>{label}</title>
        {/* ground */}
        <line x1={vbX} x2={vbX + vbW} y1={y(g.groundZ)} y2={y(g.groundZ)} stroke="currentColor" strokeWidth={line * 2} />
        <pattern id={`${titleId}-hatch`} width={font} height={font} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <line x1="0" y1="0" x2="0" y2={font} stroke="currentColor" strokeWidth={line} opacity="0.5" />
        </pattern>
        <rect x={vbX} y={y(g.groundZ)} width={vbW} height={font * 0.9} fill={`url(#${titleId}-hatch)`} />
        <text x={vbX + font * 0.4} y={y(g.groundZ) - font * 0.4} fontSize={font * 0.8} fill="currentColor">
          ground
        </text>
        {/* primary reference plane */}
        <line x1={vbX} x2={vbX + vbW} y1={0} y2={0} stroke="var(--color-arc)" strokeWidth={line} strokeDasharray={`${font * 0.6} ${font * 0.4}`} />
        <text x={vbX + vbW - font * 0.4} y={-font * 0.4} fontSize={font * 0.8} textAnchor="end" fill="var(--color-arc)">
          z = 0
        </text>
        {/* axis */}
        <line x1={0} x2={0} y1={vbY} y2={y(g.groundZ)} stroke="currentColor" strokeWidth={line * 0.6} strokeDasharray={`${font} ${font * 0.3} ${font * 0.2} ${font * 0.3}`} opacity="0.5" />
        {/* form */}
        <rect x={-fr} y={y(g.formTop)} width={2 * fr} height={(g.formTop - g.formBottom) * MM} fill="var(--color-paper)" stroke="currentColor" strokeWidth={line} />
        {/* winding, both sides */}
        {[-1, 1].map((sgn) => (
          <rect key={sgn} x={sgn * wr - wire / 2} y={y(g.zTop)} width={wire} height={(g.zTop - g.zBottom) * MM} fill="var(--color-copper)" data-part="secondary" />
        ))}
        {/* topload */}
        {g.topload?.shape === 'toroid' &&
          [-1, 1].map((sgn) => {
            const t = g.topload as Extract<NonNullable<typeof g.topload>, { shape: 'toroid' }>;
            return (
              <circle
                key={sgn}
                cx={sgn * t.ringRadius * MM}
                cy={y(t.zCentre)}
                r={t.tubeRadius * MM}
                fill="var(--color-panel)"
                stroke="currentColor"
                strokeWidth={line * 1.5}
                data-part="topload"
              />
            );
          })}
        {g.topload?.shape === 'sphere' && (
          <circle cx={0} cy={y(g.topload.zCentre)} r={g.topload.radius * MM} fill="var(--color-panel)" stroke="currentColor" strokeWidth={line * 1.5} data-part="topload" />
        )}
        {/* primary conductors */}
        {g.primary?.crossings.map((c) => (
          <circle
            key={c.turn}
            cx={c.r * MM}
            cy={y(c.z)}
            r={Math.max(c.radius * MM, line * 2)}
            fill={tap !== null && c.turn <= tap + 1e-9 ? 'var(--color-copper)' : 'var(--color-panel)'}
            stroke="currentColor"
            strokeWidth={line}
            data-part="primary"
          />
        ))}

        {/* dimensions */}
        <Dimension id="winding-diameter" x1={-wr} x2={wr} y1={y(g.zBottom) + font * 1.4} y2={y(g.zBottom) + font * 1.4} font={font * 0.85} label={`⌀ ${L(2 * g.windingRadius)}`} />
        <Dimension id="winding-length" x1={wr + font * 1.2} x2={wr + font * 1.2} y1={y(g.zTop)} y2={y(g.zBottom)} font={font * 0.85} label={L(g.zTop - g.zBottom)} />
        {Math.abs(g.zBottom) > 1e-6 && (
          <Dimension id="secondary-elevation" x1={-fr * 0.5} x2={-fr * 0.5} y1={y(Math.max(g.zBottom, 0))} y2={y(Math.min(g.zBottom, 0))} font={font * 0.85} side="after" label={`${g.zBottom >= 0 ? '↑' : '↓'} ${L(Math.abs(g.zBottom))}`} />
        )}
        <Dimension id="ground-clearance" x1={-w - side * 0.35} x2={-w - side * 0.35} y1={0} y2={y(g.groundZ)} font={font * 0.85} side="after" label={L(-g.groundZ)} />
        {g.topload && (
          <Dimension
            id="topload-diameter"
            x1={-g.topload.outerRadius * MM}
            x2={g.topload.outerRadius * MM}
            y1={y(g.box.zMax) - font * 0.9}
            y2={y(g.box.zMax) - font * 0.9}
            font={font * 0.85}
            side="before"
            label={`⌀ ${L(2 * g.topload.outerRadius)}`}
          />
        )}
        {g.primary && (
          <Dimension
            id="primary-diameter"
            x1={-primaryOuter / 2 * MM}
            x2={primaryOuter / 2 * MM}
            y1={y(g.groundZ) - font * 2.4}
            y2={y(g.groundZ) - font * 2.4}
            font={font * 0.85}
            side="before"
            label={`primary outside ⌀ ${formatLength(primaryOuter, system, 4)}`}
          />
        )}
      </svg>
      <figcaption className="mt-1 text-xs text-ink-soft">
        To scale. Copper: secondary winding{tap !== null ? ' and the primary turns up to the tap' : ''}. Dashed: the primary reference plane z = 0
        {Math.abs(g.zBottom) > 1e-6 ? `; the winding starts ${L(g.zBottom)} ${g.zBottom >= 0 ? 'above' : 'below'} it` : ''}.
      </figcaption>
    </figure>
  );
}

/** Memoised: the drawing redraws only when the design, the result or the units change. */
export const CoilDrawing = memo(CoilDrawingView);

export default CoilDrawing;
